/**
 * The plan with its level map as a stand-alone SVG document (the command line's
 * `ledger map -o out.svg`): bands and isolines, the limit line, barriers, duties and
 * receivers with their names, a legend and the cautions. North is up; a site point (x, y)
 * is drawn at (x, −y). Text only: numbers come from the ledger.
 */
import type { Project } from '../../ledger/model/model.ts';
import type { LevelGrid } from '../../ledger/map/level-grid.ts';
import { levelBands, isolineAt } from '../../ledger/map/contours.ts';
import type { LimitLine } from '../../ledger/map/limit-line.ts';
import type { SiteBox } from '../../ledger/map/map-bounds.ts';
import { areaCentre } from '../../ledger/prediction/work-area.ts';
import { bandColour } from './level-colours.ts';
import { ringsPath } from './rings-path.ts';

const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

export interface MapSvgOptions {
  box: SiteBox;
  levels: readonly number[];
  limit?: LimitLine;
  title: string;
}

/** Legend swatches in a row. */
const SWATCHES_PER_ROW = 10;
/** Characters in a line of the legend's words (at 1.7 % of the width a character). */
const NOTE_LINE_CHARS = 100;

/** Words broken into lines of at most `max` characters (a longer word stands alone). */
function wrapWords(text: string, max: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(' ')) {
    if (line && line.length + 1 + word.length > max) {
      lines.push(line);
      line = word;
    } else line = line ? `${line} ${word}` : word;
  }
  if (line) lines.push(line);
  return lines;
}

/** A label's x and anchor: to the right of its mark, or to the left in the east third of the plan (so it stays on the page). */
function labelAt(box: SiteBox, x: number, gap: number, u: number): string {
  return x > box.maxX - (box.maxX - box.minX) / 3 ? `x="${x - gap - u * 0.2}" text-anchor="end"` : `x="${x + gap}"`;
}

