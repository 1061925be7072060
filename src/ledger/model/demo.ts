/**
 * The demo project: an invented scenario to start from and to try the ledger on.
 * Every place, company, person and machine name in it is made up; the declared levels and
 * prices are typical of the trade, not taken from any real machine or supplier.
 *
 * Quillhaven Ropeworks Yard: Tansey & Moor Civils turn a derelict rope works into flats, in
 * three phases, next to a terrace of homes, a primary school, a small hospital and an
 * office block. With the machines the contractor would use anyway (the baselines) the
 * terrace and the school are over their limits; quieter machines cost more.
 */
import type { Project } from './model.ts';
import { PROJECT_FORMAT, PROJECT_VERSION } from './model.ts';
import { demoCandidates } from './demo-candidates.ts';

/**
 * A fresh copy of the demo project (callers may change it).
 * @example demoProject().duties.length // 12
 */
export function demoProject(): Project {
  return {
    format: PROJECT_FORMAT,
    version: PROJECT_VERSION,
    name: 'Quillhaven Ropeworks Yard — Tansey & Moor Civils (invented demo)',
    currency: 'GBP',
    propagation: { method: 'simple', q: 2 },
    settings: { referenceDistanceM: 10, characterPenaltyDb: 3, levelBasis: 'guaranteed', decimalSeparator: '.' },
    periods: [{ id: 'day', name: 'Weekday daytime', start: '07:00', end: '19:00' }],
    phases: [
      { id: 'ph-demolition', name: 'Demolition and breaking out', periodId: 'day', start: '08:00', end: '18:00' },
      { id: 'ph-ground', name: 'Piling and groundworks', periodId: 'day', start: '08:00', end: '18:00' },
      { id: 'ph-frame', name: 'Frame, services and landscaping', periodId: 'day', start: '08:00', end: '17:00' },
    ],
    receivers: [
      {
        id: 'r-terrace',
        name: '2 Lantern Row',
        kind: 'home',
        x: 0,
        y: 55,
        heightM: 4,
        facade: true,
        limitsDb: { day: 75 },
        ambientDb: 58,
        screening: { 'd-load': { kind: 'top-visible' } },
      },
      {
        id: 'r-school',
        name: 'Saltmarsh Lane Primary School',
        kind: 'school',
        x: 115,
        y: -70,
        heightM: 1.5,
        facade: true,
        limitsDb: { day: 64 },
        ambientDb: 59,
        screening: {},
      },
      {
        id: 'r-hospital',
        name: 'Quillhaven Cottage Hospital',
        kind: 'hospital',
        x: -120,
        y: 195,
        heightM: 4,
        facade: true,
        limitsDb: { day: 60 },
        ambientDb: 49,
        screening: { 'd-pile': { kind: 'hidden' } },
      },
      {
        id: 'r-office',
        name: 'Chandlery House offices',
        kind: 'office',
        x: -35,
        y: -25,
        heightM: 7.5,
        facade: false,
        limitsDb: { day: 75 },
        screening: {},
      },
    ],
    duties: [
      {
        id: 'd-slab',
        name: 'Break out the yard slab',
        phaseId: 'ph-demolition',
        count: 1,
        onTimePct: 32,
        durationDays: 9,
        location: { kind: 'point', x: 10, y: 5 },
        baselineCandidateId: 'slab-rig-breaker',
      },
      {
        id: 'd-shell',
        name: 'Pull down the warehouse shell',
        phaseId: 'ph-demolition',
        count: 1,
        onTimePct: 60,
        durationDays: 20,
        location: { kind: 'point', x: -15, y: 15 },
        baselineCandidateId: 'shell-21t',
      },
      {
        id: 'd-wall',
        name: 'Cut openings in the retained wall',
        phaseId: 'ph-demolition',
        count: 2,
        onTimePct: 20,
        durationDays: 12,
        location: { kind: 'point', x: 90, y: 90 },
        sourceHeightM: 3,
        baselineCandidateId: 'wall-petrol-saw',
      },
      {
        id: 'd-load',
        name: 'Load out demolition arisings',
        phaseId: 'ph-demolition',
        count: 1,
        onTimePct: 60,
        durationDays: 30,
        location: { kind: 'point', x: -25, y: -5 },
        baselineCandidateId: 'load-wheeled',
      },
      {
        id: 'd-pile',
        name: 'Install the bearing piles',
        phaseId: 'ph-ground',
        count: 1,
        onTimePct: 70,
        durationDays: 15,
        location: { kind: 'point', x: 0, y: 10 },
        baselineCandidateId: 'pile-cfa',
      },
      {
        id: 'd-dig',
        name: 'Dig the basement',
        phaseId: 'ph-ground',
        count: 1,
        onTimePct: 75,
        durationDays: 25,
        location: { kind: 'point', x: -10, y: 0 },
        baselineCandidateId: 'dig-21t',
      },
      {
        id: 'd-dump',
        name: 'Move spoil across the site',
        phaseId: 'ph-ground',
        count: 2,
        onTimePct: 50,
        durationDays: 25,
        location: { kind: 'point', x: 5, y: -15 },
        baselineCandidateId: 'dump-9t',
      },
      {
        id: 'd-mat',
        name: 'Compact the piling mat',
        phaseId: 'ph-ground',
        count: 1,
        onTimePct: 40,
        durationDays: 6,
        location: { kind: 'point', x: 15, y: 20 },
        baselineCandidateId: 'mat-roller',
      },
      {
        id: 'd-lift',
        name: 'Lift steel and precast units',
        phaseId: 'ph-frame',
        count: 1,
        onTimePct: 40,
        durationDays: 40,
        location: { kind: 'point', x: 0, y: 0 },
        sourceHeightM: 2,
        baselineCandidateId: 'lift-mobile',
      },
      {
        id: 'd-pour',
        name: 'Pump concrete for the floor slabs',
        phaseId: 'ph-frame',
        count: 1,
        onTimePct: 50,
        durationDays: 8,
        location: { kind: 'point', x: 10, y: 25 },
        baselineCandidateId: 'pour-truck-pump',
      },
      {
        id: 'd-power',
        name: 'Power the site cabins and tools',
        phaseId: 'ph-frame',
        count: 1,
        onTimePct: 100,
        durationDays: 60,
        location: { kind: 'point', x: -30, y: 5 },
        baselineCandidateId: 'power-diesel',
      },
      {
        id: 'd-drain',
        name: 'Lay drainage and landscape the courtyard',
        phaseId: 'ph-frame',
        count: 2,
        onTimePct: 60,
        durationDays: 18,
        location: { kind: 'point', x: 5, y: 35 },
        baselineCandidateId: 'drain-mini-diesel',
      },
    ],
    candidates: demoCandidates(),
    notes:
      'Invented demonstration project. Levels are typical declared values, prices typical hire rates; neither describes a real machine or supplier. ' +
      'Predictions are estimates (ISO 9613-2 quotes ±3 dB); a competent acoustician and the local authority decide.',
  };
}
