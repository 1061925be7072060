/**
 * Candidate machines of the demo project (invented makes and models; typical declared
 * levels and prices). Octave-band sound power, where given, is consistent with the LWA
 * (its A-weighted total is within 0.1 dB of it).
 */
import type { Candidate, CandidateCost } from './model.ts';

const hire = (dayRate: number, weekRate?: number, monthRate?: number): CandidateCost => ({
  kind: 'hire', dayRate, ...(weekRate === undefined ? {} : { weekRate }), ...(monthRate === undefined ? {} : { monthRate }),
});
const purchase = (price: number, lifeDays: number, resaleValue: number): CandidateCost => ({ kind: 'purchase', price, lifeDays, resaleValue });

type Spec = Pick<Candidate, 'id' | 'dutyId' | 'label' | 'category' | 'lwaDb' | 'energy' | 'cost' | 'runningPerDay' | 'fixedCharges'> & Partial<Candidate>;

/** The V21 is an older model, placed on the market under Stage I (83 + 11·lg P): its 105 dB is over the Stage II level of 103 dB. */
const STAGE_I_SOURCE = 'supplier data sheet (invented); model placed on the market before 2006, under Stage I';

const candidate = (spec: Spec): Candidate => ({
  declaration: 'guaranteed',
  lwaOrigin: 'declared',
  character: 'none',
  source: 'supplier data sheet (invented)',
  ...spec,
});

