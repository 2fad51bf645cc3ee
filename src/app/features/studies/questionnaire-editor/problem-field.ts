/**
 * A problem's field path in words: `bidDesign.levels.0.afterYesMinor` → "bid design, level 1,
 * after yes". Positions count from one, as people do; "minor" (units) is left out.
 */
export function problemFieldLabel(path: string): string {
  if (path === '') return '';
  const words: string[] = [];
  for (const part of path.split('.')) {
    if (/^\d+$/.test(part)) {
      const last = words.pop() ?? 'item';
      words.push(`${last.replace(/s$/, '')} ${Number(part) + 1}`);
    } else {
      words.push(
        part
          .replace(/Minor$/, '')
          .replace(/([a-z])([A-Z])/g, '$1 $2')
          .toLowerCase(),
      );
    }
  }
  return words.join(', ');
}
