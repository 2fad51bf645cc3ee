/**
 * Colours of the analysis charts. Canvas drawing cannot read CSS custom properties cheaply, so
 * the theme's ink teal and amber are repeated here; the others are chosen to stay apart from
 * them and from each other for readers with the common colour-vision deficiencies.
 */
export const chartColours = {
  ink: '#13525a',
  amber: '#a86f00',
  plum: '#7a3b69',
  moss: '#3f6b21',
  slate: '#4a5a8a',
  brick: '#a0412d',
  grid: 'rgba(20, 40, 45, 0.12)',
  text: '#2b3f42',
} as const;

/** Series colours in the order curves are drawn. */
export const seriesColours: readonly string[] = [
  chartColours.ink,
  chartColours.amber,
  chartColours.plum,
  chartColours.moss,
  chartColours.slate,
  chartColours.brick,
];

/** The colour of the k-th series; the list repeats after six. */
export function seriesColour(index: number): string {
  return seriesColours[index % seriesColours.length];
}

/** A #rrggbb colour with an alpha channel, for bands and shaded areas. */
export function withAlpha(hex: string, alpha: number): string {
  const value = Number.parseInt(hex.slice(1), 16);
  const r = (value >> 16) & 255;
  const g = (value >> 8) & 255;
  const b = value & 255;
  return `rgba(${r}, ${g}, ${b}, ${alpha})`;
}
