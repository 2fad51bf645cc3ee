/**
 * Characters JSON leaves as they are but that still forge or hide log lines in a terminal or a
 * log viewer: C1 controls, the Unicode line and paragraph separators, and the bidirectional
 * overrides that can make text read backwards. JSON itself already escapes C0 controls and
 * newlines, so a user's value can never start a line of its own.
 */
const misleading = /[\u0080-\u009f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g;

/** One JSON log line with those characters written as `\uXXXX` escapes (still the same JSON). */
export function escapeLogLine(line: string): string {
  return line.replace(misleading, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}
