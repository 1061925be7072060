/** SVG path data of level-map polygons (a site point (x, y) drawn at (x, −y), so north is up). */

/** SVG path data of polygons given as rings of [x, y] site points (drawn at (x, −y)). */
export function ringsPath(polygons: readonly [number, number][][][]): string {
  let d = '';
  for (const poly of polygons)
    for (const ring of poly) {
      ring.forEach(([x, y], i) => {
        d += `${i === 0 ? 'M' : 'L'}${x.toFixed(2)} ${(-y).toFixed(2)}`;
      });
      d += 'Z';
    }
  return d;
}
