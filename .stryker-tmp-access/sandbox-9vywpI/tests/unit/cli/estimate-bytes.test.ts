/**
 * The command line writes the same bytes as before its importer and writer were made faster (issue 14): the hourly CSV
 * and the printed summary of the sample files, as SHA-256 digests taken from the command line at commit 5ad5ce4 (before
 * that work), run the way people run it (the package's bin, server/cli/estimate-launcher.mjs). The summary digests were
 * taken again when the energy totals gained rejectionFanKwh (issue 17, the heat-rejection fans' part of fanKwh): the
 * summary without those lines still gives the earlier digests, so nothing else moved.
 */
// @ts-nocheck

import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

const root = path.resolve(import.meta.dirname, '../../..');
const dir = mkdtempSync(path.join(tmpdir(), 'estimate-bytes-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const sha256 = (bytes: string | Buffer) => createHash('sha256').update(bytes).digest('hex');

describe('the command line’s output, byte for byte', { timeout: 120_000 }, () => {
  it.each([
    [
      'kelderwick-point.csv',
      'direct-air-a1',
      '658d52a0191dec52d64903fa5cd4d749618998cca741fe7986b550d2d3de4364',
      'f3f0f119cb7128ab5dd9f7be11acc640330b0cb074f39b57b3c428d15d26ae00',
    ],
    [
      'kelderwick-point.csv',
      'water-side-tower',
      '9170adc236aa96207c10c50aa80e15fe624a1e78f36613a728f38a0e0e4c2e41',
      'e5e6a917577a71ae7362d15319c4094bde995ffd3881f82bb89901c03493dfc5',
    ],
    [
      'teluk-hijau.tsv',
      'direct-air-a1',
      '885e525c79aa943a630e656db2a0f28c1c716970f2098fc5b0c4d2107ce47c24',
      'c86f83ede72aae40dd850c2498e7be6f5cb009bc52040b5fe1cc627df78566d9',
    ],
    [
      'mesa-alta-ridge.csv',
      'water-side-tower',
      '96749803a6f9102a875df275feeb7ca08ece7df38ffe75a18ec10e0d24678513',
      'd716e63947de89f49f478578f5c1b12d6435564424acc6138a5d944944fbc983',
    ],
  ])('%s with %s', (weather, scenario, hourlyDigest, summaryDigest) => {
    const hourly = path.join(dir, `${weather}-${scenario}.csv`);
    const result = spawnSync(
      process.execPath,
      [
        'server/cli/estimate-launcher.mjs',
        '--weather',
        `sample-weather/${weather}`,
        '--scenario',
        `sample-weather/scenarios/${scenario}.json`,
        '--hourly',
        hourly,
      ],
      { cwd: root, encoding: 'utf8' },
    );
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
    expect(sha256(readFileSync(hourly))).toBe(hourlyDigest);
    expect(sha256(result.stdout)).toBe(summaryDigest);
  });
});
