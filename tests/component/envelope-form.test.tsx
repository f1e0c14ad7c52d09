/**
 * A project's own envelope, typed in the person's units: what is sent is the shared schema's SI, and a refusal is
 * shown on the field it concerns, in the person's units.
 */
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { EnvelopeForm } from '@/features/envelopes/components/envelope-form';
import { UnitSystemProvider } from '@/lib/unit-system';

type Sent = { url: string; body: { name: string; note: string; limits: Record<string, number> } };

function show(units: 'SI' | 'IP') {
  localStorage.setItem('tramontane.unitSystem', units);
  const sent: Sent[] = [];
  const created: number[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init: RequestInit) => {
      sent.push({ url, body: JSON.parse(String(init.body)) });
      return new Response(JSON.stringify({ envelope: { id: 41 } }), { status: 201 });
    }),
  );
  render(
    <QueryClientProvider client={new QueryClient()}>
      <UnitSystemProvider>
        <EnvelopeForm projectId={7} onCreated={(id) => created.push(id)} />
      </UnitSystemProvider>
    </QueryClientProvider>,
  );
  return { sent, created, user: userEvent.setup({ delay: null }) };
}

const field = (label: string) => screen.getByRole('textbox', { name: new RegExp(`^${label}`) });

afterEach(() => {
  vi.unstubAllGlobals();
  localStorage.clear();
});

// Typing key by key is slow on a busy machine: the clock is generous, the test still waits only for conditions.
describe('the new-envelope form', { timeout: 30_000 }, () => {
  it('sends limits typed in °F as °C and tells the page which envelope it made', async () => {
    const { sent, created, user } = show('IP');
    const form = screen.getByRole('form', { name: 'New envelope' });
    expect(form).toBeTruthy();
    // Each limit is labelled with the unit it is typed in.
    expect(screen.getByRole('textbox', { name: 'Dry-bulb, lowest (°F)' })).toBeTruthy();
    expect(screen.getByRole('textbox', { name: 'RH, highest (%)' })).toBeTruthy();
    await user.type(field('Name'), 'Client hall');
    // 64.4 °F = 18 °C, 80.6 °F = 27 °C, 15.8 °F = −9 °C, 59 °F = 15 °C (°F = 1.8·°C + 32, NIST SP 811 §B.9).
    for (const [label, text] of [
      ['Dry-bulb, lowest', '64.4'],
      ['Dry-bulb, highest', '80.6'],
      ['Dew point, lowest', '15.8'],
      ['Dew point, highest', '59'],
      ['RH, lowest', '8'],
      ['RH, highest', '70'],
    ]) {
      await user.type(field(label), text);
    }
    await user.click(screen.getByRole('button', { name: 'Add envelope' }));
    await vi.waitFor(() => expect(created).toEqual([41]));
    expect(sent).toHaveLength(1);
    expect(sent[0].url).toBe('/api/projects/7/envelopes');
    const limits = sent[0].body.limits;
    expect(limits.dryBulbMinC).toBeCloseTo(18, 9);
    expect(limits.dryBulbMaxC).toBeCloseTo(27, 9);
    expect(limits.dewPointMinC).toBeCloseTo(-9, 9);
    expect(limits.dewPointMaxC).toBeCloseTo(15, 9);
    expect([limits.rhMinPct, limits.rhMaxPct]).toEqual([8, 70]);
    // The form is emptied for the next envelope.
    expect((field('Name') as HTMLInputElement).value).toBe('');
  });

  async function typeLimits(user: ReturnType<typeof userEvent.setup>, texts: string[]) {
    await user.type(field('Name'), 'Client hall');
    const labels = ['Dry-bulb, lowest', 'Dry-bulb, highest', 'Dew point, lowest', 'Dew point, highest', 'RH, lowest', 'RH, highest'];
    for (const [i, label] of labels.entries()) await user.type(field(label), texts[i]);
    await user.click(screen.getByRole('button', { name: 'Add envelope' }));
  }

  it('shows a value it cannot read on its field, with the range in the person’s units, and sends nothing', async () => {
    const { sent, user } = show('SI');
    await typeLimits(user, ['18', '27', '-9', '15', '8', 'seventy']);
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toBe('Enter a number from 0 to 100 %.');
    expect(field('RH, highest').getAttribute('aria-invalid')).toBe('true');
    expect(field('RH, lowest').getAttribute('aria-invalid')).toBeNull();
    expect(sent).toEqual([]);
  });

  it('puts a lowest limit above its highest on the highest, in words, and sends nothing', async () => {
    const { sent, user } = show('SI');
    await typeLimits(user, ['30', '20', '-9', '15', '8', '70']);
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toBe('lowest dry-bulb must be below highest dry-bulb');
    expect(field('Dry-bulb, highest').getAttribute('aria-invalid')).toBe('true');
    expect(field('Dry-bulb, lowest').getAttribute('aria-invalid')).toBeNull();
    expect(sent).toEqual([]);
  });

  it('asks for a name before anything else is sent', async () => {
    const { sent, user } = show('SI');
    await user.click(screen.getByRole('button', { name: 'Add envelope' }));
    expect(await screen.findByText('Give the envelope a name.')).toBeTruthy();
    expect(sent).toEqual([]);
  });
});
