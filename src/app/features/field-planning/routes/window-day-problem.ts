import type { DateAdapter, MatDateFormats } from '@angular/material/core';

const isoDay = /^\d{4}-\d{2}-\d{2}$/;

const dayNames = { windowStart: 'the first day', windowEnd: 'the last day' } as const;

/** Which end of the route's window a problem is about. */
export type WindowEnd = keyof typeof dayNames;

/**
 * A day written the way the date field reads typed text in this browser, e.g. "3/25/2027" or
 * "25/03/2027". The 25th makes the order of day and month plain to see.
 */
export function dayExample(adapter: DateAdapter<Date>, formats: MatDateFormats): string {
  return adapter.format(new Date(2027, 2, 25), formats.display.dateInput);
}

/**
 * The problem to show under a window date. The shared schema asks for an ISO day, which is what the
 * API takes; a person types into a field that reads their own locale's format, so a missing or
 * unreadable day is explained in that format instead. Other problems (a reversed window, the
 * server's answer) pass through.
 */
export function windowDayProblem(
  end: WindowEnd,
  day: string,
  problem: string | null,
  example: string,
): string | null {
  if (!problem || isoDay.test(day)) return problem;
  const name = dayNames[end];
  const sentence = `Choose ${name} in the calendar, or type it like ${example}.`;
  return day === '' ? sentence : `That is not a day we can read. ${sentence}`;
}
