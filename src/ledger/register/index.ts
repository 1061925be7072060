/** The buyer's machine register and the comparison of its machines without a site. */
export * from './model.ts';
export { parseRegisterFile, serializeRegister, type RegisterParseOutcome } from './register-file.ts';
export { validateRegister } from './validate-register.ts';
export { wholeLifeCost, type WholeLifeCost } from './whole-life-cost.ts';
export {
  machineFootprint,
  FOOTPRINT_METHOD,
  FOOTPRINT_Q,
  type Footprint,
  type FootprintConditions,
} from './footprint.ts';
export { nonDominated } from './non-dominated.ts';
export {
  compareMachines,
  selectMachines,
  againstReference,
  type Comparison,
  type CompareRow,
  type CompareOptions,
  type AgainstReference,
} from './compare.ts';
export { fleetView, machineType, type FleetView, type FleetTypeRow } from './fleet-view.ts';
export { machineAsCandidate, machineCost, defaultBasis, COPIED_FIELDS, type CostBasis } from './machine-candidate.ts';
export {
  linkDifferences,
  linkStatus,
  projectLinkStatus,
  candidateFromMachine,
  updateLinkedCandidates,
  type LinkDifference,
  type LinkStatus,
} from './register-link.ts';
export { machineFromCandidate, machinesFromImport } from './from-candidates.ts';
export { demoRegister } from './demo-register.ts';
export { mergeRegisters } from './register-merge.ts';
