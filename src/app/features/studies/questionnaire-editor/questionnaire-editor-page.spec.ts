import { TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import { provideRouter } from '@angular/router';
import { starterBlock } from '@shared/questionnaire/block-starters';
import type { QuestionnaireVersion } from '@shared/questionnaire/questionnaire-resource';
import type { Study } from '@shared/studies/study';
import { of } from 'rxjs';
import { QuestionnairesApi } from '../questionnaires-api';
import { StudiesApi } from '../studies-api';
import { EditorState } from './editor-state';
import { LeaveDialog } from './leave-dialog';
import { QuestionnaireEditorPage } from './questionnaire-editor-page';

const study = {
  id: 'b5a1c0de-0000-4000-8000-000000000001',
  name: 'Filter pricing',
  currency: 'KES',
  locale: 'en-KE',
  priceMinMinor: 50000,
  priceMaxMinor: 400000,
  myRoles: ['researcher'],
} as Study;

function draft(status: QuestionnaireVersion['status']): QuestionnaireVersion {
  return {
    id: 'v1',
    questionnaireId: 'q1',
    version: 1,
    status,
    createdAt: '2026-03-01T08:00:00.000Z',
    publishedAt: null,
    blockCount: 1,
    definition: { blocks: [starterBlock('consent', 'consent')] },
  };
}

describe('QuestionnaireEditorPage', () => {
  async function render(status: QuestionnaireVersion['status'] = 'draft') {
    const version = draft(status);
    TestBed.configureTestingModule({
      imports: [QuestionnaireEditorPage],
      providers: [
        provideRouter([]),
        { provide: StudiesApi, useValue: { get: () => of(study) } },
        {
          provide: QuestionnairesApi,
          useValue: {
            get: () => of({ id: 'q1', studyId: study.id, title: 'Filters', versions: [version] }),
            version: () => of(version),
          },
        },
      ],
    });
    const fixture = TestBed.createComponent(QuestionnaireEditorPage);
    fixture.componentRef.setInput('studyId', study.id);
    fixture.componentRef.setInput('questionnaireId', 'q1');
    await fixture.whenStable();
    const element = fixture.nativeElement as HTMLElement;
    const add = async (label: string) => {
      const palette = element.querySelector('app-block-palette')!;
      const buttons = Array.from(palette.querySelectorAll('button'));
      buttons.find((button) => button.textContent?.trim().endsWith(label))!.click();
      await fixture.whenStable();
    };
    const unload = () => {
      const event = new Event('beforeunload', { cancelable: true });
      window.dispatchEvent(event);
      return event;
    };
    const state = fixture.debugElement.injector.get(EditorState);
    return { page: fixture.componentInstance, element, state, add, unload };
  }

  it('holds nothing unsaved when a draft opens, so the browser lets the tab close', async () => {
    const { page, unload } = await render();
    expect(page.hasUnsavedChanges()).toBe(false);
    expect(unload().defaultPrevented).toBe(false);
  });

  it('asks the browser to warn on closing or reloading once there are unsaved changes', async () => {
    const { page, add, unload } = await render();
    await add('Number');
    expect(page.hasUnsavedChanges()).toBe(true);
    expect(unload().defaultPrevented).toBe(true);
  });

  it('starts new money blocks from the study’s price range', async () => {
    const { state, add } = await render();
    await add('Price ladder');
    await add('Most they would pay');
    const [, ladder, open] = state.definition().blocks;
    expect(ladder).toMatchObject({ pricesMinor: [50000, 100000, 200000, 300000, 400000] });
    expect(open).toMatchObject({ minMinor: 0, maxMinor: 1200000 });
  });

  it('never counts a published version as unsaved', async () => {
    const { page, element } = await render('published');
    expect(element.querySelector('app-block-palette')).toBeNull();
    expect(page.hasUnsavedChanges()).toBe(false);
  });
});

describe('QuestionnaireEditorPage version menu', () => {
  const open = vi.fn();
  const versions = [
    { ...draft('draft'), id: 'v2', version: 2 },
    { ...draft('published'), id: 'v1', version: 1, publishedAt: '2026-03-02T08:00:00.000Z' },
  ];
  const loadVersion = vi.fn((_study: string, _questionnaire: string, number: number) =>
    of(versions.find((v) => v.version === number)!),
  );

  async function render() {
    open.mockReset();
    loadVersion.mockClear();
    TestBed.configureTestingModule({
      imports: [QuestionnaireEditorPage],
      providers: [
        provideRouter([]),
        { provide: StudiesApi, useValue: { get: () => of(study) } },
        {
          provide: QuestionnairesApi,
          useValue: {
            get: () => of({ id: 'q1', studyId: study.id, title: 'Filters', versions }),
            version: loadVersion,
          },
        },
        { provide: MatDialog, useValue: { open } },
      ],
    });
    const fixture = TestBed.createComponent(QuestionnaireEditorPage);
    fixture.componentRef.setInput('studyId', study.id);
    fixture.componentRef.setInput('questionnaireId', 'q1');
    await fixture.whenStable();
    const element = fixture.nativeElement as HTMLElement;
    const state = fixture.debugElement.injector.get(EditorState);
    const choose = async (label: string) => {
      element.querySelector<HTMLElement>('.mat-mdc-select-trigger')!.click();
      await fixture.whenStable();
      Array.from(document.querySelectorAll<HTMLElement>('mat-option'))
        .find((option) => option.textContent?.includes(label))!
        .click();
      await fixture.whenStable();
    };
    const menuShows = () => element.querySelector('.mat-mdc-select-value')?.textContent?.trim();
    return { fixture, state, choose, menuShows };
  }

  function answerLeave(discard: boolean) {
    open.mockReturnValue({ afterClosed: () => of(discard) });
  }

  it('opens another version straight away when nothing is unsaved', async () => {
    const { state, choose, menuShows } = await render();
    await choose('Version 1');
    expect(open).not.toHaveBeenCalled();
    expect(loadVersion).toHaveBeenLastCalledWith(study.id, 'q1', 1);
    expect(state.dirty()).toBe(false);
    expect(menuShows()).toContain('Version 1');
  });

  it('asks before another version replaces unsaved edits, and opens it on discard', async () => {
    const { state, choose, menuShows } = await render();
    state.add('number');
    answerLeave(true);
    await choose('Version 1');
    expect(open).toHaveBeenCalledWith(LeaveDialog);
    expect(loadVersion).toHaveBeenLastCalledWith(study.id, 'q1', 1);
    expect(state.dirty()).toBe(false);
    expect(state.definition().blocks).toHaveLength(1);
    expect(menuShows()).toContain('Version 1');
  });

  it('keeps the edits and the version being edited in the menu when the researcher stays', async () => {
    const { state, choose, menuShows } = await render();
    state.add('number');
    answerLeave(false);
    await choose('Version 1');
    expect(open).toHaveBeenCalledWith(LeaveDialog);
    expect(loadVersion).not.toHaveBeenCalledWith(study.id, 'q1', 1);
    expect(state.dirty()).toBe(true);
    expect(state.definition().blocks.map((block) => block.kind)).toEqual(['consent', 'number']);
    expect(menuShows()).toContain('Version 2');
    expect(menuShows()).not.toContain('Version 1');
  });
});
