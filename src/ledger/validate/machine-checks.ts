/**
 * The checks a machine's noise data gets wherever it is kept — a project's candidate or a
 * register's machine: net power, size for limit, LWA, declaration, K, how the LWA was
 * obtained, octave bands. Written once so both files report them in the same words; ranges
 * and accepted choices come from the field catalogue (`ledger/catalogue`).
 */
import type { ProblemList } from './field-checks.ts';
import { RULES } from './validate-rules.ts';
import { DECLARATION, LWA_ORIGIN } from '../catalogue/index.ts';

/** A candidate or a register machine as read from its file (values not yet known to be right). */
export type MachineNoise = Readonly<Record<string, unknown>>;

const BANDS_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000] as const;

/**
 * Checks a machine's noise data. `path` is its JSON path ("$.candidates[3]"), `where` its
 * words ('Candidate "Breaker 2 t"'), `cell` the unread-cell key of one of its fields.
 */
export function checkMachineNoise(
  p: ProblemList,
  path: string,
  where: string,
  m: MachineNoise,
  cell: (field: string) => string,
): void {
  p.optionalNumber(`${path}.netPowerKw`, `${where}, net power`, m.netPowerKw, RULES.netPowerKw, cell('netPowerKw'));
  p.optionalNumber(
    `${path}.directiveQuantity`,
    `${where}, size for limit`,
    m.directiveQuantity,
    RULES.directiveQuantity,
    cell('directiveQuantity'),
  );
  p.optionalNumber(`${path}.lwaDb`, `${where}, LWA`, m.lwaDb, RULES.lwaDb, cell('lwaDb'));
  p.oneOf(
    `${path}.declaration`,
    `${where}, declaration`,
    m.declaration,
    DECLARATION.choices.map((c) => c.value),
  );
  p.optionalNumber(
    `${path}.uncertaintyDb`,
    `${where}, uncertainty K`,
    m.uncertaintyDb,
    RULES.uncertaintyDb,
    cell('uncertaintyDb'),
  );
  p.oneOf(
    `${path}.lwaOrigin`,
    `${where}, LWA obtained as`,
    m.lwaOrigin,
    LWA_ORIGIN.choices.map((c) => c.value),
  );
  const bands = m.bandsDb;
  if (bands === undefined) return;
  if (!Array.isArray(bands) || bands.length !== 8) {
    p.add(
      `${path}.bandsDb`,
      `${where}, octave bands`,
      bands,
      'is not eight numbers',
      'give eight sound power levels in dB, 63 Hz to 8 kHz, e.g. [98, 101, 103, 104, 102, 99, 94, 87]',
    );
    return;
  }
  bands.forEach((b: unknown, k) =>
    p.number(`${path}.bandsDb[${k}]`, `${where}, octave band ${BANDS_HZ[k]} Hz`, b, RULES.bandDb, cell(`bandsDb.${k}`)),
  );
}
