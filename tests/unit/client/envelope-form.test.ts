import { describe, expect, it } from 'vitest';
import { envelopeFormSchema } from '@/features/envelopes/lib/envelope-form';

const typed = (limits: Record<string, string>) => ({ name: 'Client hall', note: '', limits });

describe('the envelope form', () => {
  it('turns limits typed in °F into the shared schema’s °C', () => {
    // 64.4 °F = 18 °C, 80.6 °F = 27 °C, 15.8 °F = −9 °C, 59 °F = 15 °C (°F = 1.8·°C + 32, NIST SP 811 §B.9).
    const parsed = envelopeFormSchema('IP').safeParse(
      typed({ dryBulbMinC: '64.4', dryBulbMaxC: '80.6', dewPointMinC: '15.8', dewPointMaxC: '59', rhMinPct: '8', rhMaxPct: '70' }),
    );
    expect(parsed.success).toBe(true);
    if (!parsed.success) return;
    expect(parsed.data.limits.dryBulbMinC).toBeCloseTo(18, 12);
    expect(parsed.data.limits.dryBulbMaxC).toBeCloseTo(27, 12);
    expect(parsed.data.limits.dewPointMinC).toBeCloseTo(-9, 12);
    expect(parsed.data.limits.rhMaxPct).toBe(70);
  });

  it('puts the schema’s refusals on the typed fields', () => {
    const parsed = envelopeFormSchema('SI').safeParse(
      typed({ dryBulbMinC: '30', dryBulbMaxC: '20', dewPointMinC: '', dewPointMaxC: '15', rhMinPct: '8', rhMaxPct: '70' }),
    );
    expect(parsed.success).toBe(false);
    if (parsed.success) return;
    const paths = parsed.error.issues.map((i) => i.path.join('.'));
    expect(paths).toContain('limits.dewPointMinC');
  });

  it('refuses a minimum above its maximum on the maximum', () => {
    const parsed = envelopeFormSchema('SI').safeParse(
      typed({ dryBulbMinC: '30', dryBulbMaxC: '20', dewPointMinC: '-9', dewPointMaxC: '15', rhMinPct: '8', rhMaxPct: '70' }),
    );
    expect(parsed.success).toBe(false);
    if (parsed.success) return;
    expect(parsed.error.issues.map((i) => [i.path.join('.'), i.message])).toEqual([['limits.dryBulbMaxC', 'dryBulbMinC must be below dryBulbMaxC']]);
  });
});
