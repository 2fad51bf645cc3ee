import { problemFieldLabels, problemFieldLabelsByKind } from './problem-field-labels';

/**
 * A problem's field path as the editor labels that field: `pricesMinor.1` → "Price 2",
 * `bidDesign.levels.0.afterYesMinor` → "Bid 1, after a yes (higher)". Empty when the problem
 * is about the block as a whole (its place in the questionnaire, say), which has no field.
 * A path the editor has no field for is named by its nearest labelled parent, or in words.
 */
export function problemFieldLabel(path: string, kind?: string): string {
  const parts = path === '' ? [] : path.split('.');
  if (parts.length === 0 || parts[0] === 'kind') return '';
  const labels = { ...problemFieldLabels, ...problemFieldLabelsByKind[kind ?? ''] };
  for (let end = parts.length; end > 0; end--) {
    const positions = parts.slice(0, end).filter((part) => /^\d+$/.test(part));
    const pattern = parts
      .slice(0, end)
      .map((part) => (/^\d+$/.test(part) ? '#' : part))
      .join('.');
    const label = labels[pattern];
    if (label !== undefined) {
      let next = 0;
      return label.replace(/#/g, () => String(Number(positions[next++]) + 1));
    }
  }
  return inWords(parts);
}

/**
 * A path from the server (`definition.blocks.2.pricesMinor.1`) as the problem list words it:
 * "Block 3 · Price 2".
 */
export function serverIssueWhere(
  path: string,
  kindAt: (index: number) => string | undefined,
): string {
  const match = /^(?:definition\.)?blocks\.(\d+)(?:\.(.*))?$/.exec(path);
  if (!match) return 'Questionnaire';
  const index = Number(match[1]);
  const field = problemFieldLabel(match[2] ?? '', kindAt(index));
  return field ? `Block ${index + 1} · ${field}` : `Block ${index + 1}`;
}

function inWords(parts: readonly string[]): string {
  const words = parts
    .filter((part) => !/^\d+$/.test(part))
    .map((part) =>
      part
        .replace(/Minor$/, '')
        .replace(/([a-z])([A-Z])/g, '$1 $2')
        .toLowerCase(),
    )
    .join(', ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}
