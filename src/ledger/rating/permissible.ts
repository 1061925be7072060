/**
 * A candidate against the Directive 2000/14/EC permissible sound power level (Stage II, as
 * amended by 2005/88/EC): the level that applies, whether the declared guaranteed level
 * exceeds it, and the stand-in used when no level is declared.
 */
import type { Candidate } from '../model/model.ts';
import {
  article12Type,
  outsideScope,
  permissibleSoundPower,
  type PermissibleLevel,
} from '../../core/standards/directive-2000-14-ec/index.ts';

export interface PermissibleCheck {
  /** The permissible level and its working, when the candidate is an Article 12 type with its quantity. */
  permissible?: PermissibleLevel;
  /** Why no permissible level applies, in words (not an Article 12 type, quantity missing…). */
  note?: string;
  /** The declared guaranteed level exceeds the permissible level. */
  overPermissible: boolean;
}

/** The quantity a candidate's limit depends on: the directive quantity, or the net power for power-rated types. */
function limitQuantity(candidate: Candidate): number | undefined {
  const type = candidate.directiveCategory ? article12Type(candidate.directiveCategory) : undefined;
  if (!type) return undefined;
  if (type.quantity === 'net-power-kw') return candidate.netPowerKw ?? candidate.directiveQuantity;
  return candidate.directiveQuantity;
}

/**
 * Checks a candidate against its permissible level. The comparison uses the declared guaranteed
 * level (L + K for a measured pair), as the directive's limits are on guaranteed levels.
 */
export function checkPermissible(candidate: Candidate): PermissibleCheck {
  const category = candidate.directiveCategory;
  if (!category) return { overPermissible: false, note: 'no directive category' };
  const type = article12Type(category);
  if (!type) return { overPermissible: false, note: `${category}: marking only (Article 13) or not covered` };
  const quantity = limitQuantity(candidate);
  if (quantity === undefined || !Number.isFinite(quantity) || quantity <= 0) {
    return {
      overPermissible: false,
      note: `${category}: give the ${type.quantity === 'mass-kg' ? 'mass (kg)' : type.quantity === 'cutting-width-cm' ? 'cutting width (cm)' : type.quantity === 'electric-power-kw' ? 'electric power (kW)' : 'net power (kW)'} to find the permissible level`,
    };
  }
  const outside = outsideScope(type, quantity);
  if (outside) return { overPermissible: false, note: `${category}: ${quantity} kW ${outside}` };
  const permissible = permissibleSoundPower(category, quantity);
  const declared = candidate.lwaDb;
  if (declared === undefined || declared === null || !Number.isFinite(declared))
    return { permissible, overPermissible: false };
  const guaranteed = candidate.declaration === 'measured' ? declared + (candidate.uncertaintyDb ?? 0) : declared;
  return { permissible, overPermissible: guaranteed > permissible.levelDb };
}

/** The permissible level of a candidate, for use as a conservative stand-in when no LWA is declared. */
export function permissibleStandIn(candidate: Candidate): number | undefined {
  return checkPermissible(candidate).permissible?.levelDb;
}
