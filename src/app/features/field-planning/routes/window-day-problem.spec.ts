import { TestBed } from '@angular/core/testing';
import {
  DateAdapter,
  MAT_DATE_FORMATS,
  MAT_DATE_LOCALE,
  provideNativeDateAdapter,
} from '@angular/material/core';
import { dayExample, windowDayProblem } from './window-day-problem';

const schemaWords = 'The first day must be a real day written YYYY-MM-DD, such as 2027-03-01.';

function exampleIn(locale: string): string {
  TestBed.configureTestingModule({
    providers: [provideNativeDateAdapter(), { provide: MAT_DATE_LOCALE, useValue: locale }],
  });
  return dayExample(
    TestBed.inject<DateAdapter<Date>>(DateAdapter),
    TestBed.inject(MAT_DATE_FORMATS),
  );
}

describe('windowDayProblem', () => {
  it('writes the example day the way the field reads it in the browser’s language', () => {
    expect(exampleIn('en-US')).toBe('3/25/2027');
  });

  it('writes the example day-first where the language puts the day first', () => {
    expect(exampleIn('en-GB')).toBe('25/03/2027');
  });

  it('asks for a missing day in the field’s own format', () => {
    expect(windowDayProblem('windowStart', '', schemaWords, '3/25/2027')).toBe(
      'Choose the first day in the calendar, or type it like 3/25/2027.',
    );
  });

  it('says a typed day could not be read, e.g. a six-digit year', () => {
    const problem = 'The last day must be a real day written YYYY-MM-DD, such as 2027-03-01.';
    expect(windowDayProblem('windowEnd', '202626-12-20', problem, '3/25/2027')).toBe(
      'That is not a day we can read. Choose the last day in the calendar, or type it like 3/25/2027.',
    );
  });

  it('passes other problems of a readable day through, and shows none when there is none', () => {
    const reversed = 'The last day must be on or after the first day.';
    expect(windowDayProblem('windowEnd', '2027-04-05', reversed, '3/25/2027')).toBe(reversed);
    expect(windowDayProblem('windowEnd', '2027-04-05', null, '3/25/2027')).toBeNull();
  });
});
