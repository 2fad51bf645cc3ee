import { starterBlock } from '../questionnaire/block-starters';
import { photoManifestProblems, photoReferences } from './photo-references';

const tag = '0b6f2d9e-2c1a-4e7b-8d3f-5a6b7c8d9e02';
const shelfShot = '6f1c3f43-8a57-4c1e-9f0e-3b1d2a4c5e61';
const blocks = [
  starterBlock('consent', 'consent'),
  starterBlock('shelf-observation', 'shelf'),
  { ...starterBlock('photo', 'tags'), maxPhotos: 2 } as ReturnType<typeof starterBlock>,
];
const answers = {
  consent: { agreed: true },
  shelf: { priceMinor: 250, packSize: 1, quantity: 4, photoId: shelfShot },
  tags: { photoIds: [tag] },
};

describe('photoReferences', () => {
  it('finds photo-block and shelf-observation photos with their fields', () => {
    expect(photoReferences(blocks, answers)).toEqual([
      { photoId: shelfShot, path: 'answers.shelf.photoId' },
      { photoId: tag, path: 'answers.tags.photoIds.0' },
    ]);
  });
});

describe('photoManifestProblems', () => {
  it('is empty when the manifest lists exactly the referenced photos', () => {
    expect(
      photoManifestProblems(blocks, answers, [{ photoId: tag }, { photoId: shelfShot }]),
    ).toEqual([]);
  });

  it('names a referenced photo missing from the manifest, and a photo nobody refers to', () => {
    const stray = '9d0f3c1e-1111-4a2b-8c3d-4e5f6a7b8c9d';
    expect(photoManifestProblems(blocks, answers, [{ photoId: tag }, { photoId: stray }])).toEqual([
      { path: 'answers.shelf.photoId', message: 'This photo is not in the photo list' },
      { path: 'photos.1', message: 'No answer refers to this photo' },
    ]);
  });
});
