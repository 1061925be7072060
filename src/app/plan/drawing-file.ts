/**
 * A drawing of the site read from a file the user chose: a PNG or JPEG as it is, or the first
 * page of a PDF rendered to an image (pdfjs-dist, loaded only now). Too large, unreadable or
 * of another kind, the file is refused with a sentence saying what is accepted; nothing of
 * the project changes then.
 */
import type { PlanImage } from '../../ledger/model/model.ts';
import { PLAN_IMAGE_MAX_BYTES } from '../../ledger/model/plan-model.ts';
import { PLAN_IMAGE_LIMIT_WORDS, dataUrlBytes } from '../../ledger/validate/validate-plan.ts';

const mb = (bytes: number) => (bytes / 1048576).toFixed(1);

/** The file as a data URL (a PNG or JPEG), or the message saying why it was refused. */
async function imageDataUrl(file: File, onstatus: (text: string) => void): Promise<string> {
  const pdf = file.type === 'application/pdf' || /\.pdf$/i.test(file.name);
  if (!pdf && file.type !== 'image/png' && file.type !== 'image/jpeg')
    throw new Error(
      `${file.name}: ${file.type || 'this file'} is not accepted (use a PNG or JPEG drawing of the site, or a PDF whose first page is the drawing)`,
    );
  if (pdf) {
    onstatus(`Reading the first page of ${file.name}…`);
    let dataUrl: string;
    try {
      const { firstPdfPage } = await import('./pdf-page.ts');
      dataUrl = (await firstPdfPage(await file.arrayBuffer())).dataUrl;
    } catch (e) {
      throw new Error(
        `${file.name}: the PDF could not be read (${e instanceof Error ? e.message : String(e)}; use a PDF whose first page is the drawing, or a PNG or JPEG)`,
        { cause: e },
      );
    }
    if (dataUrlBytes(dataUrl) > PLAN_IMAGE_MAX_BYTES)
      throw new Error(
        `${file.name}: its first page is ${mb(dataUrlBytes(dataUrl))} MB as an image, too large (at most ${PLAN_IMAGE_LIMIT_WORDS}; crop the drawing)`,
      );
    return dataUrl;
  }
  if (file.size > PLAN_IMAGE_MAX_BYTES)
    throw new Error(
      `${file.name}: ${mb(file.size)} MB is too large (use a drawing of at most ${PLAN_IMAGE_LIMIT_WORDS}; crop it or save it at a lower resolution)`,
    );
  return new Promise<string>((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(String(reader.result));
    reader.onerror = () => reject(new Error(`${file.name}: the file could not be read (${String(reader.error)})`));
    reader.readAsDataURL(file);
  });
}

/**
 * The drawing as the project stores it, or a message. Until the scale is set, the drawing
 * spans 200 m with its centre on the site grid's origin and north up.
 */
export async function readDrawingFile(file: File, onstatus: (text: string) => void): Promise<PlanImage | string> {
  let dataUrl: string;
  try {
    dataUrl = await imageDataUrl(file, onstatus);
  } catch (e) {
    return e instanceof Error ? e.message : String(e);
  }
  const img = new Image();
  img.src = dataUrl;
  try {
    await img.decode();
  } catch {
    return `${file.name}: the image could not be read (use a PNG or JPEG file)`;
  }
  const w = img.naturalWidth;
  const h = img.naturalHeight;
  return {
    dataUrl,
    fileName: file.name,
    widthPx: w,
    heightPx: h,
    metresPerPixel: 200 / w,
    originPx: { x: w / 2, y: h / 2 },
    northDeg: 0,
  };
}
