import { Injectable, inject } from '@angular/core';
import { Session } from '../../../core/session';
import { FieldDb, fieldDbName } from './field-db';

/** The field database of the person signed in, opened once per person. */
@Injectable({ providedIn: 'root' })
export class FieldStore {
  private readonly session = inject(Session);
  private opened: FieldDb | null = null;

  get db(): FieldDb {
    const userId = this.session.info()?.user.id;
    if (!userId) throw new Error('The field database needs a signed-in enumerator');
    if (this.opened?.name !== fieldDbName(userId)) {
      this.opened?.close();
      this.opened = new FieldDb(userId);
    }
    return this.opened;
  }

  /** Writes a line of sync history, keeping the last 200. */
  async log(ok: boolean, message: string): Promise<void> {
    const db = this.db;
    await db.syncLog.add({ at: new Date().toISOString(), ok, message });
    const count = await db.syncLog.count();
    if (count > 200) {
      const oldest = await db.syncLog
        .orderBy('id')
        .limit(count - 200)
        .primaryKeys();
      await db.syncLog.bulkDelete(oldest);
    }
  }
}
