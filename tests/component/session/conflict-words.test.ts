import { describe, expect, it } from 'vitest';
import { registerReplacedMessage } from '../../../src/app/session/conflict-words.ts';
import type { MergeConflict } from '../../../src/ledger/file/project-merge.ts';

describe('registerReplacedMessage', () => {
  const conflict = (field: string, mine: unknown, theirs: unknown): MergeConflict<'machines'> => ({
    list: 'machines',
    rowId: 'm1',
    rowName: 'Orlen RX-14 excavator',
    field,
    mine,
    theirs,
    kept: 'mine',
  });
  const headers: Record<string, string> = { lwaDb: 'LWA', netPowerKw: 'Net power' };
  const headerOf = (f: string) => headers[f] ?? f;

  it('names the register, the machine and the column header, the value kept and the value this tab had', () => {
    expect(registerReplacedMessage([conflict('netPowerKw', 96, 95)], headerOf)).toBe(
      'Another tab saved a different value after this tab did, and the later one is kept. Machine register › Orlen RX-14 excavator › Net power: now 96 (this tab had 95). Type your value again to keep it instead.',
    );
  });

  it('lists three cells and counts the rest', () => {
    const many = [
      conflict('lwaDb', 99, 98),
      conflict('netPowerKw', 96, 95),
      conflict('lwaDb', 1, 2),
      conflict('lwaDb', 3, 4),
      conflict('lwaDb', 5, 6),
    ];
    expect(registerReplacedMessage(many, headerOf)).toMatch(/now 1 \(this tab had 2\), and 2 more\. Type your value/);
  });
});
