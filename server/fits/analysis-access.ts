import type { AccessRule } from '../auth/access-rule';
import { tokensAccess } from '../portal/tokens-access';
import { readApiAccess } from '../read-api/read-api-access';
import { schedulesAccess } from '../schedules/schedules-access';
import { fitsAccess } from './fits-access';

/** Access rules of analysis, publishing, the client's portal and the read API. */
export const analysisAccess: readonly AccessRule[] = [
  ...fitsAccess,
  ...schedulesAccess,
  ...tokensAccess,
  ...readApiAccess,
];
