/** A save that fails is shown as failed: never "All edits saved" after it. */
import { describe, expect, it } from 'vitest';
import { Session } from '../../../src/app/session/session.svelte.ts';
import { LedgerDB } from '../../../src/db/LedgerDB.ts';

describe('a failed save', () => {
  it('sets saveFailed and an error notice; the next successful write clears it', async () => {
    const db = new LedgerDB(`save-failure-${Math.random()}`);
    const session = new Session();
    try {
      await session.start(db);
      const ws = session.workspace!;
      expect(ws).toBeDefined();
      // Make the store refuse the next write, as a full disk would.
      const idb = db.backendDB();
      const transaction = idb.transaction.bind(idb);
      (idb as unknown as { transaction: unknown }).transaction = () => {
        throw Object.assign(new Error('full'), { name: 'QuotaExceededError' });
      };
      ws.setName('Renamed while the disk is full');
      await session.flush();
      expect(session.saveFailed).toBe(true);
      expect(session.notices.some((n) => n.tone === 'error' && /no more storage space/.test(n.text))).toBe(true);
      (idb as unknown as { transaction: unknown }).transaction = transaction;
      ws.setName('Renamed again');
      await session.flush();
      expect(session.saveFailed).toBe(false);
    } finally {
      await session.stop();
      db.close();
      await db.delete();
    }
  });
});
