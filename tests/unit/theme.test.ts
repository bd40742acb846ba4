// Text contrast of the theme: WCAG 2.x contrast ratio (W3C, "Web Content Accessibility Guidelines 2.1",
// definitions of relative luminance and contrast ratio), at least 4.5:1 for every text colour on the
// backgrounds it is used on.
import { colors } from '@/constants/theme';

function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

export function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

const pairs: Array<[keyof typeof colors, keyof typeof colors]> = [
  ['text', 'background'],
  ['text', 'surface'],
  ['text', 'surfaceAlt'],
  ['textMuted', 'background'],
  ['textMuted', 'surface'],
  ['textMuted', 'surfaceAlt'],
  ['primary', 'surface'],
  ['primary', 'background'],
  ['primary', 'primarySoft'],
  ['primaryText', 'primary'],
  ['danger', 'surface'],
  ['danger', 'dangerSoft'],
  ['warning', 'warningSoft'],
  ['note', 'noteSoft'],
  ['success', 'successSoft'],
  ['success', 'surface'],
  ['text', 'added'],
  ['text', 'removed'],
  ['text', 'warningSoft'],
];

describe('theme contrast', () => {
  it('computes the known extremes right (black on white is 21:1)', () => {
    expect(contrast('#000000', '#FFFFFF')).toBeCloseTo(21, 5);
    expect(contrast('#777777', '#FFFFFF')).toBeCloseTo(4.48, 2);
  });

  it.each(pairs)('%s on %s is at least 4.5:1', (fg, bg) => {
    expect(contrast(colors[fg], colors[bg])).toBeGreaterThanOrEqual(4.5);
  });
});
