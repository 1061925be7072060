/**
 * The plan with its level map as a file: the plan's SVG copied with the look it needs on its
 * own (styles inlined, handles hidden), saved as SVG, or drawn on a canvas and saved as PNG.
 */

/** Width and height of an exported picture, px. */
const EXPORT_PX = 1600;

const EXPORT_STYLE = [
  'text{font-family:DejaVu Sans,sans-serif;fill:#1d2428;paint-order:stroke;stroke:#fffef9;stroke-width:3px;vector-effect:non-scaling-stroke}',
  '.grid line{stroke:#d8d2c4;stroke-width:0.6;vector-effect:non-scaling-stroke}',
  '.grid line.axis{stroke:#9a9080;stroke-width:1.2}',
  '.barrier .line{fill:none;stroke:#3a2f22;stroke-width:5;vector-effect:non-scaling-stroke}',
  '.barrier .hit{display:none}',
  '.vertices{display:none}',
  '.duty .mark{fill:#8a5a12;stroke:#fff;stroke-width:1.5;vector-effect:non-scaling-stroke}',
  '.duty .area{fill:#8a5a12;fill-opacity:.18;stroke:#8a5a12;stroke-width:1.5;vector-effect:non-scaling-stroke}',
  '.duty .trench{fill:none;stroke:#8a5a12;stroke-width:4;vector-effect:non-scaling-stroke}',
  '.receiver .mark{fill:#23465a;stroke:#fff;stroke-width:1.5;vector-effect:non-scaling-stroke}',
  '.receiver .mark.over{fill:#a12a2a}',
].join(' ');

/** The plan's SVG as a stand-alone document. */
export function planSvgText(svg: SVGSVGElement): string {
  const copy = svg.cloneNode(true) as SVGSVGElement;
  copy.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  copy.setAttribute('width', String(EXPORT_PX));
  copy.setAttribute('height', String(EXPORT_PX));
  const style = document.createElementNS('http://www.w3.org/2000/svg', 'style');
  style.textContent = EXPORT_STYLE;
  copy.prepend(style);
  return new XMLSerializer().serializeToString(copy);
}

/** Saves a blob under a file name through a temporary link. */
export function download(blob: Blob, name: string): void {
  const a = document.createElement('a');
  a.href = URL.createObjectURL(blob);
  a.download = name;
  a.click();
  setTimeout(() => URL.revokeObjectURL(a.href), 1000);
}

/** Saves the plan as `<base>.svg`. */
export function exportPlanSvg(svg: SVGSVGElement, base: string): void {
  download(new Blob([planSvgText(svg)], { type: 'image/svg+xml' }), `${base}.svg`);
}

/** Draws the plan on a white canvas and saves it as `<base>.png`. */
export async function exportPlanPng(svg: SVGSVGElement, base: string): Promise<void> {
  const img = new Image();
  img.src = URL.createObjectURL(new Blob([planSvgText(svg)], { type: 'image/svg+xml' }));
  await img.decode();
  const canvas = document.createElement('canvas');
  canvas.width = EXPORT_PX;
  canvas.height = EXPORT_PX;
  const ctx = canvas.getContext('2d');
  if (!ctx) return;
  ctx.fillStyle = '#fff';
  ctx.fillRect(0, 0, EXPORT_PX, EXPORT_PX);
  ctx.drawImage(img, 0, 0, EXPORT_PX, EXPORT_PX);
  URL.revokeObjectURL(img.src);
  canvas.toBlob((b) => b && download(b, `${base}.png`), 'image/png');
}
