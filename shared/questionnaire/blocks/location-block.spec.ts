import { starterBlock } from '../block-starters';
import { type LocationBlock, locationAnswerSchema, locationBlockSchema } from './location-block';

const block = starterBlock('location', 'where') as LocationBlock;
const fix = {
  latitude: -1.2921,
  longitude: 36.8219,
  accuracyMetres: 12,
  capturedAt: '2026-12-01T09:30:00+03:00',
};

describe('the location block', () => {
  it('accepts a target accuracy and refuses one below 5 m', () => {
    expect(locationBlockSchema.safeParse(block).success).toBe(true);
    expect(locationBlockSchema.safeParse({ ...block, targetAccuracyMetres: 1 }).success).toBe(
      false,
    );
  });

  it('records a fix and refuses a latitude of 123', () => {
    const schema = locationAnswerSchema(block);
    expect(schema.safeParse(fix).success).toBe(true);
    expect(schema.safeParse({ ...fix, latitude: 123 }).error?.issues[0]).toMatchObject({
      path: ['latitude'],
      message: 'Latitude runs from −90 to 90',
    });
    expect(schema.safeParse({ ...fix, capturedAt: 'yesterday' }).success).toBe(false);
  });
});
