/** Random damage to a weather file's lines and cells, for the fuzz tests of the published-format readers (unit and API). */
// @ts-nocheck

import fc from 'fast-check';

const cell = fc.oneof(
  fc.constantFrom(
    '',
    '99.9',
    '999',
    '999999',
    '-9999',
    '25',
    '0',
    '24',
    '13',
    '32',
    'NaN',
    '"',
    ',',
    ':',
    ' ',
    '\t',
    '20110130:2500',
    '2011013:0000',
    'LOCATION',
    'time(UTC)',
    '1e400',
    '-0',
  ),
  fc.double({ noNaN: false }).map(String),
  fc.integer({ min: -100000, max: 100000 }).map(String),
  fc.string({ maxLength: 8 }),
);

export type Damage =
  | { kind: 'cell'; line: number; field: number; value: string }
  | { kind: 'drop'; line: number }
  | { kind: 'duplicate'; line: number }
  | { kind: 'swap'; line: number; other: number }
  | { kind: 'truncate'; at: number }
  | { kind: 'bytes'; line: number; value: string };

export const damage: fc.Arbitrary<Damage> = fc.oneof(
  fc.record({ kind: fc.constant('cell' as const), line: fc.nat(120), field: fc.nat(14), value: cell }),
  fc.record({ kind: fc.constant('drop' as const), line: fc.nat(120) }),
  fc.record({ kind: fc.constant('duplicate' as const), line: fc.nat(120) }),
  fc.record({ kind: fc.constant('swap' as const), line: fc.nat(120), other: fc.nat(120) }),
  fc.record({ kind: fc.constant('truncate' as const), at: fc.nat(12000) }),
  fc.record({ kind: fc.constant('bytes' as const), line: fc.nat(120), value: fc.string({ maxLength: 20 }) }),
);

/** The fixture with the damage applied, line by line (cells split at commas or runs of spaces). */
export function damaged(text: string, damages: Damage[]): string {
  const lines = text.split(/\r?\n/);
  let out = lines;
  for (const d of damages) {
    const i = 'line' in d ? d.line % Math.max(1, out.length) : 0;
    if (d.kind === 'cell' && out[i] !== undefined) {
      const comma = out[i].includes(',');
      const cells = comma ? out[i].split(',') : out[i].trim().split(/\s+/);
      cells[d.field % Math.max(1, cells.length)] = d.value;
      out[i] = cells.join(comma ? ',' : ' ');
    } else if (d.kind === 'drop') out = out.filter((_, k) => k !== i);
    else if (d.kind === 'duplicate') out = [...out.slice(0, i + 1), out[i] ?? '', ...out.slice(i + 1)];
    else if (d.kind === 'swap') {
      const j = d.other % Math.max(1, out.length);
      [out[i], out[j]] = [out[j], out[i]];
    } else if (d.kind === 'truncate') return out.join('\n').slice(0, d.at);
    else if (d.kind === 'bytes') out[i] = `${(out[i] ?? '').slice(0, 10)}${d.value}${(out[i] ?? '').slice(10)}`;
  }
  return out.join('\n');
}
