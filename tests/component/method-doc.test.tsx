import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { act } from 'react';
import { createRoot } from 'react-dom/client';
import { describe, expect, it } from 'vitest';
import { MethodSection, ModelLimits } from '@/features/reports/components/method-section';
import { METHOD_PARTS, methodPartMarkdown } from '@/lib/method-doc';
import type { ReportRun } from '../../shared/report/report-data';

(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;

/** docs/method.md as it stands on disk, read apart from the build's `?raw` import. */
const doc = readFileSync(resolve(process.cwd(), 'docs/method.md'), 'utf8');

const runOf = (engineVersion: string, kind: ReportRun['scenario']['system']['kind']) =>
  ({ engineVersion, scenario: { system: { kind, air: { kind: 'indirect-air' } } } }) as unknown as ReportRun;

function rendered(node: React.ReactNode): HTMLElement {
  const host = document.createElement('div');
  const root = createRoot(host);
  act(() => root.render(node));
  return host;
}

/** A part's words as a reader sees them: Markdown marks and line breaks gone, spaces collapsed. */
const words = (markdown: string) =>
  markdown
    .replace(/[*`]/g, '')
    .replace(/\[([^\]]*)\]\([^)]*\)/g, '$1')
    .replace(/\s+/g, ' ')
    .trim();

describe("the report's method is docs/method.md's text, written once", () => {
  it('every part the app shows is marked in docs/method.md', () => {
    for (const part of METHOD_PARTS) expect(() => methodPartMarkdown(doc, part), part).not.toThrow();
  });

  it('a missing part is named', () => {
    expect(() => methodPartMarkdown(doc, 'no-such-part')).toThrow(/no part "no-such-part"/);
  });

  it('the report shows the tower-water paragraph and the water-side rule exactly as the file on disk states them', () => {
    const text = rendered(<MethodSection runs={[runOf('scenario-engine 2.0.0', 'water-side')]} />).textContent!.replace(/\s+/g, ' ');
    const water = words(methodPartMarkdown(doc, 'energy-and-water'));
    const tower = water.slice(water.indexOf('Cooling tower: evaporation that follows the weather'), water.indexOf('Below the freeze-protection'));
    expect(tower.length).toBeGreaterThan(400);
    expect(text).toContain(tower);
    expect(text).toContain(words(methodPartMarkdown(doc, 'classify-water-side')));
  });

  it('a hybrid run shows the two-loop rule and its loops', () => {
    const text = rendered(<MethodSection runs={[runOf('scenario-engine 2.0.0', 'hybrid')]} />).textContent!.replace(/\s+/g, ' ');
    expect(text).toContain('The hour\u2019s mode is the more demanding loop\u2019s'.replace(/\u2019/g, "'"));
    expect(text).toContain(words(methodPartMarkdown(doc, 'classify-indirect-air')));
  });

  it('the limits of the model are the file\u2019s and do not repeat the cautions', () => {
    const text = rendered(<ModelLimits />)
      .textContent!.replace(/\s+/g, ' ')
      .trim();
    expect(text).toBe(words(methodPartMarkdown(doc, 'limits')));
    expect(text).not.toMatch(/Legionella|not a design|contamination/);
  });

  it('links in the doc become plain text in the app, and no raw HTML comment or Markdown mark is left', () => {
    const host = rendered(<MethodSection runs={[runOf('scenario-engine 2.0.0', 'direct-air')]} />);
    expect(host.querySelectorAll('a')).toHaveLength(0);
    expect(host.innerHTML).not.toMatch(/<!--|\*\*|<script|style=/);
  });
});
