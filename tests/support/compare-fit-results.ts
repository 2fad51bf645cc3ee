/**
 * Where resampled figures live in a fit result (percentile intervals, resampled curves), and
 * raking's remaining margin error: a residual near raking's 1e-9 tolerance, which the order of
 * floating-point sums moves by more than 1e-9 of itself.
 */
const resampledPath =
  /ciLow|ciHigh|resampledShares|stdError|tables\[\d\]\.rows\[\d+\]\[[34]\]|assumptions|maxMarginError/;

/**
 * The places where two fit results differ by more than `tolerance` relative, leaving out the
 * data hash and the figures that come from respondent resampling (compared separately).
 */
export function fixedFigureDifferences(a: unknown, b: unknown, tolerance = 1e-9): string[] {
  const found: string[] = [];
  const walk = (x: unknown, y: unknown, path: string) => {
    if (path === '.dataHash' || resampledPath.test(path)) return;
    if (typeof x === 'number' && typeof y === 'number') {
      const scale = Math.max(Math.abs(x), Math.abs(y));
      // Relative, with a floor of 1e-12 for values that are zero up to rounding.
      if (Math.abs(x - y) > Math.max(tolerance * scale, 1e-12)) found.push(`${path}: ${x} vs ${y}`);
    } else if (Array.isArray(x) && Array.isArray(y)) {
      if (x.length !== y.length) found.push(`${path}: ${x.length} vs ${y.length} entries`);
      x.forEach((v, i) => walk(v, y[i], `${path}[${i}]`));
    } else if (x && y && typeof x === 'object' && typeof y === 'object') {
      const keys = new Set([...Object.keys(x), ...Object.keys(y)]);
      for (const key of keys) {
        walk(
          (x as Record<string, unknown>)[key],
          (y as Record<string, unknown>)[key],
          `${path}.${key}`,
        );
      }
    } else if (x !== y) {
      found.push(`${path}: ${JSON.stringify(x)} vs ${JSON.stringify(y)}`);
    }
  };
  walk(a, b, '');
  return found;
}
