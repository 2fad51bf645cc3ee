import { earthMeanRadiusM } from '@shared/field-sync/quality/great-circle-distance';

export interface Position {
  readonly latitude: number;
  readonly longitude: number;
}

/** Where the two markers, the accuracy circle and the scale bar go in a square drawing. */
export interface PlotLayout {
  readonly point: { x: number; y: number };
  readonly device: { x: number; y: number };
  readonly accuracyRadius: number;
  readonly scaleBar: { length: number; metres: number };
}

const niceSteps = [1, 2, 5];

/**
 * Lays out the assigned point and the device's fix in a `size` × `size` drawing, north up, on a
 * local flat projection around the point (equirectangular: fine at the few kilometres a field
 * check looks at). The view spans both positions and the fix's accuracy circle, with margins.
 */
export function plotLayout(
  point: Position,
  device: Position,
  accuracyM: number | null,
  size: number,
): PlotLayout {
  const east = (p: Position) =>
    ((p.longitude - point.longitude) *
      Math.PI *
      earthMeanRadiusM *
      Math.cos((point.latitude * Math.PI) / 180)) /
    180;
  const north = (p: Position) => ((p.latitude - point.latitude) * Math.PI * earthMeanRadiusM) / 180;
  const dx = east(device);
  const dy = north(device);
  const reach = Math.max(Math.abs(dx), Math.abs(dy)) + (accuracyM ?? 0);
  const halfSpanM = Math.max(reach * 1.25, 25);
  const scale = size / 2 / halfSpanM;
  const centre = size / 2;
  const barMetres = niceLength(halfSpanM / 2);
  return {
    point: { x: centre, y: centre },
    device: { x: centre + dx * scale, y: centre - dy * scale },
    accuracyRadius: (accuracyM ?? 0) * scale,
    scaleBar: { length: barMetres * scale, metres: barMetres },
  };
}

/** The largest 1, 2 or 5 × 10ⁿ metres not above `metres`. */
export function niceLength(metres: number): number {
  const power = 10 ** Math.floor(Math.log10(metres));
  const step = [...niceSteps].reverse().find((s) => s * power <= metres) ?? 1;
  return step * power;
}
