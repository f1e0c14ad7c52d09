import { render } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { MethodSection } from '@/features/reports/components/method-section';
import type { ReportRun } from '../../shared/report/report-data';

/** Only what the method section reads of a run: its engine and its system kind. */
const runOf = (engineVersion: string, kind: ReportRun['scenario']['system']['kind']) =>
  ({ engineVersion, scenario: { system: { kind } } }) as unknown as ReportRun;

/** The section as rendered: all the text a reader of the report sees in it. */
function methodText(runs: ReportRun[]): string {
  const { container, unmount } = render(<MethodSection runs={runs} />);
  // The doc's line breaks reach the page as whitespace, as a browser shows them.
  const text = (container.textContent ?? '').replace(/\s+/g, ' ');
  unmount();
  return text;
}

describe('the report states the method of the engine that made its runs', () => {
  it('engine 2.0.0: lift-based COP calibrated at rating conditions, affinity laws, derived fan heat, ε-NTU, tower evaporation, humidity over water', () => {
    const text = methodText([runOf('scenario-engine 2.0.0', 'indirect-air'), runOf('scenario-engine 2.0.0', 'water-side')]);
    expect(text).toContain('COP = η · T_evap / (T_cond − T_evap)');
    expect(text).toContain('AHRI Standard 550/590');
    expect(text).toContain('affinity laws');
    expect(text).toContain('f = P_fan / (ṁ·c_p)');
    expect(text).toContain('cross-flow exchanger, both streams unmixed');
    expect(text).toContain("Merkel's assumption");
    expect(text).toContain('over liquid water at every temperature');
    expect(text).not.toContain('COP_ref');
  });

  it('engine 1.0.0: its own linear COP model, named as the earlier one', () => {
    const text = methodText([runOf('scenario-engine 1.0.0', 'direct-air')]);
    expect(text).toContain('Runs made by scenario-engine 1.0.0 used its earlier model');
    expect(text).toContain('COP(T) = max(COP_min, COP_ref + slope·(T − T_ref))');
    expect(text).not.toContain('COP = η · T_evap');
  });

  it('a comparison of both engines states both models', () => {
    const text = methodText([runOf('scenario-engine 1.0.0', 'direct-air'), runOf('scenario-engine 2.0.0', 'direct-air')]);
    expect(text).toContain('COP = η · T_evap');
    expect(text).toContain('COP_ref');
  });
});
