import type { Role } from '@shared/auth/role';
import type { Study } from '@shared/studies/study';
import type { studies } from '../db/schema';

/** A stored study as the API shows it to someone holding `myRoles` in it. */
export function toStudy(row: typeof studies.$inferSelect, myRoles: Role[]): Study {
  return {
    id: row.id,
    name: row.name,
    productName: row.productName,
    secondProductName: row.secondProductName,
    currency: row.currency,
    locale: row.locale,
    market: row.market,
    targetSample: row.targetSample,
    priceMinMinor: row.priceMinMinor,
    priceMaxMinor: row.priceMaxMinor,
    status: row.status,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    myRoles,
  };
}
