import type { ReviewQueueItem } from '@shared/field-sync/review-queue';
import { queueNeighbours } from './queue-neighbours';

const item = (id: string) => ({ id }) as ReviewQueueItem;

describe('queueNeighbours', () => {
  it('finds the interviews on either side', () => {
    expect(queueNeighbours([item('a'), item('b'), item('c')], 5, 'b')).toEqual({
      previous: { id: 'a', at: 4 },
      next: { id: 'c', at: 6 },
    });
  });

  it('has no previous at the head of the list', () => {
    expect(queueNeighbours([item('a'), item('b')], 0, 'a')).toEqual({
      previous: null,
      next: { id: 'b', at: 1 },
    });
  });

  it('has no next at the end of the list', () => {
    expect(queueNeighbours([item('a'), item('b')], 3, 'b')).toEqual({
      previous: { id: 'a', at: 2 },
      next: null,
    });
  });

  it('takes the interview now at the current place as next when a decision removed the current', () => {
    expect(queueNeighbours([item('a'), item('c'), item('d')], 5, 'b')).toEqual({
      previous: { id: 'a', at: 4 },
      next: { id: 'c', at: 5 },
    });
  });
});
