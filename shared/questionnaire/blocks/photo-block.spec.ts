import { starterBlock } from '../block-starters';
import { type PhotoBlock, photoAnswerSchema, photoBlockSchema } from './photo-block';

const block = starterBlock('photo', 'tag') as PhotoBlock;
const id = (n: number) => `0b8f3a4e-6c1d-4e2f-9a7b-5c3d2e1f0a9${n}`;

describe('the photo block', () => {
  it('needs a subject', () => {
    expect(photoBlockSchema.safeParse(block).success).toBe(true);
    expect(photoBlockSchema.safeParse({ ...block, subject: '' }).error?.issues[0].message).toBe(
      'Say what to photograph',
    );
  });

  it('takes one photo up to the block’s maximum', () => {
    const schema = photoAnswerSchema({ ...block, maxPhotos: 2 });
    expect(schema.safeParse({ photoIds: [id(1)] }).success).toBe(true);
    expect(schema.safeParse({ photoIds: [] }).success).toBe(false);
    expect(schema.safeParse({ photoIds: [id(1), id(2), id(3)] }).error?.issues[0].message).toBe(
      'At most 2 photos',
    );
    expect(schema.safeParse({ photoIds: ['tag.jpg'] }).success).toBe(false);
  });
});
