// @ts-nocheck
// The floor under the command line (tests/bench/command-line.bench.ts): what any program must do to turn the weather
// file into the hourly file, and nothing else — read the text, split it into lines and cells, parse each timestamp,
// and write the hourly file's bytes (taken ready-made from SAME_BYTES.csv, the command line's own output).
//   node read-split-parse-write.mjs WEATHER.csv SAME_BYTES.csv OUT.csv
import { readFileSync, writeFileSync } from 'node:fs';

const [weatherFile, sameBytesFile, outFile] = process.argv.slice(2);
const lines = readFileSync(weatherFile, 'utf8').split('\n');
let checksum = 0;
for (let i = 1; i < lines.length; i++) {
  if (lines[i] === '') continue;
  const cells = lines[i].split(',');
  checksum += Date.parse(cells[0]) / 3_600_000 + cells.length;
}
if (!(checksum > 0)) throw new Error('no hours read');
writeFileSync(outFile, readFileSync(sameBytesFile));
