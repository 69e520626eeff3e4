import { existsSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import PDFDocument from 'pdfkit';
import QRCode from 'qrcode';
import { labelSlot, type SheetGeometry } from './label-sheets.js';

/** What one label says; `url` is what its QR code opens. */
export interface JarLabel {
  product: string;
  cannedOn: string;
  lotCode: string;
  loadNumber: number;
  jarNumber: number;
  bestBy: string;
  url: string;
}

/** Roboto from @fontsource (already in the workspace for the web app), else the PDF's built-in Helvetica. */
function fonts(): { regular: string; bold: string } | null {
  try {
    const css = createRequire(import.meta.url).resolve('@fontsource/roboto');
    const files = join(dirname(css), 'files');
    const regular = join(files, 'roboto-latin-400-normal.woff');
    const bold = join(files, 'roboto-latin-700-normal.woff');
    return existsSync(regular) && existsSync(bold) ? { regular, bold } : null;
  } catch {
    return null;
  }
}

const DATE = new Intl.DateTimeFormat('en-US', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
/** "Aug 15, 2026": a calendar date (YYYY-MM-DD) read at noon UTC, so no time zone can move it a day. */
export const labelDate = (ymd: string) => DATE.format(new Date(`${ymd}T12:00:00Z`));

const qrPng = (url: string) => QRCode.toBuffer(url, { errorCorrectionLevel: 'M', margin: 1, scale: 8 });

/** A PDF of jar labels laid out on the sheet's grid, one label per jar, pages added as they fill. */
export async function renderLabels(sheet: SheetGeometry, labels: JarLabel[]): Promise<Buffer> {
  const doc = new PDFDocument({
    size: [sheet.page.width, sheet.page.height],
    margin: 0,
    autoFirstPage: false,
    info: { Title: 'Jar labels', Creator: 'Jarday' },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const f = fonts();
  const regular = f ? 'label-regular' : 'Helvetica';
  const bold = f ? 'label-bold' : 'Helvetica-Bold';
  if (f) {
    doc.registerFont(regular, f.regular);
    doc.registerFont(bold, f.bold);
  }
  let page = -1;
  for (const [n, label] of labels.entries()) {
    const slot = labelSlot(sheet, n);
    while (page < slot.page) {
      doc.addPage();
      page += 1;
    }
    const qr = await qrPng(label.url);
    if (sheet.shape === 'round') drawRound(doc, sheet, slot, label, qr, regular, bold);
    else drawRect(doc, sheet, slot, label, qr, regular, bold);
  }
  doc.end();
  return done;
}

type Doc = PDFKit.PDFDocument;
type Slot = { x: number; y: number };

/** QR on the left, the words on the right; sizes follow the label so one layout serves both rectangle sheets. */
function drawRect(doc: Doc, s: SheetGeometry, at: Slot, l: JarLabel, qr: Buffer, regular: string, bold: string) {
  const pad = s.height * 0.09;
  const side = s.height * 0.7;
  doc.image(qr, at.x + pad, at.y + (s.height - side) / 2, { width: side, height: side });
  const x = at.x + side + 2 * pad;
  const width = s.width - side - 3 * pad;
  const big = Math.min(s.height / 9, width / 8);
  const small = Math.min(s.height / 12, width / 10.5);
  doc
    .font(bold)
    .fontSize(big)
    .text(l.product, x, at.y + pad, { width, height: big * 2.4, ellipsis: true });
  doc.moveDown(0.25).font(regular).fontSize(small);
  for (const line of [
    `Lot ${l.lotCode}`,
    `Load ${l.loadNumber} · jar ${l.jarNumber}`,
    `Canned ${labelDate(l.cannedOn)}`,
    `Best by ${labelDate(l.bestBy)}`,
  ]) {
    doc.text(line, { width, lineBreak: false, ellipsis: true });
  }
}

/** A lid label: the product over the QR code, the lot, jar and dates under it, all inside the circle. */
function drawRound(doc: Doc, s: SheetGeometry, at: Slot, l: JarLabel, qr: Buffer, regular: string, bold: string) {
  const d = s.width;
  const cx = at.x + d / 2;
  const side = d * 0.36;
  const centred = (width: number) => ({ width, align: 'center' as const, lineBreak: false, ellipsis: true });
  doc
    .font(bold)
    .fontSize(d / 15)
    .text(l.product, cx - d * 0.33, at.y + d * 0.13, {
      width: d * 0.66,
      align: 'center',
      height: d * 0.17,
      ellipsis: true,
    });
  doc.image(qr, cx - side / 2, at.y + d * 0.33, { width: side, height: side });
  doc.font(regular).fontSize(d / 18);
  doc.text(
    `${l.lotCode} · load ${l.loadNumber} · jar ${l.jarNumber}`,
    cx - d * 0.36,
    at.y + d * 0.7,
    centred(d * 0.72),
  );
  doc.text(`Canned ${labelDate(l.cannedOn)}`, cx - d * 0.33, undefined, centred(d * 0.66));
  doc.text(`Best by ${labelDate(l.bestBy)}`, cx - d * 0.3, undefined, centred(d * 0.6));
}
