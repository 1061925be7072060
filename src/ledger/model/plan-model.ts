/**
 * The site plan's part of the project file (added in version 7): work areas of duties as
 * lines and polygons, barriers as polylines with a top height, and the drawing of the site
 * with its scale, origin and north. Plain JSON, like the rest of the model (./model.ts).
 */

/** A point on the site grid, m (x east, y north). */
export interface SitePoint {
  x: number;
  y: number;
}

/**
 * For a duty working along a line or over an area, where its distance to a receiver is taken
 * from: `nearest` the point of the line or area nearest the receiver (the worst case for
 * distance alone), `centroid` its centroid (a representative point of a machine that roams).
 */
export type AreaDistanceBy = 'nearest' | 'centroid';
export const AREA_DISTANCE_BY: readonly AreaDistanceBy[] = ['nearest', 'centroid'];

/** A duty working along a line on the site grid (e.g. a trench); two or more points. */
export interface LineLocation {
  kind: 'line';
  points: SitePoint[];
  distanceBy: AreaDistanceBy;
}

/** A duty whose machines roam an area on the site grid; three or more points, closed implicitly. */
export interface PolygonLocation {
  kind: 'polygon';
  points: SitePoint[];
  distanceBy: AreaDistanceBy;
}

/**
 * A barrier (hoarding, wall, stockpile): a polyline on the site grid with one top height
 * above ground. It screens a duty–receiver path over its top edge when it cuts the line of
 * sight (ledger/prediction/barrier-screening.ts), unless a screening is typed for that path.
 */
export interface Barrier {
  id: string;
  name: string;
  /** Two or more points along the barrier. */
  points: SitePoint[];
  /** Top height above ground, m. */
  heightM: number;
}

/** Largest drawing kept with a project, bytes of the image file (5 MiB). */
export const PLAN_IMAGE_MAX_BYTES = 5 * 1024 * 1024;

/** Media types a drawing is kept as (a PDF's first page is kept as PNG). */
export const PLAN_IMAGE_TYPES = ['image/png', 'image/jpeg'] as const;

/**
 * A drawing of the site under the plan. Pixels count x to the right and y down from the
 * image's top-left corner.
 */
export interface PlanImage {
  /** The image file as a `data:image/png;base64,…` or `data:image/jpeg;base64,…` URL. */
  dataUrl: string;
  /** The file name it was loaded from (information). */
  fileName: string;
  widthPx: number;
  heightPx: number;
  /** Site-grid metres per image pixel, set by two points clicked on the drawing and the distance typed between them. */
  metresPerPixel: number;
  /** The image pixel at the site grid's origin (x = 0, y = 0). */
  originPx: SitePoint;
  /** Direction of site-grid north on the drawing, degrees clockwise from the image's up (0: north is up). */
  northDeg: number;
}

/** The site plan: the drawing, if any. Without one the plan is drawn on a plain grid. */
export interface SitePlan {
  image?: PlanImage;
}
