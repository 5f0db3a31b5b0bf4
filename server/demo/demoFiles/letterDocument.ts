// A letter or short report on letterhead: the sender's block, date, addressee, subject, the body,
// an optional label/value table (a test report's results, say) and the signature block.
import type { DemoFile } from './types';
import { calendarDate, longDate, openPdf, requireFileName } from './pdfDocument';

export type LetterSpec = {
  fileName: string;
  letterhead: string[];
  /** YYYY-MM-DD; printed as a written date, and fixes the PDF's dates. */
  date: string;
  to: string[];
  subject: string;
  paragraphs: string[];
  table?: { caption: string; rows: [string, string][] };
  /** A first line ending in a comma ("Sincerely,") is the complimentary close: room to sign follows it. */
  signature: string[];
};

const ink = '#1B1F23';
const accent = '#3A4B3F';
const muted = '#5F666C';
const margin = 72;
const pageBottom = 792 - 72;

export async function letterDocument(spec: LetterSpec): Promise<DemoFile> {
  const what = 'letterDocument';
  requireFileName(what, spec.fileName, /\.pdf$/i, '.pdf');
  if (spec.letterhead.length === 0 || !spec.letterhead[0]!.trim()) throw new Error(`${what}: the letterhead needs at least the sender's name`);
  if (!spec.subject.trim()) throw new Error(`${what}: the subject is required`);
  if (spec.signature.length === 0) throw new Error(`${what}: the signature block is empty`);
  const dated = calendarDate(what, spec.date);
  const { doc, finished } = openPdf({
    size: 'LETTER',
    margin,
    title: spec.subject,
    author: spec.letterhead[0]!,
    subject: spec.subject,
    date: dated,
  });
  const width = 612 - 2 * margin;

  // Letterhead: the sender's name large, the rest of the block small, a rule beneath.
  const [name, ...rest] = spec.letterhead;
  doc.font('strong').fontSize(15).fillColor(accent).text(name!, margin, 50, { width, characterSpacing: 0.3 });
  doc.font('body').fontSize(8.5).fillColor(muted).text(rest.join('  ·  '), margin, doc.y + 1, { width });
  const ruleY = doc.y + 6;
  doc.save().lineWidth(1.2).strokeColor(accent).moveTo(margin, ruleY).lineTo(612 - margin, ruleY).stroke().restore();

  doc.font('body').fontSize(10.5).fillColor(ink);
  doc.text(longDate(dated), margin, ruleY + 24);
  doc.moveDown(1.2);
  for (const l of spec.to) doc.text(l);
  doc.moveDown(1.2);
  doc.font('strong').text(`Subject: ${spec.subject}`, { width });
  doc.moveDown(0.8).font('body');
  for (const p of spec.paragraphs) {
    doc.text(p, { width, lineGap: 2.2, align: 'left' });
    doc.moveDown(0.7);
  }

  if (spec.table) drawTable(spec.table);

  // Keep the signature block together.
  const closing = spec.signature[0]!.trim().endsWith(',');
  const needed = 40 + spec.signature.length * 14;
  if (doc.y + needed > pageBottom) doc.addPage();
  doc.moveDown(0.6);
  const lines = closing ? spec.signature.slice(1) : spec.signature;
  if (closing) doc.text(spec.signature[0]!);
  doc.moveDown(2.4);
  lines.forEach((l, i) => doc.font(i === 0 ? 'medium' : 'body').text(l));
  doc.end();
  return finished.then((bytes) => ({ fileName: spec.fileName, contentType: 'application/pdf', bytes }));

  function drawTable(table: NonNullable<LetterSpec['table']>) {
    const rowH = 18;
    if (doc.y + 40 > pageBottom) doc.addPage();
    doc.moveDown(0.3).font('strong').fontSize(10).fillColor(ink).text(table.caption, margin, doc.y, { width });
    let y = doc.y + 6;
    const split = margin + width * 0.55;
    doc.save().lineWidth(0.9).strokeColor(accent).moveTo(margin, y).lineTo(margin + width, y).stroke().restore();
    table.rows.forEach(([label, value], i) => {
      doc.font('body').fontSize(9.5);
      const h = Math.max(rowH, doc.heightOfString(label, { width: split - margin - 12 }) + 8, doc.heightOfString(value, { width: margin + width - split - 12 }) + 8);
      if (y + h > pageBottom) {
        doc.addPage();
        y = margin;
      }
      if (i % 2 === 1) doc.save().rect(margin, y, width, h).fill('#F1F3F2').restore();
      doc.fillColor(ink).text(label, margin + 6, y + 4.5, { width: split - margin - 12 });
      doc.font('medium').text(value, split + 6, y + 4.5, { width: margin + width - split - 12 });
      y += h;
      doc.save().lineWidth(0.35).strokeColor('#B9C0BB').moveTo(margin, y).lineTo(margin + width, y).stroke().restore();
    });
    doc.save().lineWidth(0.9).strokeColor(accent).moveTo(margin, y).lineTo(margin + width, y).stroke().restore();
    doc.font('body').fontSize(10.5).fillColor(ink);
    doc.x = margin;
    doc.y = y + 14;
  }
}
