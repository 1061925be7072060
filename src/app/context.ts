/**
 * The Workspace of the open project, shared with the components below the shell through
 * Svelte context (not a global import, so tests and several workspaces stay apart).
 */
import { getContext, setContext } from 'svelte';
import type { Workspace } from './state/workspace.svelte.ts';

const WORKSPACE = Symbol('workspace');

export function setWorkspaceContext(workspace: Workspace): Workspace {
  return setContext(WORKSPACE, workspace);
}

export function getWorkspaceContext(): Workspace {
  const workspace = getContext<Workspace | undefined>(WORKSPACE);
  if (!workspace) throw new Error('No Workspace in context: setWorkspaceContext must be called by the shell first.');
  return workspace;
}
