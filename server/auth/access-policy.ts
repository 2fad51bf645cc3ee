import { match } from 'path-to-regexp';
import type { AccessRule } from './access-rule';
import { authAccess } from './auth-access';
import { featureAccess } from './feature-access';
import { healthAccess } from '../health/health-access';
import { membersAccess } from '../members/members-access';
import { decodePathSegment } from '../http/decode-path-segment';

/** Every API route with who may call it. A route missing here is refused, never open. */
export const accessPolicy: readonly AccessRule[] = [
  ...authAccess,
  ...healthAccess,
  ...membersAccess,
  ...featureAccess,
];

const matchers = accessPolicy.map((rule) => ({
  rule,
  matches: match(rule.path, { decode: decodePathSegment }),
}));

/** The rule for one request and the path's parameters, or undefined when no rule covers it. */
export function findAccessRule(
  method: string,
  path: string,
): { rule: AccessRule; params: Partial<Record<string, string | string[]>> } | undefined {
  for (const { rule, matches } of matchers) {
    if (rule.method !== method) continue;
    const found = matches(path);
    if (found) return { rule, params: found.params };
  }
  return undefined;
}
