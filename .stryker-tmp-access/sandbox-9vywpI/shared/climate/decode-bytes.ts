/**
 * Bytes of an uploaded file to text: UTF-8 with or without BOM, UTF-16 with BOM (what
 * spreadsheets write as "Unicode text"), and Windows-1252 when the bytes are not valid UTF-8
 * (a `°` saved by an older spreadsheet). Binary content still comes back as text; the importer
 * then reports it as binary.
 */
// @ts-nocheck

export function decodeClimateBytes(bytes: Uint8Array): string {
  if (bytes.length >= 2 && bytes[0] === 0xff && bytes[1] === 0xfe) return new TextDecoder('utf-16le').decode(bytes.subarray(2));
  if (bytes.length >= 2 && bytes[0] === 0xfe && bytes[1] === 0xff) return new TextDecoder('utf-16be').decode(bytes.subarray(2));
  const start = bytes.length >= 3 && bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf ? 3 : 0;
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes.subarray(start));
  } catch {
    return new TextDecoder('windows-1252').decode(bytes.subarray(start));
  }
}
