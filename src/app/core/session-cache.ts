import { Injectable } from '@angular/core';
import type { SessionInfo } from '@shared/auth/session';

const databaseName = 'fieldcurve-session';
const storeName = 'session';
const entryKey = 'current';

/**
 * The last session an enumerator opened online, kept in IndexedDB so the field pages open on a
 * device with no network. Only enumerators are remembered: other roles work online, and a
 * shared office computer should not keep anyone signed in. Plain IndexedDB rather than the
 * field database keeps this out of the start-up bundle's dependencies.
 */
@Injectable({ providedIn: 'root' })
export class SessionCache {
  async remember(info: SessionInfo): Promise<void> {
    if (!info.roles.includes('enumerator')) return this.forget();
    await this.run('readwrite', (store) => store.put(info, entryKey));
  }

  async recall(): Promise<SessionInfo | null> {
    const found = await this.run<unknown>('readonly', (store) => store.get(entryKey));
    return isSessionInfo(found) ? found : null;
  }

  async forget(): Promise<void> {
    await this.run('readwrite', (store) => store.delete(entryKey));
  }

  /** One request in its own transaction; resolves to null where IndexedDB is unavailable. */
  private async run<T>(
    mode: IDBTransactionMode,
    request: (store: IDBObjectStore) => IDBRequest,
  ): Promise<T | null> {
    const db = await openDatabase();
    if (!db) return null;
    try {
      return await new Promise<T | null>((resolve, reject) => {
        const transaction = db.transaction(storeName, mode);
        const pending = request(transaction.objectStore(storeName));
        transaction.oncomplete = () => resolve((pending.result as T | undefined) ?? null);
        transaction.onerror = () => reject(transaction.error ?? new Error('IndexedDB failed'));
      });
    } finally {
      db.close();
    }
  }
}

function openDatabase(): Promise<IDBDatabase | null> {
  if (typeof indexedDB === 'undefined') return Promise.resolve(null);
  return new Promise((resolve) => {
    const opening = indexedDB.open(databaseName, 1);
    opening.onupgradeneeded = () => opening.result.createObjectStore(storeName);
    opening.onsuccess = () => resolve(opening.result);
    // Private windows may refuse storage: the app then simply works online only.
    opening.onerror = () => resolve(null);
  });
}

function isSessionInfo(value: unknown): value is SessionInfo {
  if (typeof value !== 'object' || value === null) return false;
  const { user, organisation, roles, csrfToken } = value as Record<string, unknown>;
  return (
    typeof user === 'object' &&
    user !== null &&
    typeof organisation === 'object' &&
    organisation !== null &&
    Array.isArray(roles) &&
    typeof csrfToken === 'string'
  );
}
