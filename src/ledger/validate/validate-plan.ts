/**
 * Validation of the site plan's parts of a project (version 7): points of work lines and
 * areas, barriers, and the drawing with its scale, origin and north.
 */
import { checkIds, itemWords, type ProblemList } from './field-checks.ts';
import { RULES, validationRule } from './validate-rules.ts';
import { PLAN_NUMBERS } from '../catalogue/index.ts';
import { AREA_DISTANCE_BY, PLAN_IMAGE_MAX_BYTES, PLAN_IMAGE_TYPES } from '../model/plan-model.ts';

type Obj = Record<string, unknown>;
const asObj = (x: unknown): Obj => (typeof x === 'object' && x !== null && !Array.isArray(x) ? (x as Obj) : {});

/** The plan's numbers as validation's rules (ranges and words: the catalogue's ./plan-fields.ts). */
export const PLAN_RULES = {
  barrierHeightM: validationRule(PLAN_NUMBERS.barrierHeightM),
  metresPerPixel: validationRule(PLAN_NUMBERS.metresPerPixel),
  pixel: validationRule(PLAN_NUMBERS.pixel),
  northDeg: validationRule(PLAN_NUMBERS.northDeg),
  imagePx: validationRule(PLAN_NUMBERS.imagePx),
};

/** Bytes of the file a base64 data URL holds (three bytes per four characters, less padding). */
export function dataUrlBytes(dataUrl: string): number {
  const comma = dataUrl.indexOf(',');
  const body = comma >= 0 ? dataUrl.slice(comma + 1) : dataUrl;
  const padding = body.endsWith('==') ? 2 : body.endsWith('=') ? 1 : 0;
  return Math.floor((body.length * 3) / 4) - padding;
}

/** Words for the drawing size limit, e.g. "5 MB". */
export const PLAN_IMAGE_LIMIT_WORDS = `${PLAN_IMAGE_MAX_BYTES / (1024 * 1024)} MB`;

/**
 * A list of at least `least` site-grid points, each `{ x, y }` within the coordinate range.
 * `cell` names the unread-cell key of point k's field.
 */
export function checkPoints(
  p: ProblemList,
  path: string,
  where: string,
  points: unknown,
  least: number,
  cell: (k: number, f: 'x' | 'y') => string,
): void {
  if (!p.list(path, `${where}, points`, points)) return;
  if (points.length < least) {
    p.add(
      path,
      `${where}, points`,
      `${points.length} point${points.length === 1 ? '' : 's'}`,
      'are too few',
      `give ${least} or more points { "x": …, "y": … }`,
    );
  }
  points.forEach((pt, k) => {
    if (!p.object(`${path}[${k}]`, `${where}, point ${k + 1}`, pt)) return;
    p.number(`${path}[${k}].x`, `${where}, point ${k + 1} x`, pt.x, RULES.coordinateM, cell(k, 'x'));
    p.number(`${path}[${k}].y`, `${where}, point ${k + 1} y`, pt.y, RULES.coordinateM, cell(k, 'y'));
  });
}

/** A duty's line or area location: points and how distance is taken. */
export function checkAreaLocation(p: ProblemList, path: string, where: string, loc: Obj, dutyId: string): void {
  const least = loc.kind === 'line' ? 2 : 3;
  checkPoints(p, `${path}.points`, where, loc.points, least, (k, f) => `duties/${dutyId}/location.points.${k}.${f}`);
  p.oneOf(`${path}.distanceBy`, `${where}, distance taken from`, loc.distanceBy, AREA_DISTANCE_BY);
}

/** Barriers: ids, names, two or more points, a top height. */
export function validateBarriers(p: ProblemList, root: Obj): void {
  if (root.barriers === undefined || !p.list('$.barriers', 'Barriers', root.barriers)) return;
  const barriers = root.barriers.map(asObj);
  checkIds(p, '$.barriers', 'Barrier', barriers);
  barriers.forEach((b, i) => {
    const path = `$.barriers[${i}]`;
    const where = itemWords('Barrier', b, i);
    p.text(`${path}.name`, `${where}, name`, b.name, true, 'a name, e.g. "North hoarding"');
    p.number(
      `${path}.heightM`,
      `${where}, height`,
      b.heightM,
      PLAN_RULES.barrierHeightM,
      `barriers/${String(b.id)}/heightM`,
    );
    checkPoints(p, `${path}.points`, where, b.points, 2, (k, f) => `barriers/${String(b.id)}/points.${k}.${f}`);
  });
}

/** The drawing: a PNG or JPEG data URL within the size limit, its size, scale, origin and north. */
export function validateSitePlan(p: ProblemList, root: Obj): void {
  if (root.sitePlan === undefined || !p.object('$.sitePlan', 'Site plan', root.sitePlan)) return;
  const plan = root.sitePlan;
  if (plan.image === undefined || !p.object('$.sitePlan.image', 'Site drawing', plan.image)) return;
  const img = plan.image;
  const where = 'Site drawing';
  if (
    typeof img.dataUrl !== 'string' ||
    !PLAN_IMAGE_TYPES.some((t) => (img.dataUrl as string).startsWith(`data:${t};base64,`))
  ) {
    p.add(
      '$.sitePlan.image.dataUrl',
      `${where}, image`,
      typeof img.dataUrl === 'string' ? `${img.dataUrl.slice(0, 30)}…` : img.dataUrl,
      'is not a PNG or JPEG image',
      'use a data URL "data:image/png;base64,…" or "data:image/jpeg;base64,…"',
    );
  } else if (dataUrlBytes(img.dataUrl) > PLAN_IMAGE_MAX_BYTES) {
    p.add(
      '$.sitePlan.image.dataUrl',
      `${where}, image`,
      `${(dataUrlBytes(img.dataUrl) / 1048576).toFixed(1)} MB`,
      'is too large',
      `use an image of at most ${PLAN_IMAGE_LIMIT_WORDS}`,
    );
  }
  p.text('$.sitePlan.image.fileName', `${where}, file name`, img.fileName, false, 'the file name, e.g. "site.png"');
  p.number('$.sitePlan.image.widthPx', `${where}, width`, img.widthPx, PLAN_RULES.imagePx);
  p.number('$.sitePlan.image.heightPx', `${where}, height`, img.heightPx, PLAN_RULES.imagePx);
  p.number(
    '$.sitePlan.image.metresPerPixel',
    `${where}, scale`,
    img.metresPerPixel,
    PLAN_RULES.metresPerPixel,
    'sitePlan/-/metresPerPixel',
  );
  const origin = asObj(img.originPx);
  if (p.object('$.sitePlan.image.originPx', `${where}, origin`, img.originPx)) {
    p.number('$.sitePlan.image.originPx.x', `${where}, origin x`, origin.x, PLAN_RULES.pixel);
    p.number('$.sitePlan.image.originPx.y', `${where}, origin y`, origin.y, PLAN_RULES.pixel);
  }
  p.number('$.sitePlan.image.northDeg', `${where}, north`, img.northDeg, PLAN_RULES.northDeg, 'sitePlan/-/northDeg');
}
