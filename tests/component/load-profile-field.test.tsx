import { act } from 'react';
import { createRoot, type Root } from 'react-dom/client';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { LoadProfileField } from '@/features/scenarios/components/load-profile-field';
import { parseRampText, summariseLoadProfile } from '@/features/scenarios/utils/load-profile-summary';
import { EXAMPLE_LOAD_PROFILE_NAME, exampleLoadProfile, type ItLoadProfile } from '../../shared/scenario';

(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;

let host: HTMLDivElement;
let root: Root;
let chosen: ItLoadProfile[];
beforeEach(() => {
  host = document.createElement('div');
  document.body.append(host);
  root = createRoot(host);
  chosen = [];
});
afterEach(() => {
  act(() => root.unmount());
  host.remove();
});

function render(value: ItLoadProfile) {
  act(() => root.render(<LoadProfileField value={value} itLoadKw={1000} disabled={false} onChange={(p) => chosen.push(p)} />));
}

async function upload(name: string, text: string) {
  const input = host.querySelector<HTMLInputElement>('[data-testid="load-profile-file"]')!;
  const file = new File([text], name, { type: 'text/csv' });
  Object.defineProperty(input, 'files', { value: [file], configurable: true });
  await act(async () => {
    input.dispatchEvent(new Event('change', { bubbles: true }));
    // File.text() resolves on a later turn.
    await new Promise((resolve) => setTimeout(resolve, 0));
  });
}

const profile = (fractions: number[]): ItLoadProfile => ({ kind: 'hourly-profile', name: 'x', fractions });

describe('the IT load profile in the editor', () => {
  it('reports a bad file by line and value and keeps nothing of it', async () => {
    render(profile(exampleLoadProfile()));
    const lines = ['hour,fraction', ...Array.from({ length: 8760 }, (_, h) => `${h},0.9`)];
    lines[3] = '2,abc';
    lines[10] = '9,1.4';
    await upload('site-load.csv', lines.join('\n'));
    const report = host.querySelector('[data-testid="load-profile-errors"]')!.textContent!;
    expect(report).toContain('site-load.csv was not taken');
    expect(report).toContain('line 4: "abc" is not a number');
    expect(report).toContain('line 11: 1.4 is outside 0 to 1');
    expect(chosen).toEqual([]);
  });

  it('takes a good file of 8,760 fractions under its file name', async () => {
    render(profile(exampleLoadProfile()));
    await upload('site-load.csv', Array.from({ length: 8760 }, (_, h) => (h % 2 ? '0.5' : '1')).join('\r\n'));
    expect(host.querySelector('[data-testid="load-profile-errors"]')).toBeNull();
    expect(chosen).toHaveLength(1);
    expect(chosen[0]).toMatchObject({ kind: 'hourly-profile', name: 'site-load.csv' });
    expect(chosen[0].kind === 'hourly-profile' && chosen[0].fractions.length).toBe(8760);
  });

  it('summarises the chosen profile: mean, range and full-load hours', () => {
    render({ kind: 'hourly-profile', name: EXAMPLE_LOAD_PROFILE_NAME, fractions: Array.from({ length: 8760 }, (_, h) => (h % 2 ? 0.5 : 1)) });
    const summary = host.querySelector('[data-testid="load-profile-summary"]')!.textContent!;
    // Half the hours at 1 and half at 0.5: mean 0.75 (750 kW of 1,000 kW), 6,570 full-load hours (0.75 × 8,760).
    expect(summary).toContain('75 % of design (750 kW)');
    expect(summary).toContain('50 % · 100 %');
    expect(summary).toContain('6,570 h of 8,760');
  });

  it('reads a ramp typed as fractions or per cent, and names a bad year', () => {
    expect(parseRampText('0.4, 0.6; 80 % 1')).toEqual({ ok: true, fractions: [0.4, 0.6, 0.8, 1] });
    expect(parseRampText('0.4, x, 1.2')).toEqual({ ok: false, errors: ['year 2: "x" is not a number', 'year 3: 1.2 is outside 0 to 1 of the design load'] });
    expect(parseRampText(' ').ok).toBe(false);
    const week = summariseLoadProfile(Array.from({ length: 8760 }, (_, h) => (h % 168 < 24 ? 1 : 0.5))).averageWeek;
    expect(week[0]).toBe(1);
    expect(week[24]).toBe(0.5);
  });
});
