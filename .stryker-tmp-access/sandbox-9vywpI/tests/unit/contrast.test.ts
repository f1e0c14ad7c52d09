// @ts-nocheck
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { modeColours, modeInk, modeKeys } from '../../shared/modes';

/*
 * WCAG 2.x contrast of the colour pairs the client uses for text, read from the theme tokens in
 * src/index.css and the mode palette in shared/modes.ts, so a token change that breaks AA fails here.
 *
 * Source: W3C, Web Content Accessibility Guidelines (WCAG) 2.1, Success Criterion 1.4.3 Contrast (Minimum)
 * and the glossary entries "relative luminance" and "contrast ratio":
 *   for each sRGB channel c = C8bit / 255:  c_lin = c / 12.92 if c <= 0.03928, else ((c + 0.055) / 1.055) ^ 2.4
 *   L = 0.2126 R_lin + 0.7152 G_lin + 0.0722 B_lin
 *   contrast ratio = (L_lighter + 0.05) / (L_darker + 0.05)
 * Level AA: at least 4.5:1 for normal text, 3:1 for large text (at least 18 pt, or 14 pt bold, i.e. about
 * 24 px, or 18.66 px at weight 700). WCAG 2.2 writes the threshold as 0.04045 (the sRGB standard's value);
 * no 8-bit value lies between 0.03928 and 0.04045 (10/255 = 0.0392, 11/255 = 0.0431), so both agree here.
 */
const normalText = 4.5;

function channelToLinear(c8: number): number {
  const c = c8 / 255;
  return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
}

function parseHex(hex: string): [number, number, number] {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!m) throw new RangeError(`colour: expected #rrggbb, got "${hex}"`);
  return [parseInt(m[1], 16), parseInt(m[2], 16), parseInt(m[3], 16)];
}

