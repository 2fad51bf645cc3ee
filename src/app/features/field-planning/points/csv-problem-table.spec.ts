import { TestBed } from '@angular/core/testing';
import type { CsvProblem } from '@shared/sampling/csv-problem';
import { CsvProblemTable } from './csv-problem-table';

const problems: CsvProblem[] = [
  { line: 1, column: 'point_kind', message: 'Missing column; it is required.' },
  { line: 4, column: 'latitude', message: 'Latitude 123 is outside −90 to 90.' },
  { line: 7, column: '', message: 'This row has 6 cells but the header has 7.' },
];

function render(list: CsvProblem[], fileName = '') {
  const fixture = TestBed.createComponent(CsvProblemTable);
  fixture.componentRef.setInput('problems', list);
  fixture.componentRef.setInput('fileName', fileName);
  fixture.detectChanges();
  return fixture.nativeElement as HTMLElement;
}

const cellsOf = (element: HTMLElement) =>
  [...element.querySelectorAll('tbody tr')].map((row) =>
    [...row.querySelectorAll('td')].map((cell) => cell.textContent?.trim()),
  );

describe('CsvProblemTable', () => {
  it('lists each problem with its line, column and message, in file order', () => {
    const element = render(problems, 'points.csv');
    expect(cellsOf(element)).toEqual([
      ['1', 'point_kind', 'Missing column; it is required.'],
      ['4', 'latitude', 'Latitude 123 is outside −90 to 90.'],
      ['7', 'whole row', 'This row has 6 cells but the header has 7.'],
    ]);
  });

  it('says which file was refused, how many problems it has, and that nothing was stored', () => {
    const element = render(problems, 'points.csv');
    expect(element.querySelector('h3')?.textContent).toMatch(
      /points\.csv was not imported:\s+3 problems/,
    );
    expect(element.textContent).toContain('Nothing was stored.');
  });

  it('announces itself to screen readers and uses one problem in the singular', () => {
    const element = render([problems[1]]);
    expect(element.querySelector('[role="alert"]')).not.toBeNull();
    expect(element.querySelector('h3')?.textContent?.trim()).toBe(
      'The file was not imported: 1 problem',
    );
    expect(element.querySelectorAll('th[scope="col"]').length).toBe(3);
  });
});
