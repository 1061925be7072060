/**
 * Where each input lives in the workbook, so formulas on other sheets can point at it.
 * Filled in while the inputs sheet is written; every address is absolute ("inputs!$C$12").
 */

export interface PeriodRef {
  row: number;
  name: string;
  start: string;
  end: string;
}

export interface PhaseRef {
  row: number;
  id: string;
  name: string;
  start: string;
  end: string;
  periodId: string;
}

export interface ReceiverRef {
  row: number;
  id: string;
  name: string;
  x: string;
  y: string;
  height: string;
  facade: string;
  /** Limit cell per period id (the cell may be blank: no limit). */
  limitByPeriod: Map<string, string>;
}

export interface DutyRef {
  row: number;
  id: string;
  name: string;
  phaseId: string;
  count: string;
  onTime: string;
  x: string;
  y: string;
  sourceHeight: string;
  chosen: string;
}

export interface PairRef {
  screeningKind: string;
  screeningDb: string;
  pathDifference: string;
  statedDistance: string;
}

export interface CandidateRef {
  row: number;
  id: string;
  dutyId: string;
  label: string;
  lwa: string;
  declaration: string;
  uncertainty: string;
  character: string;
  /** Operator-position LpA and hours of exposure a day. */
  operatorLpa: string;
  operatorHours: string;
  /** Range of the eight octave-band cells, 63 Hz … 8 kHz. */
  bands: string;
}

export interface InputRefs {
  periods: Map<string, PeriodRef>;
  phases: Map<string, PhaseRef>;
  receivers: Map<string, ReceiverRef>;
  duties: Map<string, DutyRef>;
  /** Key: pairKey(dutyId, receiverId). */
  pairs: Map<string, PairRef>;
  candidates: Map<string, CandidateRef>;
  /** Candidate ids in the order of the candidates table. */
  candidateOrder: string[];
  /** Rows of the candidates table. */
  candidateRows: { first: number; last: number };
}

/** Key of a (duty, receiver) pair in {@link InputRefs.pairs}. */
export const pairKey = (dutyId: string, receiverId: string): string => `${dutyId}\u0000${receiverId}`;