/** WCAG 2.1 relative luminance of an sRGB colour, 0 (black) to 1 (white). */
function relativeLuminance(hex: string): number {
  const [r, g, b] = parseHex(hex).map(channelToLinear);
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

/** WCAG 2.1 contrast ratio of two colours, 1 to 21, whichever order they come in. */
function contrastRatio(a: string, b: string): number {
  const [la, lb] = [relativeLuminance(a), relativeLuminance(b)];
  return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
}

/**
 * A colour drawn at `alpha` over an opaque background, as the browser composites it (per sRGB channel).
 * Tailwind's `text-mist/80` is the token at 80 % opacity (color-mix with transparent), composited this way.
 */
function over(fg: string, alpha: number, bg: string): string {
  const f = parseHex(fg);
  const b = parseHex(bg);
  return `#${f
    .map((c, i) =>
      Math.round(alpha * c + (1 - alpha) * b[i])
        .toString(16)
        .padStart(2, '0'),
    )
    .join('')}`;
}

const root = path.resolve(import.meta.dirname, '../..');

/** The `--color-*` tokens of the theme, as the app ships them. */
function themeTokens(): Record<string, string> {
  const css = readFileSync(path.join(root, 'src/index.css'), 'utf8');
  const tokens: Record<string, string> = {};
  for (const m of css.matchAll(/--color-([a-z-]+)\s*:\s*(#[0-9a-fA-F]{6})\s*;/g)) tokens[m[1]] = m[2].toLowerCase();
  return tokens;
}

/** Pale one-off backgrounds written as `bg-[#rrggbb]` in the client (notices, status chips, hover fills). */
function tintedBackgrounds(): string[] {
  const dir = path.join(root, 'src');
  const found = new Set<string>();
  for (const file of readdirSync(dir, { recursive: true, encoding: 'utf8' })) {
    if (!/\.(tsx?|css)$/.test(file)) continue;
    for (const m of readFileSync(path.join(dir, file), 'utf8').matchAll(/bg-\[(#[0-9a-fA-F]{6})\]/g)) found.add(m[1].toLowerCase());
  }
  return [...found].sort();
}

const t = themeTokens();

describe('the WCAG 2.1 formulas themselves', () => {
  it('give the published end points and a well-known grey', () => {
    // By the definition: black on white is (1 + 0.05) / (0 + 0.05) = 21, a colour on itself is 1 (WCAG 2.1 glossary).
    expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 9);
    expect(contrastRatio('#4a545b', '#4a545b')).toBe(1);
    expect(relativeLuminance('#ffffff')).toBeCloseTo(1, 12);
    // #767676 on white is about 4.54:1, the lightest neutral grey that passes AA on white (recalled from memory;
    // widely cited in accessibility guidance). Worked by hand: 0x76 = 118, c = 0.4627, c_lin = 0.1812, ratio 1.05 / 0.2312.
    expect(contrastRatio('#767676', '#ffffff')).toBeCloseTo(4.54, 2);
    expect(() => contrastRatio('#abc', '#ffffff')).toThrow(RangeError);
  });
});

describe('theme tokens read from src/index.css', () => {
  it('holds every colour the pairs below need', () => {
    for (const name of ['paper', 'panel', 'mist', 'ink', 'ink-soft', 'ink-faint', 'harbour', 'harbour-soft', 'signal-ok', 'signal-warn', 'signal-bad']) {
      expect(t[name], `--color-${name}`).toMatch(/^#[0-9a-f]{6}$/);
    }
  });
});

/*
 * Each pair: text colour, background, the level it must reach, and where the client uses it (from a grep of
 * the classes). Almost all of the client's text is text-sm or text-xs (14 px, 12 px), so nearly every pair is
 * held to the normal-text 4.5:1; only a pair used solely for text at 24 px, or 18.66 px bold, may use 3:1,
 * and no such pair exists today (headings are ink on paper or panel, which pass 4.5 anyway).
 * Disabled controls (disabled:opacity-50, disabled:text-ink-faint) are exempt under SC 1.4.3 and not listed.
 */
type Pair = { text: string; on: string; min: number; use: string };

const surfaces = ['paper', 'panel', 'mist'] as const;
const pairs: Pair[] = [
  // Body text, secondary text (table heads, notes, captions), faint text (units, hints, ids) on the three surfaces:
  // the page is paper, panels are panel, selected cards, skeleton chips and the info notice are mist. All small text.
  ...(['ink', 'ink-soft', 'ink-faint'] as const).flatMap((text) =>
    surfaces.map((on) => ({ text: t[text], on: t[on], min: normalText, use: `text-${text} on bg-${on}` })),
  ),
  // Links and link-like buttons (text-harbour, text-harbour-soft with underline), text-sm on any surface.
  ...(['harbour', 'harbour-soft'] as const).flatMap((text) =>
    surfaces.map((on) => ({ text: t[text], on: t[on], min: normalText, use: `text-${text} link on bg-${on}` })),
  ),
  // The header bar and the primary buttons: text-paper / text-mist on bg-harbour, the active nav item and
  // button hover on bg-harbour-soft; text-sm and the 11 px admin badge, so normal text.
  ...(['paper', 'mist'] as const).flatMap((text) =>
    (['harbour', 'harbour-soft'] as const).map((on) => ({ text: t[text], on: t[on], min: normalText, use: `text-${text} on bg-${on}` })),
  ),
  // The header's tagline (text-xs text-mist/80) and nav links and server lamp (text-mist/90) on bg-harbour,
  // and a nav link hovered (text-mist/90 on bg-harbour-soft/60 over bg-harbour).
  { text: over(t.mist, 0.8, t.harbour), on: t.harbour, min: normalText, use: 'text-mist/80 tagline on bg-harbour' },
  { text: over(t.mist, 0.9, t.harbour), on: t.harbour, min: normalText, use: 'text-mist/90 nav on bg-harbour' },
  {
    text: over(t.mist, 0.9, over(t['harbour-soft'], 0.6, t.harbour)),
    on: over(t['harbour-soft'], 0.6, t.harbour),
    min: normalText,
    use: 'text-mist/90 nav hovered on bg-harbour-soft/60',
  },
  // Signal colours: validation messages, verdicts in the comparison, status words, mostly text-xs on panels,
  // some on the paper-coloured figure cards and the mist preview.
  ...(['signal-ok', 'signal-warn', 'signal-bad'] as const).flatMap((text) =>
    surfaces.map((on) => ({ text: t[text], on: t[on], min: normalText, use: `text-${text} on bg-${on}` })),
  ),
  // The run page's status chip: text-xs font-medium text-paper on bg-signal-ok / bg-signal-bad.
  { text: t.paper, on: t['signal-ok'], min: normalText, use: 'run status "done" chip' },
  { text: t.paper, on: t['signal-bad'], min: normalText, use: 'run status "failed" chip' },
  // Pale tints written inline (warn and bad notices, the overview's status chips, hover fills of delete buttons):
  // every text colour that sits on them, all at text-sm or text-xs.
  ...tintedBackgrounds().flatMap((tint) =>
    (['ink', 'ink-soft', 'signal-ok', 'signal-warn', 'signal-bad'] as const).map((text) => ({
      text: t[text],
      on: tint,
      min: normalText,
      use: `text-${text} on bg-[${tint}]`,
    })),
  ),
  // Labels drawn on a mode's colour (shared/modes.ts modeInk): small chart and legend text, so normal text.
  ...modeKeys.map((k) => ({ text: modeInk[k], on: modeColours[k], min: normalText, use: `modeInk.${k} on modeColours.${k}` })),
];

describe('text colours against their backgrounds (WCAG 2.1 SC 1.4.3, level AA)', () => {
  it('finds the inline tints it checks', () => {
    expect(tintedBackgrounds().length).toBeGreaterThan(0);
  });

  it.each(pairs.map((p) => [p.use, p] as const))('%s', (_use, p) => {
    const ratio = contrastRatio(p.text, p.on);
    expect(ratio, `${p.text} on ${p.on}: ${ratio.toFixed(2)}:1, needs ${p.min}:1`).toBeGreaterThanOrEqual(p.min);
  });
});
