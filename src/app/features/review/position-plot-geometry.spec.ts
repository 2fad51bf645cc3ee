import { niceLength, plotLayout } from './position-plot-geometry';

describe('plotLayout', () => {
  const point = { latitude: 0, longitude: 0 };

  it('puts the point in the middle and a fix to the north-east up and to the right', () => {
    const layout = plotLayout(point, { latitude: 0.001, longitude: 0.001 }, null, 200);
    expect(layout.point).toEqual({ x: 100, y: 100 });
    expect(layout.device.x).toBeGreaterThan(100);
    expect(layout.device.y).toBeLessThan(100);
    // Equal offsets in degrees at the equator are equal distances: a 45° diagonal.
    expect(layout.device.x - 100).toBeCloseTo(100 - layout.device.y, 6);
  });

  it('keeps the fix and its accuracy circle inside the drawing', () => {
    const layout = plotLayout(point, { latitude: 0.01, longitude: 0 }, 300, 200);
    expect(layout.device.y - layout.accuracyRadius).toBeGreaterThanOrEqual(0);
  });

  it('draws a scale bar of a round length that matches the drawing scale', () => {
    // 0.009° of latitude ≈ 1000.8 m on the mean-radius sphere (2πR/360 ≈ 111 195 m per degree).
    const layout = plotLayout(point, { latitude: 0.009, longitude: 0 }, null, 200);
    const pixelsPerMetre = (100 - layout.device.y) / 1000.75;
    expect(layout.scaleBar.length / layout.scaleBar.metres).toBeCloseTo(pixelsPerMetre, 3);
  });
});

describe('niceLength', () => {
  it.each([
    [7, 5],
    [12, 10],
    [260, 200],
    [999, 500],
  ])('rounds %i m down to %i m', (metres, nice) => {
    expect(niceLength(metres)).toBe(nice);
  });
});
