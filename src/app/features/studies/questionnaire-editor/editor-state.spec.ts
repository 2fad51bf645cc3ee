import { TestBed } from '@angular/core/testing';
import type { Block } from '@shared/questionnaire/block';
import { starterBlock } from '@shared/questionnaire/block-starters';
import { EditorState } from './editor-state';

describe('EditorState', () => {
  let state: EditorState;
  const ids = () => state.items().map((item) => item.block.id);

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [EditorState] });
    state = TestBed.inject(EditorState);
    state.load({
      blocks: [starterBlock('consent', 'consent'), starterBlock('single-choice', 'owns')],
    });
  });

  it('loads a stored definition with nothing unsaved and no problems', () => {
    expect(ids()).toEqual(['consent', 'owns']);
    expect(state.dirty()).toBe(false);
    expect(state.problems()).toEqual([]);
  });

  it('adds a block after the selected one with a fresh id, and selects it', () => {
    state.select(state.items()[0].key);
    state.add('number');
    state.add('number');
    expect(ids()).toEqual(['consent', 'number', 'number-2', 'owns']);
    expect(state.selectedKey()).toBe(state.items()[2].key);
    expect(state.dirty()).toBe(true);
  });

  it('starts money blocks from the study’s price range', () => {
    state.add('price-ladder', { priceMinMinor: 50000, priceMaxMinor: 400000 });
    state.add('wtp-open', { priceMinMinor: 50000, priceMaxMinor: 400000 });
    const [ladder, open] = state
      .items()
      .slice(2)
      .map((item) => item.block);
    expect(ladder).toMatchObject({ pricesMinor: [50000, 100000, 200000, 300000, 400000] });
    expect(open).toMatchObject({ maxMinor: 1200000 });
    expect(state.problems()).toEqual([]);
  });

  it('adds at the end when nothing is selected', () => {
    state.add('text');
    expect(ids()).toEqual(['consent', 'owns', 'text']);
  });

  it('moves blocks by drag positions and by one step, within bounds', () => {
    state.add('text');
    state.move(2, 0);
    expect(ids()).toEqual(['text', 'consent', 'owns']);
    state.moveBy(state.items()[0].key, -1);
    expect(ids()).toEqual(['text', 'consent', 'owns']);
    state.moveBy(state.items()[0].key, 1);
    expect(ids()).toEqual(['consent', 'text', 'owns']);
  });

  it('finds the problems a move creates, tied to the block', () => {
    state.move(1, 0);
    expect(state.problems().map((p) => [p.blockId, p.message])).toEqual([
      ['consent', 'Consent must be the first block'],
    ]);
    const consentKey = state.items()[1].key;
    expect(state.problemsByKey().get(consentKey)?.length).toBe(1);
  });

  it('removes a block and forgets the selection of it', () => {
    const owns = state.items()[1].key;
    state.select(owns);
    state.remove(owns);
    expect(ids()).toEqual(['consent']);
    expect(state.selectedKey()).toBeNull();
  });

  it('reports a ladder with falling prices until it is fixed', () => {
    state.add('price-ladder');
    const item = state.items()[2];
    const ladder = { ...item.block, pricesMinor: [300, 200] } as Block;
    state.update(item.key, ladder);
    expect(state.problems()).toEqual([
      {
        blockIndex: 2,
        blockId: 'price-ladder',
        path: 'pricesMinor.1',
        message: 'Each price must be higher than the one before: price 2 is not',
      },
    ]);
    state.update(item.key, { ...ladder, pricesMinor: [200, 300] } as Block);
    expect(state.problems()).toEqual([]);
  });

  it('carries skip conditions along when a block is renamed', () => {
    state.add('text');
    const text = state.items()[2];
    state.update(text.key, {
      ...text.block,
      showIf: { blockId: 'owns', test: 'equals', value: 'yes' },
    });
    const owns = state.items()[1];
    state.update(owns.key, { ...owns.block, id: 'owns-lamp' });
    expect(state.items()[2].block.showIf).toEqual({
      blockId: 'owns-lamp',
      test: 'equals',
      value: 'yes',
    });
    expect(state.problems()).toEqual([]);
  });

  it('selects the block of a problem by its index, and clears unsaved changes on save', () => {
    state.add('number');
    expect(state.selectIndex(1)).toBe(state.items()[1].key);
    state.markSaved();
    expect(state.dirty()).toBe(false);
  });
});
