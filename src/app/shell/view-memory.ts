/**
 * What the user was looking at in a project (open tab, chosen duty and receiver), kept in
 * the browser's localStorage per stored project so a reload returns to it. A missing or
 * unreadable entry is ignored; nothing here is part of the project itself.
 */
import { PROJECT_TABS, type ProjectTab, type Workspace } from '../state/workspace.svelte.ts';

interface ViewMemory {
  tab?: ProjectTab;
  dutyId?: string;
  receiver?: string;
}

const key = (projectId: string) => `plant-noise-ledger/view/${projectId}`;

/** Restores the view of a stored project into its Workspace (unknown duties or receivers are skipped). */
export function restoreView(projectId: string, ws: Workspace): void {
  let memory: ViewMemory;
  try {
    memory = JSON.parse(localStorage.getItem(key(projectId)) ?? '{}') as ViewMemory;
  } catch {
    return;
  }
  if (memory.tab && (PROJECT_TABS as readonly string[]).includes(memory.tab)) ws.tab = memory.tab;
  if (memory.dutyId && ws.project.duties.some((d) => d.id === memory.dutyId)) ws.selectDuty(memory.dutyId);
  const r = memory.receiver;
  if (r && (r === 'worst' || r === '@reference' || ws.project.receivers.some((x) => x.id === r))) ws.selectReceiver(r);
}

/** Remembers the view of a stored project. */
export function rememberView(projectId: string, ws: Workspace): void {
  const memory: ViewMemory = { tab: ws.tab, receiver: String(ws.selectedReceiverId) };
  if (ws.selectedDutyId) memory.dutyId = ws.selectedDutyId;
  try {
    localStorage.setItem(key(projectId), JSON.stringify(memory));
  } catch {
    // storage full or refused: the view is simply not remembered
  }
}
