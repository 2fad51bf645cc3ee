import { BreakpointObserver } from '@angular/cdk/layout';
import { TestBed } from '@angular/core/testing';
import { of } from 'rxjs';
import type { ScheduleRow } from '@shared/analysis/fit-result';
import { FigureFormat } from '../figures/figure-format';
import { ScheduleTable } from './schedule-table';

const rows: ScheduleRow[] = [
  {
    price: 500,
    quantity: 0.957,
    ciLow: 0.93,
    ciHigh: 0.97,
    revenue: 478.5,
    elasticity: -0.1,
    extrapolated: false,
    respondents: 231,
  },
];

function headers(quantityKind: 'quantity' | 'share'): string[] {
  // A wide screen, where the revenue column shows.
  TestBed.configureTestingModule({
    providers: [
      { provide: BreakpointObserver, useValue: { observe: () => of({ matches: true }) } },
    ],
  });
  const fixture = TestBed.createComponent(ScheduleTable);
  fixture.componentRef.setInput('rows', rows);
  fixture.componentRef.setInput('quantityKind', quantityKind);
  fixture.componentRef.setInput('format', new FigureFormat('KES', 'en'));
  fixture.componentRef.setInput('confidenceLevel', 0.95);
  fixture.detectChanges();
  const element = fixture.nativeElement as HTMLElement;
  return [...element.querySelectorAll('th')].map((th) => th.textContent?.trim() ?? '');
}

describe('ScheduleTable', () => {
  it('calls price × share the revenue per potential buyer, not per buyer', () => {
    const share = headers('share');
    expect(share).toContain('Revenue per potential buyer');
    expect(share).not.toContain('Revenue per buyer');
  });

  it('calls price × quantity plain revenue', () => {
    expect(headers('quantity')).toContain('Revenue');
  });
});
