/**
 * Article 13 of Directive 2000/14/EC: equipment that carries its guaranteed sound power level
 * on its marking but has no permissible level. A selection of the list.
 */

/** An Article 13 type: our category word, the directive's words and the Annex I item. */
export interface Article13Type {
  category: string;
  directiveName: string;
  annexI: number;
}

/** Article 13 types (marking of the guaranteed level only, no limit): our category word, the directive's words and Annex I item. A selection of the list. */
export const ARTICLE_13_TYPES: readonly Article13Type[] = [
  { category: 'piling-rig', directiveName: 'Piling equipment', annexI: 42 },
  { category: 'drill-rig', directiveName: 'Drill rigs', annexI: 17 },
  { category: 'concrete-mixer', directiveName: 'Concrete or mortar mixers', annexI: 11 },
  { category: 'truck-mixer', directiveName: 'Truck mixers', annexI: 55 },
  { category: 'concrete-pump', directiveName: 'Conveying and spraying machines for concrete and mortar', annexI: 13 },
  { category: 'hydraulic-hammer', directiveName: 'Hydraulic hammers', annexI: 28 },
  { category: 'road-milling-machine', directiveName: 'Road milling machines', annexI: 48 },
  { category: 'trencher', directiveName: 'Trenchers', annexI: 54 },
  { category: 'water-pump', directiveName: 'Water pump units (not for use under water)', annexI: 56 },
  { category: 'saw-bench', directiveName: 'Building site circular saw benches', annexI: 5 },
  { category: 'joint-cutter', directiveName: 'Joint cutters', annexI: 30 },
  { category: 'power-sweeper', directiveName: 'Power sweepers', annexI: 46 },
  { category: 'high-pressure-water-jet', directiveName: 'High pressure water jet machines', annexI: 27 },
  { category: 'shredder-chipper', directiveName: 'Shredders/chippers', annexI: 50 },
  { category: 'large-generator', directiveName: 'Power generators (≥ 400 kW)', annexI: 45 },
  {
    category: 'high-compaction-paver-finisher',
    directiveName: 'Paver-finishers equipped with a high-compaction screed',
    annexI: 41,
  },
  { category: 'explosion-rammer', directiveName: 'Compaction machines (explosion rammers only)', annexI: 8 },
];
