import { earthMeanRadiusM, greatCircleDistanceM } from './great-circle-distance';

const R = earthMeanRadiusM;

describe('greatCircleDistanceM', () => {
  it('is zero between a point and itself', () => {
    const p = { latitude: -1.2921, longitude: 36.8219 };
    expect(greatCircleDistanceM(p, p)).toBe(0);
  });

  it('is R·π/180 for one degree along a meridian', () => {
    // Arc length = radius × angle (geometry of the sphere).
    const d = greatCircleDistanceM({ latitude: 10, longitude: 5 }, { latitude: 11, longitude: 5 });
    expect(d).toBeCloseTo((R * Math.PI) / 180, 6);
  });

  it('is R·π/2 from the equator to a pole and R·π between antipodes', () => {
    // Quarter and half of a great circle (geometry of the sphere).
    const equator = { latitude: 0, longitude: 30 };
    expect(greatCircleDistanceM(equator, { latitude: 90, longitude: 0 })).toBeCloseTo(
      (R * Math.PI) / 2,
      4,
    );
    expect(
      greatCircleDistanceM({ latitude: 0, longitude: 0 }, { latitude: 0, longitude: 180 }),
    ).toBeCloseTo(R * Math.PI, 4);
  });

  it('shrinks a degree of longitude by cos(latitude) for small steps', () => {
    // On a sphere a short east–west step at latitude φ is R·cos φ·Δλ (geometry of the sphere).
    const step = 0.001;
    const d = greatCircleDistanceM(
      { latitude: 60, longitude: 0 },
      { latitude: 60, longitude: step },
    );
    expect(d).toBeCloseTo(R * Math.cos(Math.PI / 3) * ((step * Math.PI) / 180), 3);
  });

  it('is symmetric and crosses the antimeridian the short way', () => {
    const a = { latitude: 0, longitude: 179.999 };
    const b = { latitude: 0, longitude: -179.999 };
    expect(greatCircleDistanceM(a, b)).toBeCloseTo(greatCircleDistanceM(b, a), 9);
    expect(greatCircleDistanceM(a, b)).toBeCloseTo((R * 0.002 * Math.PI) / 180, 3);
  });
});
