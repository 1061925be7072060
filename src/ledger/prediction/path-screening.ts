/**
 * The one screening of a duty–receiver path: typed, or computed from the plan's barriers.
 *
 * A screening typed for the path (top-visible, hidden, an explicit reduction or a typed
 * path difference) replaces any barrier on the plan for that path, and the path's terms say
 * so; a path is never screened twice. Without a typed screening ("none" or nothing), the
 * barrier that cuts the line of sight (./barrier-screening.ts) screens it through the
 * ISO 9613-2:1996 barrier term. An explicit 0 dB typed for a path turns a barrier off there.
 */
import type { Barrier, Receiver, Screening, SitePoint } from '../model/model.ts';
import { own } from '../model/own.ts';
import { screeningBarrier, type ScreeningBarrier } from './barrier-screening.ts';

export interface PathScreening {
  /** The screening typed for the path, when one is. */
  typed?: Screening;
  /** The barrier that screens the path, when nothing is typed. */
  computed?: ScreeningBarrier;
  /** The barrier that would screen the path, when a typed screening replaces it. */
  replaced?: ScreeningBarrier;
}

/**
 * The screening of the path from a source point (at `sourceHeightM`) to a receiver for the
 * duty `dutyId`. `sourceAt` is undefined for stated distances (no plan geometry: only a
 * typed screening applies). O(barrier segments).
 */
export function pathScreening(
  dutyId: string,
  receiver: Receiver,
  sourceAt: SitePoint | undefined,
  sourceHeightM: number,
  barriers: readonly Barrier[] | undefined,
): PathScreening {
  const s = own(receiver.screening, dutyId);
  const typed = s && s.kind !== 'none' ? s : undefined;
  const barrier =
    sourceAt &&
    barriers &&
    barriers.length > 0 &&
    Number.isFinite(receiver.x) &&
    Number.isFinite(receiver.y) &&
    receiver.heightM >= 0 &&
    sourceHeightM >= 0
      ? screeningBarrier(
          barriers,
          { x: sourceAt.x, y: sourceAt.y, heightM: sourceHeightM },
          { x: receiver.x, y: receiver.y, heightM: receiver.heightM },
        )
      : undefined;
  if (typed) return barrier ? { typed, replaced: barrier } : { typed };
  return barrier ? { computed: barrier } : {};
}
