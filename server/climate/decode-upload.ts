/**
 * The uploaded bytes as text: UTF-8 when they are valid UTF-8 (a BOM is left for the importer to
 * strip), otherwise Windows-1252, which is what spreadsheets on many desktops still save (°C as 0xB0).
 */
export function decodeUpload(bytes: Uint8Array): string {
  try {
    return new TextDecoder('utf-8', { fatal: true, ignoreBOM: true }).decode(bytes);
  } catch {
    return new TextDecoder('windows-1252').decode(bytes);
  }
}
