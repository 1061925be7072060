/**
 * The site plan's drawing modes: what each asks the user to do, the edit a finished drawing
 * makes (a barrier with its top height, or a duty's line or work area), and the drawing's
 * scale and north as typed. Pure: the pane (./PlanPane.svelte) applies the edit and shows the words.
 */
import type { Project, SitePoint } from '../../ledger/model/model.ts';
import { PLAN_NUMBERS, readNumberCell, readRule, type NumberField } from '../../ledger/catalogue/index.ts';
import { scaleFromTwoPoints } from '../../ledger/map/drawing-frame.ts';
import { ownerOf, withBarrierAdded, withDutyArea, type PlanItem } from './plan-edits.ts';

export type Mode = 'select' | 'barrier' | 'line' | 'polygon' | 'scale' | 'origin';

/** Arrow keys and the site-grid direction each nudges the selected item (× 1 m, Shift × 10 m). */
export const NUDGES: Readonly<Record<string, readonly [number, number]>> = {
  ArrowLeft: [-1, 0],
  ArrowRight: [1, 0],
  ArrowUp: [0, 1],
  ArrowDown: [0, -1],
};

/** What a mode asks the user to do, or nothing for selecting. */
export function modeMessage(mode: Mode): string | undefined {
  switch (mode) {
    case 'barrier':
      return 'Click the barrier’s points on the plan, then Finish (or Enter). Esc cancels.';
    case 'line':
    case 'polygon':
      return `Click the ${mode === 'line' ? 'line’s' : 'area’s'} points on the plan, then Finish (or Enter). Esc cancels.`;
    case 'scale':
      return 'Click two points on the drawing whose distance apart you know.';
    case 'origin':
      return 'Click the point of the drawing that is the site grid’s origin (0, 0).';
    default:
      return undefined;
  }
}

/**
 * The edit a finished drawing makes: a barrier of the draft's points at the typed top height,
 * or the selected duty's line or work area (distance from its nearest point); a message
 * saying what is wrong when the height or the number of points is not accepted (the draft is
 * kept). `{}` when the mode draws nothing.
 */
export function finishedDraft(
  project: Project,
  mode: Mode,
  draft: readonly SitePoint[],
  heightText: string,
  separator: '.' | ',',
  selected: PlanItem | undefined,
): string | { next?: Project; selected?: PlanItem } {
  if (mode === 'barrier') {
    const h = readPlanNumber(PLAN_NUMBERS.barrierHeightM, 'Barrier height', heightText, separator);
    if (typeof h === 'string') return h;
    if (draft.length < 2) return 'A barrier needs two or more points: click on the plan to add them.';
    const { next, id } = withBarrierAdded(project, [...draft], h);
    return { next, selected: { kind: 'barrier', id } };
  }
  if ((mode === 'line' || mode === 'polygon') && selected && ownerOf(selected).kind === 'duty') {
    const least = mode === 'line' ? 2 : 3;
    if (draft.length < least)
      return `A ${mode === 'line' ? 'line' : 'work area'} needs ${least} or more points: click on the plan to add them.`;
    return { next: withDutyArea(project, ownerOf(selected).id, mode, [...draft], 'nearest') };
  }
  return {};
}

/** The drawing's scale, m per pixel, from two clicked pixels and the typed distance between them, or what is wrong. */
export function readScale(pixels: readonly SitePoint[], text: string, separator: '.' | ','): number | string {
  const d = readPlanNumber(PLAN_NUMBERS.scaleDistanceM, 'Distance', text, separator);
  if (typeof d === 'string') return d;
  if (pixels.length < 2)
    return 'The scale needs two points on the drawing: click them, then type the distance between them.';
  return (
    scaleFromTwoPoints(pixels[0]!, pixels[1]!, d) ??
    'The two points clicked are at one place on the drawing: click two points apart, then type the distance between them.'
  );
}

/** North as typed, degrees clockwise from up on the drawing, or what is wrong. */
export function readNorth(text: string, separator: '.' | ','): number | string {
  return readPlanNumber(PLAN_NUMBERS.northDeg, 'North', text, separator);
}

/**
 * A number typed on the plan, read by the catalogue's reader with its field's range, or what
 * is wrong, led by `name`: e.g. 'Barrier height: "0" is out of range (use a barrier top height …)'.
 */
export function readPlanNumber(field: NumberField, name: string, text: string, separator: '.' | ','): number | string {
  const reading = readNumberCell(text, separator, readRule(field));
  return reading.ok ? reading.value : `${name}: ${JSON.stringify(text)} ${reading.problem} (${reading.accepted})`;
}
