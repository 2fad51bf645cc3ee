import { TestBed } from '@angular/core/testing';
import type { DetailTable } from '@shared/analysis/fit-result';
import { FigureFormat } from '../figures/figure-format';
import { DetailTableView } from './detail-table-view';

const ladder = (steps: number): DetailTable => ({
  title: 'Ladder steps',
  columns: ['Price', 'Respondents'],
  columnUnits: ['price', 'count'],
  rows: Array.from({ length: steps }, (_, k) => [800 + 300 * k, 231]),
});

function render(table: DetailTable): HTMLElement {
  const fixture = TestBed.createComponent(DetailTableView);
  fixture.componentRef.setInput('table', table);
  fixture.componentRef.setInput('format', new FigureFormat('KES', 'en'));
  fixture.detectChanges();
  return fixture.nativeElement as HTMLElement;
}

describe('DetailTableView', () => {
  it('shows a short ladder whole, without an inner scroll box', () => {
    const element = render(ladder(7));
    expect(element.querySelector('.table-scroll--tall')).toBeNull();
    expect(element.querySelector('.scroll-hint')).toBeNull();
    expect(element.querySelectorAll('tbody tr').length).toBe(7);
    expect(element.textContent).toContain('2,600');
  });

  it('says above a long table that it scrolls, and how many rows it has', () => {
    const element = render(ladder(40));
    const box = element.querySelector('.table-scroll--tall');
    expect(box).not.toBeNull();
    const hint = element.querySelector('.scroll-hint');
    expect(hint?.textContent).toContain('40 rows: scroll inside the table to see them all.');
    expect(box?.getAttribute('aria-describedby')).toBe(hint?.id);
  });
});
