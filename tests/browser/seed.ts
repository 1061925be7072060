/**
 * Stores a project straight into a page's IndexedDB in the app's stored shape (database
 * version 4: bookkeeping plus parts, db/project-parts.ts) and makes it the one to open,
 * for tests and benchmarks that need a large project without typing it.
 */
import type { Page } from 'playwright-core';
import type { Project } from '../../src/ledger/model/model.ts';
import { revisionKey, toParts } from '../../src/db/project-parts.ts';

/** Stores `project` under `id` (revision 1) in the page's origin; the page must have opened the app once. */
export async function storeProject(page: Page, project: Project, id = 'bench'): Promise<void> {
  const parts = [...toParts(id, project), { projectId: id, key: revisionKey(1), value: null }];
  const meta = { id, name: project.name, createdAt: Date.now(), updatedAt: Date.now(), revision: 1 };
  // Passed as text: the in-page function must not carry helpers the Node-side compiler adds.
  await page.evaluate(`(async ({ parts, meta }) => {
    const db = await new Promise((resolve, reject) => {
      const req = indexedDB.open('plant-noise-ledger');
      req.onsuccess = () => resolve(req.result);
      req.onerror = () => reject(req.error);
    });
    const tx = db.transaction(['projects', 'parts', 'prefs'], 'readwrite');
    for (const part of parts) tx.objectStore('parts').put(part);
    tx.objectStore('projects').put(meta);
    tx.objectStore('prefs').put({ key: 'lastProjectId', value: meta.id });
    await new Promise((resolve, reject) => { tx.oncomplete = resolve; tx.onerror = () => reject(tx.error); });
    db.close();
    // this tab reopens the project it had open: make that the stored one
    sessionStorage.setItem('plant-noise-ledger/tab-project', meta.id);
  })(${JSON.stringify({ parts, meta })})`);
}
