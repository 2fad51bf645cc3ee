import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { QualityFlag } from '@shared/field-sync/quality/quality-flag';
import { FlagDetail } from './flag-detail';

const studyId = '5b0c7a52-4d7e-4b7a-9c1e-2f3a4b5c6d70';
const first = '0f1e2d3c-4b5a-4968-8776-655443322110';
const second = '9a8b7c6d-5e4f-4a3b-9c2d-1e0f9a8b7c6d';

async function render(flag: QualityFlag): Promise<HTMLElement> {
  TestBed.configureTestingModule({ imports: [FlagDetail], providers: [provideRouter([])] });
  const fixture = TestBed.createComponent(FlagDetail);
  fixture.componentRef.setInput('flag', flag);
  fixture.componentRef.setInput('studyId', studyId);
  await fixture.whenStable();
  return fixture.nativeElement as HTMLElement;
}

const words = (element: HTMLElement) => element.textContent.replace(/\s+/g, ' ').trim();

describe('FlagDetail', () => {
  it('names the earlier interviews of the same respondent, each a link to open it', async () => {
    const element = await render({
      kind: 'duplicate-respondent',
      otherInterviewIds: [first, second],
    });
    expect(words(element)).toBe(
      'Respondent interviewed before: same respondent as interview 0f1e2d3c, interview 9a8b7c6d',
    );
    const links = Array.from(element.querySelectorAll('a'));
    expect(links.map((link) => link.getAttribute('href'))).toEqual([
      `/review/${studyId}/interviews/${first}`,
      `/review/${studyId}/interviews/${second}`,
    ]);
  });

  it('words any other flag with its figure and no link', async () => {
    const element = await render({
      kind: 'gps-far',
      distanceM: 2400,
      accuracyM: 12,
      maxDistanceM: 250,
    });
    expect(words(element)).toBe(
      'Recorded away from the point: 2.4 km away (limit 250 m, fix accurate to 12 m)',
    );
    expect(element.querySelector('a')).toBeNull();
  });
});
