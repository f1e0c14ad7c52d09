/**
 * A POSIX ustar archive (IEEE Std 1003.1, "pax" chapter, ustar interchange format) of several files:
 * how the original bytes of a set of files uploaded together are kept as one download, readable by
 * `tar` and common archive tools. Header: 512 bytes; contents padded to 512; two zero blocks close it.
 */
// @ts-nocheck

const BLOCK = 512;

function writeText(header: Buffer, offset: number, length: number, text: string): void {
  header.write(text.slice(0, length), offset, length, 'utf8');
}

/** Octal digits, zero-padded to length − 1, then NUL (the ustar numeric fields). */
function writeOctal(header: Buffer, offset: number, length: number, value: number): void {
  writeText(header, offset, length - 1, value.toString(8).padStart(length - 1, '0'));
  header[offset + length - 1] = 0;
}

/** A file name safe inside the archive: the last path segment, ASCII, at most 100 bytes. */
function entryName(name: string, taken: Set<string>): string {
  const base = (name.split(/[\\/]/).pop() || 'file').replace(/[^\x20-\x7e]/g, '_').slice(0, 90);
  let candidate = base;
  for (let k = 2; taken.has(candidate); k++) candidate = `${k}-${base}`;
  taken.add(candidate);
  return candidate;
}

export function tarArchive(files: { fileName: string; bytes: Buffer }[], modifiedAtMs: number): Buffer {
  const blocks: Buffer[] = [];
  const taken = new Set<string>();
  for (const file of files) {
    const header = Buffer.alloc(BLOCK);
    writeText(header, 0, 100, entryName(file.fileName, taken));
    writeOctal(header, 100, 8, 0o644);
    writeOctal(header, 108, 8, 0);
    writeOctal(header, 116, 8, 0);
    writeOctal(header, 124, 12, file.bytes.byteLength);
    writeOctal(header, 136, 12, Math.floor(modifiedAtMs / 1000));
    header.fill(0x20, 148, 156); // checksum counted as spaces
    header[156] = 0x30; // '0': a regular file
    writeText(header, 257, 6, 'ustar');
    writeText(header, 263, 2, '00');
    let sum = 0;
    for (const byte of header) sum += byte;
    writeText(header, 148, 6, sum.toString(8).padStart(6, '0'));
    header[154] = 0;
    header[155] = 0x20;
    blocks.push(header, file.bytes);
    const pad = (BLOCK - (file.bytes.byteLength % BLOCK)) % BLOCK;
    if (pad) blocks.push(Buffer.alloc(pad));
  }
  blocks.push(Buffer.alloc(2 * BLOCK));
  return Buffer.concat(blocks);
}
