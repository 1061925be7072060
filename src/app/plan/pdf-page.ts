/**
 * The first page of a PDF site drawing, rendered to a PNG (or, when that is over the size
 * limit, a JPEG) data URL. pdfjs-dist is loaded only when a PDF is chosen.
 */
import { PLAN_IMAGE_MAX_BYTES } from '../../ledger/model/plan-model.ts';
import { dataUrlBytes } from '../../ledger/validate/validate-plan.ts';

/** Longest side of the rendered page, pixels. */
const MAX_SIDE_PX = 2400;

export interface RenderedPage {
  dataUrl: string;
  widthPx: number;
  heightPx: number;
}

/** Renders page 1 of the PDF bytes; throws an Error with words when the file cannot be read. */
export async function firstPdfPage(bytes: ArrayBuffer): Promise<RenderedPage> {
  const [pdfjs, worker] = await Promise.all([import('pdfjs-dist'), import('pdfjs-dist/build/pdf.worker.min.mjs?url')]);
  pdfjs.GlobalWorkerOptions.workerSrc = worker.default;
  const doc = await pdfjs.getDocument({ data: new Uint8Array(bytes) }).promise;
  try {
    const page = await doc.getPage(1);
    const base = page.getViewport({ scale: 1 });
    const scale = Math.min(4, MAX_SIDE_PX / Math.max(base.width, base.height));
    const viewport = page.getViewport({ scale });
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(viewport.width);
    canvas.height = Math.round(viewport.height);
    const context = canvas.getContext('2d');
    if (!context) throw new Error('the page could not be drawn (no canvas)');
    context.fillStyle = '#ffffff';
    context.fillRect(0, 0, canvas.width, canvas.height);
    await page.render({ canvas, canvasContext: context, viewport }).promise;
    let dataUrl = canvas.toDataURL('image/png');
    if (dataUrlBytes(dataUrl) > PLAN_IMAGE_MAX_BYTES) dataUrl = canvas.toDataURL('image/jpeg', 0.85);
    return { dataUrl, widthPx: canvas.width, heightPx: canvas.height };
  } finally {
    void doc.destroy();
  }
}