/** The SVG text. O(grid points × levels). */
export function mapSvg(project: Project, grid: LevelGrid, options: MapSvgOptions): string {
  const { box, levels } = options;
  const w = box.maxX - box.minX;
  const h = box.maxY - box.minY;
  const u = w / 100;
  const bands = levelBands(grid, levels);
  const note = [
    `dB, free field (no façade term), ${grid.quantity === 'L_Ar,T' ? 'rating level LAr,T' : 'LAeq,T'}, ${grid.heightM} m above ground, ${grid.spacingM} m grid.`,
    ...(options.limit ? [`Dashed: ${options.limit.words}.`] : []),
    'Predictions ±3 dB (ISO 9613-2); a competent acoustician and the local authority decide.',
  ].flatMap((sentence) => wrapWords(sentence, NOTE_LINE_CHARS));
  const swatchRows = Math.max(1, Math.ceil(bands.length / SWATCHES_PER_ROW));
  const legendH = u * (3 + swatchRows * 3 + note.length * 2.5 + 1.5);
  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="${box.minX} ${-box.maxY} ${w} ${h + legendH}" width="1200" height="${Math.round((1200 * (h + legendH)) / w)}" font-family="DejaVu Sans, sans-serif">`,
  );
  out.push(`<title>${esc(options.title)}</title>`);
  out.push(`<rect x="${box.minX}" y="${-box.maxY}" width="${w}" height="${h + legendH}" fill="#ffffff"/>`);
  // The bands and the limit line are clipped to the plan: d3-contour closes a ring along the grid's edge,
  // half a cell outside the box, which is no isoline and must not show (e.g. under the legend).
  out.push(
    `<clipPath id="plan-area"><rect x="${box.minX}" y="${-box.maxY}" width="${w}" height="${h}"/></clipPath><g clip-path="url(#plan-area)">`,
  );
  bands.forEach((b, k) =>
    out.push(
      `<path d="${ringsPath(b.polygons)}" fill="${bandColour(k, bands.length)}" fill-opacity="0.7" fill-rule="evenodd" stroke="#333" stroke-width="${u * 0.12}"/>`,
    ),
  );
  if (options.limit)
    out.push(
      `<path d="${ringsPath(isolineAt(grid, options.limit.levelDb).polygons)}" fill="none" stroke="#a12a2a" stroke-width="${u * 0.5}" stroke-dasharray="${u * 1.5} ${u * 0.6}"/>`,
    );
  out.push('</g>');
  for (const b of project.barriers ?? []) {
    out.push(
      `<polyline points="${b.points.map((p) => `${p.x},${-p.y}`).join(' ')}" fill="none" stroke="#3a2f22" stroke-width="${u * 0.7}"/>`,
    );
    const p0 = b.points[0];
    if (p0)
      out.push(
        `<text ${labelAt(box, p0.x, u, u)} y="${-p0.y - u}" font-size="${u * 1.8}">${esc(`${b.name} · ${b.heightM} m`)}</text>`,
      );
  }
  for (const d of project.duties) {
    if (d.phaseId !== grid.phaseId) continue;
    const loc = d.location;
    if (loc.kind === 'polygon')
      out.push(
        `<polygon points="${loc.points.map((p) => `${p.x},${-p.y}`).join(' ')}" fill="#8a5a12" fill-opacity="0.2" stroke="#8a5a12" stroke-width="${u * 0.2}"/>`,
      );
    if (loc.kind === 'line')
      out.push(
        `<polyline points="${loc.points.map((p) => `${p.x},${-p.y}`).join(' ')}" fill="none" stroke="#8a5a12" stroke-width="${u * 0.5}"/>`,
      );
    const at = loc.kind === 'point' ? loc : loc.kind === 'line' || loc.kind === 'polygon' ? areaCentre(loc) : undefined;
    if (!at || !Number.isFinite(at.x) || !Number.isFinite(at.y)) continue;
    out.push(
      `<rect x="${at.x - u}" y="${-at.y - u}" width="${2 * u}" height="${2 * u}" fill="#8a5a12"/><text ${labelAt(box, at.x, 1.5 * u, u)} y="${-at.y + 0.6 * u}" font-size="${u * 1.8}">${esc(d.name)}</text>`,
    );
  }
  for (const r of project.receivers) {
    if (!Number.isFinite(r.x) || !Number.isFinite(r.y)) continue;
    out.push(
      `<circle cx="${r.x}" cy="${-r.y}" r="${u * 1.2}" fill="#23465a"/><text ${labelAt(box, r.x, 1.6 * u, u)} y="${-r.y + 0.6 * u}" font-size="${u * 1.8}">${esc(r.name)}</text>`,
    );
  }
  const ly = -box.minY + u * 3;
  bands.forEach((b, k) => {
    const x = box.minX + u * 2 + (k % SWATCHES_PER_ROW) * u * 9;
    const y = ly + Math.floor(k / SWATCHES_PER_ROW) * u * 3;
    out.push(
      `<rect x="${x}" y="${y}" width="${u * 3}" height="${u * 2}" fill="${bandColour(k, bands.length)}" stroke="#333" stroke-width="${u * 0.1}"/><text x="${x + u * 3.5}" y="${y + u * 1.7}" font-size="${u * 1.8}">${b.levelDb}+</text>`,
    );
  });
  note.forEach((line, i) =>
    out.push(
      `<text x="${box.minX + u * 2}" y="${ly + swatchRows * u * 3 + u * 2 + i * u * 2.5}" font-size="${u * 1.7}">${esc(line)}</text>`,
    ),
  );
  out.push('</svg>');
  return `${out.join('\n')}\n`;
}

/** The grid as CSV: x, y, level (dB, empty where not computed), one line per point. */
export function mapCsv(grid: LevelGrid): string {
  const lines = ['x,y,level'];
  for (let j = 0; j < grid.ny; j++) {
    for (let i = 0; i < grid.nx; i++) {
      const v = grid.levelsDb[j * grid.nx + i] as number;
      lines.push(
        `${+(grid.x0 + i * grid.spacingM).toFixed(3)},${+(grid.y0 + j * grid.spacingM).toFixed(3)},${Number.isFinite(v) ? v.toFixed(2) : ''}`,
      );
    }
  }
  return `${lines.join('\n')}\n`;
}
