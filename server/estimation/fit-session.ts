import { sql } from 'drizzle-orm';
import type { FitDatabase, SqlRunner } from './in-database-model-spec';

/**
 * Runs the passes of one fit in one transaction (a savepoint inside a caller's transaction), on
 * one connection, with planner settings that suit one wide aggregate over many rows. Its own
 * transaction is REPEATABLE READ, so every pass reads the same rows even while field teams
 * sync: the residual pass reuses the first pass's row count and its NULL check. LLVM
 * inlining is switched off: on 10M rows it tripled the JIT compile time (about 80 → 260 ms in
 * each parallel process) and bought no speed, while the optimised JIT code itself halves the
 * time of the sums. SET LOCAL ends with the transaction.
 */
export function inFitSession<T>(db: FitDatabase, run: (tx: SqlRunner) => Promise<T>): Promise<T> {
  return db.transaction(
    async (tx) => {
      await tx.execute(sql`SET LOCAL jit_inline_above_cost = -1`);
      return run(tx);
    },
    { isolationLevel: 'repeatable read', accessMode: 'read only' },
  );
}
