/**
 * The palettes: public/index.html defines on the web the CSS custom properties that `colors` names, so
 * the two must hold the same values; and each palette keeps its contrast (WCAG 2.1 §1.4.3: 4.5:1 for
 * text; §1.4.11: 3:1 for the borders of controls). The luminance and ratio formulas are WCAG 2.1's
 * definitions of "relative luminance" and "contrast ratio".
 */
import fs from 'node:fs';
import path from 'node:path';
import { colors, cssVariableOf, palettes, type ColorName } from './theme';

const html = fs.readFileSync(path.join(__dirname, '..', 'public', 'index.html'), 'utf8');

/** WCAG 2.1, "relative luminance": sRGB channels linearised with the 0.03928 knee, weighted 0.2126/0.7152/0.0722. */
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
/** WCAG 2.1, "contrast ratio": (L1 + 0.05) / (L2 + 0.05), the lighter over the darker. */
function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

describe('the formulas', () => {
  it('give the reference ratios', () => {
    // WCAG 2.1 "contrast ratio": black on white is 21:1, a colour on itself 1:1; #767676 on white is the
    // lightest grey that passes 4.5:1 (4.54:1, a figure often quoted, from memory).
    expect(contrast('#000000', '#FFFFFF')).toBeCloseTo(21, 6);
    expect(contrast('#1F6F6B', '#1F6F6B')).toBe(1);
    expect(contrast('#767676', '#FFFFFF')).toBeCloseTo(4.54, 2);
  });
});

describe.each(['light', 'dark'] as const)('the %s palette', (scheme) => {
  const p = palettes[scheme];
  const backgrounds: ColorName[] = ['paper', 'paperDeep', 'surface', 'tealWash', 'brassWash', 'alarmWash'];

  it.each(['ink', 'inkMuted', 'teal', 'brassInk', 'alarmInk'] as const)('sets %s text at 4.5:1 or more on every background', (text) => {
    // The background's name goes with each ratio, so that a failure says which pair falls short.
    for (const bg of backgrounds) expect([bg, contrast(p[text], p[bg]) >= 4.5]).toEqual([bg, true]);
  });

  it('puts the page colour on the accent (a primary button) at 4.5:1 or more', () => {
    expect(contrast(p.paper, p.teal)).toBeGreaterThanOrEqual(4.5);
  });

  it.each(['ruleStrong', 'brass', 'alarm', 'teal'] as const)('draws %s borders at 3:1 or more against the page and the panels', (edge) => {
    for (const bg of ['paper', 'paperDeep', 'surface'] as const) expect(contrast(p[edge], p[bg])).toBeGreaterThanOrEqual(3);
  });

  it('is defined in public/index.html with the same values', () => {
    const block = scheme === 'light' ? html.split('@media (prefers-color-scheme: dark)')[0] : html.split('@media (prefers-color-scheme: dark)')[1];
    for (const name of Object.keys(p) as ColorName[]) {
      const match = block.match(new RegExp(`${cssVariableOf(name)}:\\s*(#[0-9A-Fa-f]{6});`));
      expect([name, match?.[1]?.toUpperCase()]).toEqual([name, p[name].toUpperCase()]);
    }
  });
});

it('is dark where the light palette is light', () => {
  expect(luminance(palettes.dark.paper)).toBeLessThan(0.05);
  expect(luminance(palettes.light.paper)).toBeGreaterThan(0.8);
});

it('names CSS custom properties on the web (the app test target is the web)', () => {
  expect(colors.inkMuted).toBe('var(--cw-ink-muted)');
  expect(Object.keys(palettes.dark).sort()).toEqual(Object.keys(palettes.light).sort());
});
