/**
 * What a project's propagation setting means, in sentences to show beside it (settings,
 * report, workbook, command line): how an ISO 9613-2:1996 level is assembled, which ground
 * method applies to which machines, and a warning when the alternative ground method is
 * chosen over ground that is not mostly porous (clause 7.3.2).
 */
import type { Propagation } from '../model/model.ts';
import { alternativeOverHardGroundWarning, ISO_ASSEMBLY, MOSTLY_POROUS_G } from '../../core/iso9613-machine-terms.ts';

export interface PropagationNotes {
  /** How the level is assembled and which method applies to which machines. */
  notes: string[];
  /** Choices the standard does not support as made. */
  warnings: string[];
}

/** Notes and warnings for a propagation setting. Never throws. O(1). */
export function propagationNotes(propagation: Propagation): PropagationNotes {
  if (propagation.method !== 'iso9613-2:1996') {
    return {
      notes: [
        'Point source: Lp = Lw + 10·lg(Q/(4πr²)); screening by the rule of thumb (5 dB with only the top in sight, 10 dB out of sight) or a stated reduction.',
      ],
      warnings: [],
    };
  }
  const notes = [ISO_ASSEMBLY];
  if (propagation.groundMethod === 'alternative') {
    notes.push(
      'Alternative ground method (clause 7.3.2): every machine is propagated as an A-weighted estimate, A_gr from eq. 10 and D_Ω (eq. 11) as the part of D_c for the ground reflection.',
    );
  } else {
    notes.push(
      'General ground method (clause 7.3.1): machines with octave-band Lw are propagated band by band; machines known only by LWA take the general method’s terms at 500 Hz (D_Ω = 0: the ground reflection is in A_gr).',
    );
  }
  notes.push(
    'Screening is D_z and replaces the ground effect on its path: A_bar = D_z − A_gr, not below 0 (eq. 12); a rule-of-thumb or stated screening is taken as D_z.',
  );
  notes.push('C_met per path: 0 for d_p ≤ 10(h_s + h_r), else C0·[1 − 10(h_s + h_r)/d_p] (eqs 21, 22).');
  const g = propagation.groundFactor;
  const warnings =
    propagation.groundMethod === 'alternative' && typeof g === 'number' && g < MOSTLY_POROUS_G
      ? [alternativeOverHardGroundWarning(g)]
      : [];
  return { notes, warnings };
}
