// A seal manufacturer's product data sheet: header, product and family, the seal drawn in its
// joint, the movement range in inches and millimetres, and the installation notes.
import type { DemoFile } from './types';
import { calendarDate, longDate, openPdf, requireFileName } from './pdfDocument';
import { drawSealSection } from './sealSection';

export type SealSheetSpec = {
  fileName: string;
  manufacturer: string;
  product: string;
  familyLabel: string;
  movementCapacityIn: number;
  minOpeningIn: number;
  maxOpeningIn: number;
  notes: string[];
  /** Revision date of the sheet, YYYY-MM-DD; fixes the PDF's dates too. */
  date?: string;
};

// The inch is exactly 25.4 mm (international yard and pound agreement, 1959).
export const mmPerInch = 25.4;
export const toMm = (inches: number) => Math.round(inches * mmPerInch);

const ink = '#17242E';
const accent = '#2C4A5E';
const muted = '#5B6670';

function validate(spec: SealSheetSpec) {
  const what = 'sealDataSheet';
  requireFileName(what, spec.fileName, /\.pdf$/i, '.pdf');
  const { movementCapacityIn: move, minOpeningIn: min, maxOpeningIn: max } = spec;
  if (![move, min, max].every(Number.isFinite)) throw new Error(`${what}: movement and openings must be numbers of inches`);
  if (min < 0 || max <= min) throw new Error(`${what}: the opening must run from a minimum of 0 in or more up to a larger maximum (got ${min} to ${max} in)`);
  // A seal cannot take more movement than the range of opening it works in (common practice).
  if (move <= 0 || move > max - min + 1e-9) throw new Error(`${what}: movement capacity ${move} in must be positive and no more than the opening range ${max - min} in`);
  if (!spec.product.trim() || !spec.manufacturer.trim()) throw new Error(`${what}: manufacturer and product are required`);
}

export async function sealDataSheet(spec: SealSheetSpec): Promise<DemoFile> {
  validate(spec);
  const issued = calendarDate('sealDataSheet', spec.date ?? '2026-01-15');
  const { doc, finished } = openPdf({
    size: 'LETTER',
    margin: 54,
    title: `${spec.product} product data sheet`,
    author: spec.manufacturer,
    subject: `${spec.familyLabel}: movement ${spec.movementCapacityIn} in`,
    date: issued,
  });
  const left = 54;
  const right = 558;

  // Header: a plain geometric mark, the maker's name, and what the sheet is.
  doc.save().fillColor(accent).polygon([left, 78], [left + 16, 46], [left + 24, 46], [left + 8, 78]).fill();
  doc.polygon([left + 14, 78], [left + 30, 46], [left + 38, 46], [left + 22, 78]).fill().restore();
  doc.font('strong').fontSize(16).fillColor(ink).text(spec.manufacturer, left + 48, 48, { width: 300, lineBreak: false });
  doc.font('body').fontSize(8.5).fillColor(muted).text('Expansion joint seals for bridge decks', left + 48, 68, { lineBreak: false });
  doc.font('medium').fontSize(8).fillColor(accent).text('PRODUCT DATA SHEET', right - 180, 50, { width: 180, align: 'right', characterSpacing: 1, lineBreak: false });
  doc.font('body').fontSize(8).fillColor(muted).text(`Issued ${longDate(issued)}`, right - 180, 64, { width: 180, align: 'right', lineBreak: false });
  doc.save().lineWidth(2).strokeColor(accent).moveTo(left, 92).lineTo(right, 92).stroke().restore();

  doc.font('strong').fontSize(24).fillColor(ink).text(spec.product, left, 108, { width: right - left });
  doc.font('medium').fontSize(12).fillColor(muted).text(spec.familyLabel, left, doc.y + 2, { width: right - left });

  // The figure on the left, the movement table on the right.
  const top = doc.y + 22;
  const family = /compression/i.test(spec.familyLabel) ? 'compression' : 'strip';
  doc.save().lineWidth(0.5).strokeColor('#C9CED3').rect(left, top, 280, 200).stroke().restore();
  drawSealSection(doc, { x: left + 14, y: top + 26, width: 252, height: 150 }, { family, minOpeningIn: spec.minOpeningIn, maxOpeningIn: spec.maxOpeningIn });
  doc.font('medium').fontSize(8).fillColor(ink).text('Typical section at the joint', left + 10, top + 8, { lineBreak: false });
  doc.font('body').fontSize(7).fillColor(muted).text('Not to scale', left + 10, top + 186, { lineBreak: false });

  const tx = left + 300;
  const tw = right - tx;
  doc.font('strong').fontSize(11).fillColor(ink).text('Movement data', tx, top);
  const cols = [tx, tx + tw * 0.55, tx + tw * 0.78];
  let ty = top + 22;
  doc.save().rect(tx, ty - 4, tw, 18).fill('#E9EDF0').restore();
  ['Property', 'in', 'mm'].forEach((h, i) => doc.font('medium').fontSize(8.5).fillColor(ink).text(h, cols[i]! + 6, ty, { lineBreak: false }));
  ty += 18;
  const rows: [string, number][] = [
    ['Movement capacity', spec.movementCapacityIn],
    ['Minimum opening', spec.minOpeningIn],
    ['Maximum opening', spec.maxOpeningIn],
  ];
  for (const [label, inches] of rows) {
    doc.font('body').fontSize(9.5).fillColor(ink).text(label, cols[0]! + 6, ty, { lineBreak: false });
    doc.text(String(inches), cols[1]! + 6, ty, { lineBreak: false });
    doc.text(String(toMm(inches)), cols[2]! + 6, ty, { lineBreak: false });
    ty += 18;
    doc.save().lineWidth(0.4).strokeColor('#C9CED3').moveTo(tx, ty - 5).lineTo(right, ty - 5).stroke().restore();
  }
  doc.font('body').fontSize(7.5).fillColor(muted).text('Openings are measured square to the joint at the deck surface. Millimetres are rounded to the nearest whole number.', tx, ty + 4, { width: tw });

  doc.font('strong').fontSize(11).fillColor(ink).text('Installation notes', left, top + 226);
  doc.moveDown(0.4);
  spec.notes.forEach((note, i) => {
    const y = doc.y;
    doc.font('medium').fontSize(9.5).fillColor(accent).text(`${i + 1}`, left, y, { width: 14 });
    doc.font('body').fontSize(9.5).fillColor(ink).text(note, left + 18, y, { width: right - left - 18, lineGap: 1.5 });
    doc.moveDown(0.5);
  });

  // The footer sits in the bottom margin, where pdfkit would otherwise start a new page.
  doc.page.margins.bottom = 0;
  doc.font('body').fontSize(7).fillColor(muted).text(
    `${spec.manufacturer} · ${spec.product} · Sample sheet of the Spanrelay demo: the maker and the product are invented.`,
    left,
    740,
    { width: right - left, align: 'center', lineBreak: false },
  );
  doc.end();
  return finished.then((bytes) => ({ fileName: spec.fileName, contentType: 'application/pdf', bytes }));
}
