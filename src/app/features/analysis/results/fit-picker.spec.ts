import { ComponentFixture, TestBed } from '@angular/core/testing';
import type { FitSummary } from '@shared/analysis/fit-resource';
import type { FitSpecOf } from '@shared/analysis/fit-spec';
import { shelfFitSpec } from '../testing/fit-spec-fixtures';
import { FitPicker } from './fit-picker';

const spec = shelfFitSpec;
const summary = (id: string, fitSpec: FitSpecOf<'observed-prices'>): FitSummary => ({
  id,
  studyId: '0a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d',
  spec: fitSpec,
  status: 'done',
  progress: 100,
  error: null,
  dataHash: 'abc',
  createdBy: null,
  createdAt: '2026-12-02T08:05:00.000Z',
  startedAt: null,
  finishedAt: null,
  n: 72,
  hasSchedule: true,
});
const fits = [
  summary('3c4d5e6f-7a8b-4c9d-8e0f-1a2b3c4d5e6f', spec),
  summary('4c4d5e6f-7a8b-4c9d-8e0f-1a2b3c4d5e6f', {
    ...spec,
    form: 'linear',
    instrument: 'peer-price',
  }),
];

describe('FitPicker', () => {
  let fixture: ComponentFixture<FitPicker>;
  let element: HTMLElement;

  beforeEach(async () => {
    fixture = TestBed.createComponent(FitPicker);
    fixture.componentRef.setInput('fits', fits);
    fixture.componentRef.setInput('selected', fits[1].id);
    element = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  });

  it('says under the choice what sets the chosen fit apart', () => {
    expect(element.querySelector('.picker__details')?.textContent).toContain(
      'linear · instrumented by peer price (2SLS)',
    );
  });

  it('gives two fits of one method and size different second lines in the list', async () => {
    element.querySelector<HTMLElement>('.mat-mdc-select-trigger')!.click();
    await fixture.whenStable();
    const details = Array.from(document.querySelectorAll('mat-option .fit-option__details')).map(
      (d) => d.textContent?.trim(),
    );
    expect(details).toHaveLength(2);
    expect(details[0]).toContain('log-log');
    expect(details[1]).toContain('linear');
    expect(new Set(details).size).toBe(2);
  });
});
