/**
 * A small invented grid fixture: machines in two duties, with text, number,
 * choice and computed columns. Names and figures are invented for the tests.
 */
import { vi } from 'vitest';
import type { GridChange, GridColumn } from '../../../src/app/grid/index.ts';

export interface Machine {
  id: string;
  duty: string;
  name: string;
  lwa: number;
  drive: 'diesel' | 'electric';
  /** Computed elsewhere; shown read-only. */
  level: number;
}

export const machines: Machine[] = [
  { id: 'm1', duty: 'dig', name: 'Loam mover A', lwa: 104, drive: 'diesel', level: 61.2 },
  { id: 'm2', duty: 'dig', name: 'Loam mover B', lwa: 99.5, drive: 'electric', level: 56.7 },
  { id: 'm3', duty: 'dig', name: 'Trench cutter', lwa: 108, drive: 'diesel', level: 65.2 },
  { id: 'm4', duty: 'lift', name: 'Mast hoist', lwa: 97, drive: 'electric', level: 54.2 },
  { id: 'm5', duty: 'lift', name: 'Boom lifter', lwa: 101, drive: 'diesel', level: 58.2 },
];

export const columns: GridColumn<Machine>[] = [
  {
    id: 'name',
    header: 'Machine',
    kind: 'text',
    editable: true,
    width: 160,
    value: (m) => m.name,
    display: (m) => m.name,
  },
  {
    id: 'lwa',
    header: 'LWA',
    unit: 'dB',
    kind: 'number',
    editable: true,
    describe: 'use dB, e.g. 104.5',
    value: (m) => m.lwa,
    display: (m) => (Number.isNaN(m.lwa) ? '' : m.lwa.toFixed(1)),
  },
  {
    id: 'drive',
    header: 'Drive',
    kind: 'choice',
    editable: true,
    choices: [
      { value: 'diesel', label: 'Diesel' },
      { value: 'electric', label: 'Electric' },
    ],
    value: (m) => m.drive,
    display: (m) => (m.drive === 'diesel' ? 'Diesel' : 'Electric'),
  },
  {
    id: 'level',
    header: 'Level at receiver',
    unit: 'dB',
    kind: 'computed',
    editable: false,
    value: (m) => m.level,
    display: (m) => m.level.toFixed(1),
  },
];

export const dutyGroups = {
  key: (m: Machine) => m.duty,
  label: (key: string) => (key === 'dig' ? 'Digging' : 'Lifting'),
};

/** Props for mounting the grid with spies for every callback. */
export function gridProps(overrides: Record<string, unknown> = {}) {
  return {
    label: 'Machines',
    rows: machines,
    rowId: (m: Machine) => m.id,
    columns,
    onedit: vi.fn<(changes: GridChange[]) => void>(),
    ondeleterows: vi.fn<(ids: string[]) => void>(),
    onundo: vi.fn<() => void>(),
    onredo: vi.fn<() => void>(),
    ...overrides,
  };
}
