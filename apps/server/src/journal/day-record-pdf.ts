import type { DayReviewView, JournalEntryView } from '@jarday/contracts';
import { formatDuration } from '@jarday/live';
import PDFDocument from 'pdfkit';

const WARNING = '#b45309';
const WARNING_FILL = '#fdf0dc';
const INK = '#1f2933';
const MUTED = '#52606d';

/** "14:05 UTC": the record gives server time, as the journal keeps it. */
const clock = (ms: number | null) => (ms === null ? '-' : `${new Date(ms).toISOString().slice(11, 16)} UTC`);
const percent = (rate: number | null) => (rate === null ? 'not checked yet' : `${Math.round(rate * 100)}%`);

type Doc = InstanceType<typeof PDFDocument>;

/** Columns of text on one line at fixed x positions; a new page first when the line would not fit. */
function row(doc: Doc, cells: string[], widths: number[], opts: { bold?: boolean; color?: string } = {}) {
  const x0 = doc.page.margins.left;
  doc
    .font(opts.bold ? 'Helvetica-Bold' : 'Helvetica')
    .fontSize(9)
    .fillColor(opts.color ?? INK);
  const height = Math.max(...cells.map((c, i) => doc.heightOfString(c, { width: widths[i]! - 4 })));
  if (doc.y + height > doc.page.height - doc.page.margins.bottom) doc.addPage();
  const y = doc.y;
  let x = x0;
  cells.forEach((c, i) => {
    doc.text(c, x, y, { width: widths[i]! - 4 });
    x += widths[i]!;
  });
  doc.x = x0;
  doc.y = y + height + 3;
}

function heading(doc: Doc, text: string) {
  doc.moveDown(0.8).font('Helvetica-Bold').fontSize(13).fillColor(INK).text(text, doc.page.margins.left);
  doc.moveDown(0.3);
}

/**
 * The printable day record: title, date and altitude, the summary, the loads, every safety override in the warning
 * colour with its reason, the seal results, then every journal entry. Returns the finished PDF's bytes.
 */
export function dayRecordPdf(review: DayReviewView, entries: readonly JournalEntryView[], kitchenName: string) {
  const { day, summary } = review;
  const doc = new PDFDocument({
    size: 'A4',
    margin: 48,
    info: { Title: `${day.title}, ${day.date}`, Author: kitchenName, Subject: 'Jarday day record' },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  doc.font('Helvetica-Bold').fontSize(20).fillColor(INK).text(day.title);
  doc.font('Helvetica').fontSize(11).fillColor(MUTED);
  doc.text(
    `${kitchenName} - canning day of ${day.date} - altitude ${day.altitude.value.toLocaleString('en-US')} ${day.altitude.unit}`,
  );
  doc.text(
    `Day ${day.status}${day.closedAt ? ` at ${clock(Date.parse(day.closedAt))}` : ''}. Times are server time (UTC).`,
  );

  heading(doc, 'Summary');
  const sizes = summary.jarsBySize.map((s) => `${s.jars} ${s.jarSize}`).join(', ') || 'none';
  const rang = summary.alarms.length
    ? `${summary.alarms.length} alarms; longest ring ${summary.longestRingMs === null ? '-' : formatDuration(summary.longestRingMs)}, average ${summary.averageRingMs === null ? '-' : formatDuration(summary.averageRingMs)}; ${summary.alarmsUnanswered} unanswered`
    : 'no alarms';
  doc.font('Helvetica').fontSize(10).fillColor(INK);
  doc.text(`Loads processed: ${summary.loadsProcessed} of ${summary.loads.length}`);
  doc.text(`Jars processed: ${summary.jarsProcessed} (${sizes})`);
  doc.text(
    `Seal rate: ${percent(summary.seals.rate)} (${summary.seals.sealed} of ${summary.seals.checked} checked jars sealed)`,
  );
  doc.text(`Boil or pressure lost: ${summary.boilLosses} time(s). Alarms: ${rang}.`);

  heading(doc, 'Loads');
  const loadWidths = [40, 150, 90, 55, 55, 55, 54];
  row(doc, ['Load', 'Recipe', 'Jars', 'Minutes', 'Come-up', 'Done', 'Lifted'], loadWidths, { bold: true });
  for (const l of summary.loads) {
    row(
      doc,
      [
        String(l.number),
        `${l.recipeName} (${l.cannerName})`,
        `${l.jars} ${l.jarSize}`,
        `${l.minutes}${l.boilLosses ? ` (+${l.boilLosses} lost)` : ''}`,
        l.comeUpMs === null ? '-' : formatDuration(l.comeUpMs),
        clock(l.processedAt),
        clock(l.liftedAt),
      ],
      loadWidths,
    );
  }

  heading(doc, `Safety overrides (${summary.overrides.length})`);
  if (summary.overrides.length === 0) doc.font('Helvetica').fontSize(10).fillColor(INK).text('None.');
  for (const o of summary.overrides) {
    const text = `${clock(o.at)} - ${o.byName}: ${o.what}\nReason: ${o.reason}`;
    doc.font('Helvetica-Bold').fontSize(10);
    const width = doc.page.width - doc.page.margins.left - doc.page.margins.right;
    const height = doc.heightOfString(text, { width: width - 16 }) + 12;
    if (doc.y + height > doc.page.height - doc.page.margins.bottom) doc.addPage();
    const y = doc.y;
    doc.rect(doc.page.margins.left, y, width, height).fillAndStroke(WARNING_FILL, WARNING);
    doc.fillColor(WARNING).text(text, doc.page.margins.left + 8, y + 6, { width: width - 16 });
    doc.x = doc.page.margins.left;
    doc.y = y + height + 6;
  }

  heading(doc, 'Seal results');
  doc.font('Helvetica').fontSize(10).fillColor(INK);
  doc.text(
    summary.seals.checked === 0
      ? 'No jars checked yet: seals are checked after the jars have cooled 12 to 24 hours.'
      : `${summary.seals.sealed} sealed, ${summary.seals.checked - summary.seals.sealed} not sealed, of ${summary.seals.checked} checked (${percent(summary.seals.rate)}). Unsealed jars go to the fridge or are reprocessed within 24 hours.`,
  );

  heading(doc, `Journal (${entries.length} entries)`);
  const widths = [28, 62, 80, 70, 259];
  row(doc, ['#', 'Time', 'Who', 'Device', 'What happened'], widths, { bold: true });
  for (const e of entries) {
    const warn = e.kind === 'override';
    row(
      doc,
      [String(e.seq), clock(Date.parse(e.at)), e.actor?.name ?? 'Jarday', e.deviceId?.slice(0, 8) ?? 'server', e.text],
      widths,
      warn ? { bold: true, color: WARNING } : {},
    );
  }
  doc.end();
  return done;
}