/** Fresh copies of the demo's candidates. */
export function demoCandidates(): Candidate[] {
  return [
    // Break out the yard slab
    candidate({ id: 'slab-rig-breaker', dutyId: 'd-slab', label: 'Brantor HB20 breaker on 20 t excavator', category: 'excavator-mounted breaker', directiveCategory: 'hydraulic-hammer', netPowerKw: 110, lwaDb: 118, energy: 'diesel', cost: hire(420, 1250, 3900), runningPerDay: 95, fixedCharges: 180, character: 'impulsive', operatorLpaDb: 84, operatorHoursPerDay: 6,
      bandsDb: [121.6, 117.5, 115.0, 113.6, 112.4, 111.2, 108.4, 104.5] }),
    candidate({ id: 'slab-muffled', dutyId: 'd-slab', label: 'Brantor HB20 with muffled housing', category: 'excavator-mounted breaker', directiveCategory: 'hydraulic-hammer', netPowerKw: 110, lwaDb: 113, energy: 'diesel', cost: hire(470, 1400, 4300), runningPerDay: 95, fixedCharges: 180, character: 'impulsive',
      bandsDb: [116.6, 112.5, 110.0, 108.6, 107.4, 106.2, 103.4, 99.5] }),
    candidate({ id: 'slab-crusher', dutyId: 'd-slab', label: 'Valdor jaw crusher attachment on 20 t excavator', category: 'excavator-mounted crusher', netPowerKw: 110, lwaDb: 106, energy: 'diesel', cost: hire(560, 1700, 5200), runningPerDay: 95, fixedCharges: 220 }),
    candidate({ id: 'slab-robot', dutyId: 'd-slab', label: 'Kestrune DR9e demolition robot, electric', category: 'demolition robot', lwaDb: 104, declaration: 'measured', uncertaintyDb: 3, energy: 'electric', cost: hire(780, 2600, 8200), runningPerDay: 30, fixedCharges: 350, source: 'supplier test report, L and K (invented)' }),

    // Pull down the warehouse shell
    candidate({ id: 'shell-21t', dutyId: 'd-shell', label: 'Valdor V21 excavator with shears', category: 'excavator 21 t', directiveCategory: 'excavator', netPowerKw: 120, lwaDb: 105, energy: 'diesel', source: STAGE_I_SOURCE, cost: hire(330, 990, 3000), runningPerDay: 110, fixedCharges: 300,
      bandsDb: [114.3, 110.2, 106.7, 102.3, 99.1, 94.9, 90.1, 85.2] }),
    candidate({ id: 'shell-21t-quiet', dutyId: 'd-shell', label: 'Valdor V21 Q low-noise pack with shears', category: 'excavator 21 t', directiveCategory: 'excavator', netPowerKw: 120, lwaDb: 101, energy: 'diesel', cost: hire(360, 1080, 3250), runningPerDay: 110, fixedCharges: 300,
      bandsDb: [110.3, 106.2, 102.7, 98.3, 95.1, 90.9, 86.1, 81.2] }),
    candidate({ id: 'shell-24t-hybrid', dutyId: 'd-shell', label: 'Kestrune K24h hybrid excavator with shears', category: 'excavator 24 t', directiveCategory: 'excavator', netPowerKw: 130, lwaDb: 100, energy: 'hybrid', cost: hire(420, 1260, 3700), runningPerDay: 80, fixedCharges: 300 }),
    candidate({ id: 'shell-14t-electric', dutyId: 'd-shell', label: 'Valdor V14e cable-electric excavator with shears', category: 'excavator 14 t', lwaDb: 95.5, declaration: 'measured', uncertaintyDb: 2.5, energy: 'electric', cost: hire(520, 1560, 4600), runningPerDay: 45, fixedCharges: 650 }),

    // Cut openings in the retained wall
    candidate({ id: 'wall-petrol-saw', dutyId: 'd-wall', label: 'Tansk TS350 petrol cut-off saw', category: 'cut-off saw 350 mm', lwaDb: 116, energy: 'petrol', cost: purchase(950, 300, 100), runningPerDay: 12, fixedCharges: 0, operatorLpaDb: 103, operatorHoursPerDay: 2,
      bandsDb: [111.8, 107.7, 106.2, 106.8, 108.6, 110.4, 109.6, 106.7] }),
    candidate({ id: 'wall-battery-saw', dutyId: 'd-wall', label: 'Tansk TB350 battery cut-off saw', category: 'cut-off saw 350 mm', lwaDb: 109, energy: 'battery', cost: purchase(3600, 200, 300), runningPerDay: 4, fixedCharges: 0,
      bandsDb: [104.8, 100.7, 99.2, 99.8, 101.6, 103.4, 102.6, 99.7] }),
    candidate({ id: 'wall-wall-saw', dutyId: 'd-wall', label: 'Mirrowe WS-4 electric wall saw', category: 'wall saw', lwaDb: 106, energy: 'electric', cost: hire(95, 285, 850), runningPerDay: 10, fixedCharges: 60 }),
    candidate({ id: 'wall-wire-saw', dutyId: 'd-wall', label: 'Mirrowe DW-2 electric wire saw', category: 'wire saw', lwaDb: 101, energy: 'electric', cost: hire(180, 540, 1600), runningPerDay: 10, fixedCharges: 120 }),

    // Load out demolition arisings
    candidate({ id: 'load-wheeled', dutyId: 'd-load', label: 'Ovelko WL12 wheeled loader', category: 'wheeled loader', directiveCategory: 'wheeled-loader', netPowerKw: 100, lwaDb: 104, energy: 'diesel', cost: hire(210, 630, 1900), runningPerDay: 70, fixedCharges: 160 }),
    candidate({ id: 'load-wheeled-v', dutyId: 'd-load', label: 'Ovelko WL12 S5 wheeled loader', category: 'wheeled loader', directiveCategory: 'wheeled-loader', netPowerKw: 100, lwaDb: 101, energy: 'diesel', cost: hire(250, 750, 2250), runningPerDay: 62, fixedCharges: 160 }),
    candidate({ id: 'load-tracked', dutyId: 'd-load', label: 'Ovelko TL6 tracked loader', category: 'tracked loader', directiveCategory: 'tracked-loader', netPowerKw: 55, lwaDb: 103, energy: 'diesel', cost: hire(250, 750, 2250), runningPerDay: 60, fixedCharges: 200 }),
    candidate({ id: 'load-electric', dutyId: 'd-load', label: 'Ovelko eL8 electric loader', category: 'wheeled loader', directiveCategory: 'wheeled-loader', netPowerKw: 48, lwaDb: 93.5, declaration: 'measured', uncertaintyDb: 2.5, energy: 'electric', cost: hire(390, 1170, 3500), runningPerDay: 18, fixedCharges: 160 }),

    // Install the bearing piles
    candidate({ id: 'pile-cfa', dutyId: 'd-pile', label: 'Marrick CF60 CFA piling rig', category: 'piling rig, continuous flight auger', lwaDb: 111, energy: 'diesel', cost: hire(1900, 5700, 17000), runningPerDay: 260, fixedCharges: 2400,
      bandsDb: [122.6, 117.5, 113.0, 108.6, 104.4, 100.2, 95.4, 90.5] }),
    candidate({ id: 'pile-cfa-silenced', dutyId: 'd-pile', label: 'Marrick CF60 S with enclosed power pack', category: 'piling rig, continuous flight auger', lwaDb: 107, energy: 'diesel', cost: hire(2050, 6150, 18300), runningPerDay: 260, fixedCharges: 2400,
      bandsDb: [118.6, 113.5, 109.0, 104.6, 100.4, 96.2, 91.4, 86.5] }),
    candidate({ id: 'pile-vibro', dutyId: 'd-pile', label: 'Marrick VH40 vibratory sheet-pile hammer', category: 'piling, vibratory', lwaDb: 118, energy: 'diesel', cost: hire(1500, 4500, 13500), runningPerDay: 240, fixedCharges: 1800, character: 'tonal' }),
    candidate({ id: 'pile-press', dutyId: 'd-pile', label: 'Quenmark P100 press-in piler, electric power pack', category: 'piling, press-in', lwaDb: 99, energy: 'electric', cost: hire(2600, 7800, 23000), runningPerDay: 120, fixedCharges: 3200 }),

    // Dig the basement
    candidate({ id: 'dig-21t', dutyId: 'd-dig', label: 'Valdor V21 excavator', category: 'excavator 21 t', directiveCategory: 'excavator', netPowerKw: 120, lwaDb: 105, energy: 'diesel', source: STAGE_I_SOURCE, cost: hire(300, 900, 2700), runningPerDay: 110, fixedCharges: 300 }),
    candidate({ id: 'dig-13t', dutyId: 'd-dig', label: 'Valdor V13 excavator', category: 'excavator 13 t', directiveCategory: 'excavator', netPowerKw: 75, lwaDb: 101, energy: 'diesel', cost: hire(330, 990, 2950), runningPerDay: 75, fixedCharges: 250 }),
    candidate({ id: 'dig-13t-electric', dutyId: 'd-dig', label: 'Valdor V13e battery excavator', category: 'excavator 13 t', directiveCategory: 'excavator', netPowerKw: 70, lwaDb: 95, energy: 'battery', cost: hire(520, 1560, 4650), runningPerDay: 25, fixedCharges: 250 }),

    // Move spoil across the site
    candidate({ id: 'dump-9t', dutyId: 'd-dump', label: 'Tansey-hire 9 t site dumper', category: 'dumper 9 t', directiveCategory: 'dumper', netPowerKw: 75, lwaDb: 103, energy: 'diesel', cost: hire(120, 360, 1050), runningPerDay: 45, fixedCharges: 90 }),
    candidate({ id: 'dump-tracked', dutyId: 'd-dump', label: 'Kestrune TD6 tracked dumper', category: 'dumper 6 t, tracked', lwaDb: 100, energy: 'diesel', cost: hire(140, 420, 1250), runningPerDay: 38, fixedCharges: 90 }),
    candidate({ id: 'dump-unlisted', dutyId: 'd-dump', label: 'Hedgeby 6 t site dumper (no noise data from the hirer)', category: 'dumper 6 t', directiveCategory: 'dumper', netPowerKw: 40, lwaOrigin: 'permissible-stand-in', energy: 'diesel', cost: hire(150, 450, 1330), runningPerDay: 40, fixedCharges: 90, source: 'hirer’s list without noise data (invented); the permissible level stands in' }),
    candidate({ id: 'dump-electric', dutyId: 'd-dump', label: 'Kestrune ED6e electric dumper', category: 'dumper 6 t', lwaDb: 93, energy: 'electric', cost: hire(270, 810, 2400), runningPerDay: 12, fixedCharges: 90 }),

    // Compact the piling mat
    candidate({ id: 'mat-roller', dutyId: 'd-mat', label: 'Ovelko VR7 vibratory roller', category: 'single-drum roller 7 t', directiveCategory: 'vibratory-compactor', netPowerKw: 75, lwaDb: 106, energy: 'diesel', cost: hire(180, 540, 1600), runningPerDay: 55, fixedCharges: 140 }),
    candidate({ id: 'mat-roller-osc', dutyId: 'd-mat', label: 'Ovelko VR7-O oscillating roller', category: 'single-drum roller 7 t', directiveCategory: 'vibratory-compactor', netPowerKw: 75, lwaDb: 103, energy: 'diesel', cost: hire(230, 690, 2050), runningPerDay: 55, fixedCharges: 140 }),
    candidate({ id: 'mat-plate', dutyId: 'd-mat', label: 'Mirrowe RP50 reversible plate', category: 'vibratory plate 500 kg', directiveCategory: 'walk-behind-vibratory-compactor', netPowerKw: 9, lwaDb: 108, energy: 'diesel', cost: hire(85, 255, 760), runningPerDay: 15, fixedCharges: 60 }),

    // Lift steel and precast units
    candidate({ id: 'lift-mobile', dutyId: 'd-lift', label: 'Harlock MC50 mobile crane 50 t', category: 'mobile crane', directiveCategory: 'mobile-crane', netPowerKw: 270, lwaDb: 104, energy: 'diesel', cost: hire(950, 2850, 8400), runningPerDay: 140, fixedCharges: 500 }),
    candidate({ id: 'lift-tower', dutyId: 'd-lift', label: 'Harlock TC8e electric tower crane', category: 'tower crane', directiveCategory: 'tower-crane', netPowerKw: 40, lwaDb: 97, energy: 'electric', cost: hire(520, 1560, 4500), runningPerDay: 45, fixedCharges: 12500 }),
    candidate({ id: 'lift-crawler-hybrid', dutyId: 'd-lift', label: 'Harlock CC60h hybrid crawler crane', category: 'crawler crane', lwaDb: 100, energy: 'hybrid', cost: hire(1050, 3150, 9300), runningPerDay: 100, fixedCharges: 1200 }),

    // Pump concrete for the floor slabs
    candidate({ id: 'pour-truck-pump', dutyId: 'd-pour', label: 'Ferrow 36 m truck-mounted pump', category: 'concrete pump', lwaDb: 108, energy: 'diesel', cost: hire(780, 2340), runningPerDay: 60, fixedCharges: 0,
      bandsDb: [116.1, 112.0, 109.5, 106.1, 101.9, 97.7, 92.9, 88.0] }),
    candidate({ id: 'pour-truck-low', dutyId: 'd-pour', label: 'Ferrow 36 m pump in low-speed mode', category: 'concrete pump', lwaDb: 104, energy: 'diesel', cost: hire(840, 2520), runningPerDay: 60, fixedCharges: 0, character: 'tonal' }),
    candidate({ id: 'pour-line-electric', dutyId: 'd-pour', label: 'Ferrow LP9e static line pump, electric', category: 'concrete pump', lwaDb: 99, energy: 'electric', cost: hire(640, 1920), runningPerDay: 25, fixedCharges: 900 }),

    // Power the site cabins and tools
    candidate({ id: 'power-diesel', dutyId: 'd-power', label: 'Gennet 60 kVA diesel generator', category: 'generator 60 kVA', directiveCategory: 'generator', directiveQuantity: 48, lwaDb: 97, energy: 'diesel', cost: hire(45, 135, 400), runningPerDay: 85, fixedCharges: 150,
      bandsDb: [110.4, 104.3, 98.8, 94.4, 90.2, 86.0, 81.2, 76.3] }),
    candidate({ id: 'power-silenced', dutyId: 'd-power', label: 'Gennet 60 kVA super-silenced generator', category: 'generator 60 kVA', directiveCategory: 'generator', directiveQuantity: 48, lwaDb: 92, energy: 'diesel', cost: hire(60, 180, 540), runningPerDay: 85, fixedCharges: 150,
      bandsDb: [105.4, 99.3, 93.8, 89.4, 85.2, 81.0, 76.2, 71.3] }),
    candidate({ id: 'power-hybrid', dutyId: 'd-power', label: 'Gennet H45 battery–generator hybrid', category: 'hybrid power unit', lwaDb: 86, energy: 'hybrid', cost: hire(150, 450, 1350), runningPerDay: 35, fixedCharges: 150 }),
    candidate({ id: 'power-mains', dutyId: 'd-power', label: 'Temporary mains supply with site transformer', category: 'mains connection', lwaDb: 72, energy: 'electric', cost: purchase(14500, 720, 2000), runningPerDay: 40, fixedCharges: 1400, character: 'tonal', source: 'distribution network quotation (invented)' }),

    // Lay drainage and landscape the courtyard
    candidate({ id: 'drain-mini-diesel', dutyId: 'd-drain', label: 'Kestrune KX19 mini excavator 1.9 t', category: 'mini excavator 1.9 t', directiveCategory: 'excavator', netPowerKw: 14, lwaDb: 93, energy: 'diesel', cost: hire(85, 255, 760), runningPerDay: 22, fixedCharges: 80,
      bandsDb: [102.3, 98.2, 94.7, 90.3, 87.1, 82.9, 78.1, 73.2] }),
    candidate({ id: 'drain-mini-3t', dutyId: 'd-drain', label: 'Kestrune KX30 mini excavator 3 t', category: 'mini excavator 3 t', directiveCategory: 'excavator', netPowerKw: 18, lwaDb: 94, energy: 'diesel', cost: hire(95, 285, 850), runningPerDay: 26, fixedCharges: 80 }),
    candidate({ id: 'drain-mini-electric', dutyId: 'd-drain', label: 'Kestrune KX19e battery mini excavator', category: 'mini excavator 1.9 t', directiveCategory: 'excavator', netPowerKw: 15, lwaDb: 84, declaration: 'measured', uncertaintyDb: 2, energy: 'battery', cost: hire(150, 450, 1350), runningPerDay: 6, fixedCharges: 80 }),
  ];
}
