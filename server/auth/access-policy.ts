import { match } from 'path-to-regexp';
import type { AccessRule } from './access-rule';
import { authAccess } from './auth-access';
import { healthAccess } from '../health/health-access';
import { membersAccess } from '../members/members-access';

/** Every API route with who may call it. A route missing here is refused, never open. */
export const accessPolicy: readonly AccessRule[] = [
  ...authAccess,
  ...healthAccess,
  ...membersAccess,
];

const matchers = accessPolicy.map((rule) => ({
  rule,
  matches: match(rule.path, { decode: decodeURIComponent }),
}));

/** The rule for one request, or undefined when no rule covers it. */
export function findAccessRule(method: string, path: string): AccessRule | undefined {
  return matchers.find(({ rule, matches }) => rule.method === method && matches(path) !== false)
    ?.rule;
}
