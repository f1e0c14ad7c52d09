import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { LoadProfileField } from '@/features/scenarios/components/load-profile-field';
import { parseRampText, summariseLoadProfile } from '@/features/scenarios/lib/load-profile-summary';
import { EXAMPLE_LOAD_PROFILE_NAME, exampleLoadProfile, type ItLoadProfile } from '../../shared/scenario';

function renderField(value: ItLoadProfile) {
  const chosen: ItLoadProfile[] = [];
  render(<LoadProfileField value={value} itLoadKw={1000} disabled={false} onChange={(p) => chosen.push(p)} />);
  return chosen;
}

async function upload(name: string, text: string) {
  const user = userEvent.setup();
  await user.upload(screen.getByLabelText('Upload a profile (CSV)…'), new File([text], name, { type: 'text/csv' }));
}

const profile = (fractions: number[]): ItLoadProfile => ({ kind: 'hourly-profile', name: 'x', fractions });

describe('the IT load profile in the editor', () => {
  it('reports a bad file by line and value and keeps nothing of it', async () => {
    const chosen = renderField(profile(exampleLoadProfile()));
    const lines = ['hour,fraction', ...Array.from({ length: 8760 }, (_, h) => `${h},0.9`)];
    lines[3] = '2,abc';
    lines[10] = '9,1.4';
    await upload('site-load.csv', lines.join('\n'));
    const report = await screen.findByRole('alert');
    expect(report.textContent).toContain('site-load.csv was not taken');
    expect(within(report).getByText(/line 4: "abc" is not a number/)).toBeTruthy();
    expect(within(report).getByText(/line 11: 1\.4 is outside 0 to 1/)).toBeTruthy();
    expect(chosen).toEqual([]);
  });

  it('takes a good file of 8,760 fractions under its file name', async () => {
    const chosen = renderField(profile(exampleLoadProfile()));
    await upload('site-load.csv', Array.from({ length: 8760 }, (_, h) => (h % 2 ? '0.5' : '1')).join('\r\n'));
    await vi.waitFor(() => expect(chosen).toHaveLength(1));
    expect(screen.queryByRole('alert')).toBeNull();
    expect(chosen[0]).toMatchObject({ kind: 'hourly-profile', name: 'site-load.csv' });
    expect(chosen[0].kind === 'hourly-profile' && chosen[0].fractions.length).toBe(8760);
  });

  it('offers the example shape with a button', async () => {
    const chosen = renderField(profile(Array.from({ length: 8760 }, () => 0.5)));
    await userEvent.setup().click(screen.getByRole('button', { name: 'Use the example shape' }));
    expect(chosen).toEqual([{ kind: 'hourly-profile', name: EXAMPLE_LOAD_PROFILE_NAME, fractions: exampleLoadProfile() }]);
  });

  it('summarises the chosen profile: mean, range and full-load hours', () => {
    renderField({ kind: 'hourly-profile', name: EXAMPLE_LOAD_PROFILE_NAME, fractions: Array.from({ length: 8760 }, (_, h) => (h % 2 ? 0.5 : 1)) });
    // Half the hours at 1 and half at 0.5: mean 0.75 (750 kW of 1,000 kW), 6,570 full-load hours (0.75 × 8,760).
    const term = (name: string) => screen.getByText(name, { selector: 'dt' }).nextElementSibling?.textContent;
    expect(term('Mean')).toBe('75 % of design (750 kW)');
    expect(term('Lowest · highest hour')).toBe('50 % · 100 %');
    expect(term('Full-load hours')).toBe('6,570 h of 8,760');
    expect(screen.getByRole('img', { name: 'Average week of the profile' })).toBeTruthy();
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
