import { starterBlock } from '../../questionnaire/block-starters';
import { gpsFarFlag, interviewFix } from './gps-far-flag';
import { earthMeanRadiusM } from './great-circle-distance';

const point = { latitude: -0.1, longitude: 34.7 };
/** Metres per degree of latitude on the mean sphere (arc = radius × angle). */
const metresPerDegree = (earthMeanRadiusM * Math.PI) / 180;
const north = (metres: number) => ({
  latitude: point.latitude + metres / metresPerDegree,
  longitude: point.longitude,
  accuracyM: 12,
});

describe('gpsFarFlag (limit: 250 m, Fieldcurve common practice)', () => {
  it('flags a fix 400 m north of the point and stores the distance', () => {
    expect(gpsFarFlag(north(400), point)).toEqual({
      kind: 'gps-far',
      distanceM: 400,
      accuracyM: 12,
      maxDistanceM: 250,
    });
  });

  it('does not flag a fix 240 m away, nor a missing fix', () => {
    expect(gpsFarFlag(north(240), point)).toBeNull();
    expect(gpsFarFlag(null, point)).toBeNull();
  });
});

describe('interviewFix', () => {
  const blocks = [starterBlock('consent', 'consent'), starterBlock('location', 'where')];
  const located = {
    where: { latitude: 1, longitude: 2, accuracyMetres: 30, capturedAt: '2027-03-01T09:00:00Z' },
  };

  it('prefers the interview-level fix', () => {
    expect(interviewFix(north(0), blocks, located)).toEqual(north(0));
  });

  it('falls back on the first answered location block, then on nothing', () => {
    expect(interviewFix(undefined, blocks, located)).toEqual({
      latitude: 1,
      longitude: 2,
      accuracyM: 30,
    });
    expect(interviewFix(undefined, blocks, {})).toBeNull();
  });
});
