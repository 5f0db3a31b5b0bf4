// A contractor's submittal sketch on an 11x17 plan-sheet frame: a girder-line elevation drawn to
// a plan scale from the span lengths, the placement sequence and the joints the request is about,
// and a title block that says plainly the sketch is not a sealed plan.
import type { DemoFile } from './types';
import { calendarDate, dashPattern, feetInches, openPdf, requireFileName } from './pdfDocument';
import { chooseScale, packLabels } from './sketchLayout';

export type SketchSpec = {
  fileName: string;
  agency: string;
  projectName: string;
  structureNumber: string;
  sheet: string;
  title: string;
  preparedBy: string;
  date: string;
  spansFt: number[];
  segments?: { fromFt: number; toFt: number; order: number }[];
  marks?: { atFt: number; label: string; kind: 'planned' | 'proposed' | 'emergency' }[];
  expansionJoints?: { atFt: number; label: string }[];
  notes: string[];
};

export const sketchDisclaimer = 'Submittal sketch for review; not a sealed plan';
export const titleBlockStamp = 'SUBMITTAL SKETCH - NOT A SEALED PLAN';

const ink = '#111111';
const red = '#A3271F';
const grey = '#555555';

// ANSI B landscape in points, with a wider binding margin on the left (common practice).
const page = { width: 1224, height: 792 };
const frame = { left: 54, top: 27, right: 1197, bottom: 765 };
const titleBlockTop = 669;

// Vertical positions of the elevation; the vertical is schematic, the horizontal is to scale.
const y = {
  deckTop: 262,
  deckBand: 10,
  girder: 18,
  groundBelowGirder: 42,
  column: 70,
};

const kindWords = { planned: 'Planned', proposed: 'Proposed', emergency: 'Emergency' } as const;
const kindDash: Record<keyof typeof kindWords, number[] | null> = { planned: [4, 2.5], proposed: null, emergency: [7, 2, 1.2, 2] };

function validate(spec: SketchSpec): number {
  const what = 'submittalSketch';
  requireFileName(what, spec.fileName, /\.pdf$/i, '.pdf');
  if (spec.spansFt.length === 0) throw new Error(`${what}: spansFt is empty; a girder line needs at least one span`);
  spec.spansFt.forEach((s, i) => {
    if (!Number.isFinite(s) || s <= 0) throw new Error(`${what}: span ${i + 1} is ${s} ft; every span must be a positive length`);
  });
  const length = spec.spansFt.reduce((a, b) => a + b, 0);
  const inside = (ft: number) => Number.isFinite(ft) && ft >= 0 && ft <= length + 1e-9;
  const orders = new Set<number>();
  for (const s of spec.segments ?? []) {
    if (!inside(s.fromFt) || !inside(s.toFt) || s.toFt <= s.fromFt)
      throw new Error(`${what}: placement ${s.order} from ${s.fromFt} to ${s.toFt} ft is not a length within the girder line (0 to ${length} ft)`);
    if (!Number.isInteger(s.order) || s.order < 1 || orders.has(s.order))
      throw new Error(`${what}: placement order ${s.order} must be a whole number from 1, used once`);
    orders.add(s.order);
  }
  for (const m of [...(spec.marks ?? []), ...(spec.expansionJoints ?? [])]) {
    if (!inside(m.atFt)) throw new Error(`${what}: "${m.label}" at ${m.atFt} ft is beyond the girder line (0 to ${length} ft)`);
  }
  return length;
}

// async so that a bad spec rejects the promise, as every other failure does.
export async function submittalSketch(spec: SketchSpec): Promise<DemoFile> {
  const lengthFt = validate(spec);
  const date = calendarDate('submittalSketch', spec.date);
  const { doc, finished } = openPdf({
    size: 'TABLOID',
    layout: 'landscape',
    margin: 0,
    title: `${spec.sheet} ${spec.title}`,
    author: spec.preparedBy,
    subject: `${spec.projectName}, structure ${spec.structureNumber}: ${sketchDisclaimer}`,
    date,
  });

  // Where the drawing is placed: centred, at the largest plan scale that leaves room for the
  // abutment embankments either side.
  const scaleFtPerIn = chooseScale(lengthFt, (frame.right - frame.left - 200) / 72);
  const ptPerFt = 72 / scaleFtPerIn;
  const drawnWidth = lengthFt * ptPerFt;
  const x0 = (frame.left + frame.right) / 2 - drawnWidth / 2;
  const xAt = (ft: number) => x0 + ft * ptPerFt;
  const supportsFt = spec.spansFt.reduce<number[]>((acc, s) => [...acc, (acc.at(-1) ?? 0) + s], [0]);

  const line = (x1: number, y1: number, x2: number, y2: number, width = 0.5, colour = ink) =>
    doc.save().lineWidth(width).strokeColor(colour).moveTo(x1, y1).lineTo(x2, y2).stroke().restore();
  const text = (s: string, x: number, yy: number, size: number, font = 'body', opts: PDFKit.Mixins.TextOptions = {}, colour = ink) =>
    doc.font(font).fontSize(size).fillColor(colour).text(s, x, yy, { lineBreak: false, ...opts });

  drawFrame();
  drawTitleBlock();
  drawDisclaimerStamp();
  drawViewTitle();
  drawSegments();
  drawSuperstructure();
  drawSubstructure();
  drawJointMarks();
  drawDimensions();
  drawNotesAndLegend();
  doc.end();
  return finished.then((bytes) => ({ fileName: spec.fileName, contentType: 'application/pdf', bytes }));

  function drawFrame() {
    doc.save().lineWidth(1.4).strokeColor(ink).rect(frame.left, frame.top, frame.right - frame.left, frame.bottom - frame.top).stroke().restore();
    // Trim marks at the sheet corners.
    for (const [cx, cy] of [[18, 18], [page.width - 18, 18], [18, page.height - 18], [page.width - 18, page.height - 18]] as const) {
      line(cx - 6, cy, cx + 6, cy, 0.3);
      line(cx, cy - 6, cx, cy + 6, 0.3);
    }
  }

  function drawTitleBlock() {
    const top = titleBlockTop;
    const bottom = frame.bottom;
    doc.save().lineWidth(1).strokeColor(ink).moveTo(frame.left, top).lineTo(frame.right, top).stroke().restore();
    const columns = [frame.left, 356, 690, 962, 1108, frame.right];
    columns.slice(1, -1).forEach((cx) => line(cx, top, cx, bottom, 0.7));
    const label = (s: string, x: number, yy: number) => text(s.toUpperCase(), x, yy, 5.8, 'medium', { characterSpacing: 0.6 }, grey);
    const wrap = (s: string, x: number, yy: number, width: number, size: number, font = 'strong') =>
      doc.font(font).fontSize(size).fillColor(ink).text(s, x, yy, { width, lineGap: 0.5, height: 40, ellipsis: true });
    const [c0, c1, c2, c3, c4, c5] = columns as [number, number, number, number, number, number];

    label('Owner', c0 + 8, top + 7);
    wrap(spec.agency, c0 + 8, top + 17, c1 - c0 - 16, 12);
    label('Prepared for review by the owner and the engineer of record', c0 + 8, bottom - 14);

    label('Project', c1 + 8, top + 7);
    wrap(spec.projectName, c1 + 8, top + 17, c2 - c1 - 16, 11.5);
    label('Structure no.', c1 + 8, top + 60);
    text(spec.structureNumber, c1 + 8, top + 70, 11, 'strong');

    label('Sheet title', c2 + 8, top + 7);
    wrap(spec.title, c2 + 8, top + 17, c3 - c2 - 16, 10.5);
    doc.save().lineWidth(0.9).strokeColor(red).rect(c2 + 8, bottom - 25, c3 - c2 - 16, 17).stroke().restore();
    text(titleBlockStamp, c2 + 8, bottom - 20.5, 8, 'strong', { width: c3 - c2 - 16, align: 'center', characterSpacing: 0.3 }, red);

    label('Prepared by', c3 + 8, top + 7);
    wrap(spec.preparedBy, c3 + 8, top + 16, c4 - c3 - 16, 8.5, 'body');
    label('Date', c3 + 8, top + 47);
    text(spec.date, c3 + 8, top + 56, 8.5);
    label('Scale', c3 + 8, top + 72);
    text(`1" = ${scaleFtPerIn}'-0" horiz.`, c3 + 8, top + 81, 8.5);

    label('Sheet', c4 + 8, top + 7);
    doc.font('strong').fontSize(sheetFontSize(c5 - c4 - 16)).fillColor(ink).text(spec.sheet, c4 + 8, top + 34, { width: c5 - c4 - 16, align: 'center', lineBreak: false });
  }

  function sheetFontSize(width: number) {
    let size = 24;
    while (size > 9 && doc.font('strong').fontSize(size).widthOfString(spec.sheet) > width) size -= 1;
    return size;
  }

  function drawDisclaimerStamp() {
    const w = 270;
    const x = frame.right - w - 16;
    const top = frame.top + 16;
    doc.save().lineWidth(1.1).strokeColor(red).rect(x, top, w, 40).stroke().restore();
    text(sketchDisclaimer, x, top + 8, 10, 'strong', { width: w, align: 'center' }, red);
    text("Prepared by the contractor. The engineer of record's sealed plans govern.", x, top + 24, 7.2, 'body', { width: w, align: 'center' }, red);
  }

  function drawViewTitle() {
    const x = frame.left + 24;
    const top = frame.top + 18;
    text('GIRDER-LINE ELEVATION', x, top, 13, 'strong', { characterSpacing: 0.8 });
    const w = doc.widthOfString('GIRDER-LINE ELEVATION', { characterSpacing: 0.8 });
    line(x, top + 17, x + w, top + 17, 1);
    line(x, top + 19.5, x + w, top + 19.5, 0.4);
    text(`Horizontal scale 1" = ${scaleFtPerIn}'-0". Depths and substructure heights are schematic.`, x, top + 25, 8, 'body', {}, grey);
    // A graphic scale, read against the sheet if it is printed at another size.
    const barTop = top + 42;
    const step = scaleFtPerIn * ptPerFt;
    for (let i = 0; i < 4; i++) {
      doc.save().lineWidth(0.5).strokeColor(ink).rect(x + i * step, barTop, step, 4).fillAndStroke(i % 2 === 0 ? ink : '#FFFFFF', ink).restore();
      text(`${i * scaleFtPerIn}`, x + i * step - 10, barTop + 7, 6.5, 'body', { width: 20, align: 'center' });
    }
    text(`${4 * scaleFtPerIn} ft`, x + 4 * step - 10, barTop + 7, 6.5, 'body', { width: 40 });
  }

  function drawSegments() {
    const segments = [...(spec.segments ?? [])].sort((a, b) => a.order - b.order);
    for (const s of segments) {
      const tint = s.order % 2 === 1 ? '#C9CED3' : '#E4E7EA';
      doc.save().rect(xAt(s.fromFt), y.deckTop, (s.toFt - s.fromFt) * ptPerFt, y.deckBand).fill(tint).restore();
      line(xAt(s.fromFt), y.deckTop, xAt(s.fromFt), y.deckTop + y.deckBand, 0.4);
      line(xAt(s.toFt), y.deckTop, xAt(s.toFt), y.deckTop + y.deckBand, 0.4);
    }
  }

  function drawSuperstructure() {
    const left = xAt(0);
    const right = xAt(lengthFt);
    const girderTop = y.deckTop + y.deckBand;
    doc.save().lineWidth(0.8).strokeColor(ink).rect(left, y.deckTop, right - left, y.deckBand).stroke().restore();
    doc.save().lineWidth(0.6).strokeColor(ink).rect(left + 2, girderTop, right - left - 4, y.girder).stroke().restore();
    // Bearings: a small triangle under the girder at each support.
    const bearingTop = girderTop + y.girder;
    for (const ft of supportsFt) {
      const cx = Math.min(Math.max(xAt(ft), left + 6), right - 6);
      doc.save().lineWidth(0.4).strokeColor(ink).fillColor('#FFFFFF').polygon([cx - 4, bearingTop + 5], [cx + 4, bearingTop + 5], [cx, bearingTop]).fillAndStroke().restore();
    }
    // Placement numbers straddle the deck band at the middle of each placement.
    for (const s of spec.segments ?? []) {
      const cx = xAt((s.fromFt + s.toFt) / 2);
      const cy = y.deckTop + y.deckBand / 2;
      doc.save().lineWidth(0.6).strokeColor(ink).fillColor('#FFFFFF').circle(cx, cy, 7).fillAndStroke().restore();
      text(String(s.order), cx - 7, cy - 3.6, 7.5, 'strong', { width: 14, align: 'center' });
    }
  }

  function drawSubstructure() {
    const bearingSeat = y.deckTop + y.deckBand + y.girder + 5;
    const ground = bearingSeat + y.groundBelowGirder;
    const footingTop = bearingSeat + 10 + y.column;
    // Ground line with its earth hatch between the abutment faces; behind each abutment the
    // approach roadway at deck grade, ended by a break line.
    const groundLeft = xAt(0) + 6;
    const groundRight = xAt(lengthFt) - 6;
    line(groundLeft, ground, groundRight, ground, 0.6);
    for (let gx = groundLeft + 6; gx < groundRight - 2; gx += 7) line(gx, ground + 1, gx - 4, ground + 5, 0.3, grey);
    for (const [from, out] of [[xAt(0) - 10, -1], [xAt(lengthFt) + 10, 1]] as const) {
      const end = from + out * 60;
      line(from, y.deckTop, end, y.deckTop, 0.6);
      line(from, y.deckTop + 9, end, y.deckTop + 9, 0.35, grey);
      doc.save().lineWidth(0.35).strokeColor(ink).moveTo(end, y.deckTop - 6).lineTo(end, y.deckTop + 1).lineTo(end + 3, y.deckTop + 3).lineTo(end - 3, y.deckTop + 6).lineTo(end, y.deckTop + 8).lineTo(end, y.deckTop + 15).stroke().restore();
    }

    supportsFt.forEach((ft, i) => {
      const cx = xAt(ft);
      const isAbutment = i === 0 || i === supportsFt.length - 1;
      const outward = i === 0 ? -1 : 1;
      doc.save().lineWidth(0.7).strokeColor(ink);
      if (isAbutment) {
        // Backwall up to the deck, stem down to the footing, the seat under the bearing.
        const back = cx + outward * 10;
        const face = cx - outward * 6;
        doc.polygon([back, y.deckTop], [cx + outward * 4, y.deckTop], [cx + outward * 4, bearingSeat], [face, bearingSeat], [face, footingTop], [back, footingTop]).stroke();
        doc.rect(Math.min(back, face) - 8, footingTop, Math.abs(back - face) + 16, 9).stroke();
      } else {
        doc.rect(cx - 16, bearingSeat, 32, 9).stroke();
        // Above ground the column is seen, below it the hidden lines of column and footing.
        doc.rect(cx - 6, bearingSeat + 9, 12, ground - bearingSeat - 9).stroke();
        doc.dash(3, { space: 2 }).rect(cx - 6, ground, 12, footingTop - ground).stroke();
        doc.rect(cx - 20, footingTop, 40, 9).stroke().undash();
      }
      doc.restore();
      // Centreline of bearing or pier: long dash, short dash.
      dashPattern(doc.save().lineWidth(0.35).strokeColor(ink), [10, 2.5, 2, 2.5]).moveTo(cx, y.deckTop - 14).lineTo(cx, footingTop + 22).stroke().undash().restore();
      const name = isAbutment ? `Abut ${i === 0 ? 1 : 2}` : `Pier ${i}`;
      text(name, cx - 40, footingTop + 24, 8.5, 'strong', { width: 80, align: 'center' });
      text(isAbutment ? 'C/L Brg.' : 'C/L Pier', cx - 40, footingTop + 35, 6.8, 'body', { width: 80, align: 'center' }, grey);
    });
  }

  function drawJointMarks() {
    type Mark = { atFt: number; title: string; detail: string; dash: number[] | null; colour: string; expansion: boolean };
    const marks: Mark[] = [
      ...(spec.marks ?? []).map((m) => ({
        atFt: m.atFt,
        title: m.label,
        detail: `${kindWords[m.kind]} · ${feetInches(m.atFt)} from C/L Brg. Abut 1`,
        dash: kindDash[m.kind],
        colour: m.kind === 'proposed' ? red : ink,
        expansion: false,
      })),
      ...(spec.expansionJoints ?? []).map((j) => ({
        atFt: j.atFt,
        title: j.label,
        detail: `Expansion joint · ${feetInches(j.atFt)} from C/L Brg. Abut 1`,
        dash: null,
        colour: ink,
        expansion: true,
      })),
    ];
    const widths = marks.map((m) => Math.max(doc.font('strong').fontSize(7.8).widthOfString(m.title), doc.font('body').fontSize(6.8).widthOfString(m.detail)) + 4);
    const spots = packLabels(
      marks.map((m, i) => ({ x: xAt(m.atFt), width: widths[i]! })),
      frame.left + 8,
      frame.right - 8,
    );
    marks.forEach((m, i) => {
      const spot = spots[i]!;
      const cx = xAt(m.atFt);
      const labelTop = y.deckTop - 36 - spot.level * 24;
      if (m.expansion) {
        // A gap through the deck band, with the comb of a finger joint drawn over it.
        doc.save().rect(cx - 1.5, y.deckTop - 0.5, 3, y.deckBand + 1).fill('#FFFFFF').restore();
        for (let k = -1; k <= 1; k++) line(cx + k * 1.8, y.deckTop - 3, cx + k * 1.8, y.deckTop + 3, 0.5);
      }
      doc.save().lineWidth(m.dash ? 0.8 : 1.1).strokeColor(m.colour);
      if (m.dash) dashPattern(doc, m.dash);
      doc.moveTo(cx, y.deckTop + y.deckBand + (m.expansion ? y.girder : 4)).lineTo(cx, labelTop + 20).stroke();
      doc.undash().restore();
      // Leader tick and the two lines of label.
      line(cx, labelTop + 20, spot.left < cx ? spot.right : spot.left, labelTop + 20, 0.4, m.colour);
      text(m.title, spot.left + 2, labelTop, 7.8, 'strong', {}, m.colour);
      text(m.detail, spot.left + 2, labelTop + 10.5, 6.8, 'body', {}, m.colour === ink ? grey : m.colour);
    });
  }

  function dimension(fromX: number, toX: number, at: number, above: string, below?: string) {
    line(fromX, at - 7, fromX, at + 7, 0.35);
    line(toX, at - 7, toX, at + 7, 0.35);
    line(fromX, at, toX, at, 0.4);
    // Arrowheads, or oblique ticks where the length is too short for arrows.
    if (toX - fromX > 18) {
      doc.save().fillColor(ink).polygon([fromX, at], [fromX + 6, at - 1.8], [fromX + 6, at + 1.8]).fill().polygon([toX, at], [toX - 6, at - 1.8], [toX - 6, at + 1.8]).fill().restore();
    } else {
      line(fromX - 2.5, at + 2.5, fromX + 2.5, at - 2.5, 0.7);
      line(toX - 2.5, at + 2.5, toX + 2.5, at - 2.5, 0.7);
    }
    const mid = (fromX + toX) / 2;
    doc.font('body').fontSize(7.6);
    const fits = doc.widthOfString(above) < toX - fromX - 4;
    const size = fits ? 7.6 : 6.4;
    text(above, mid - 80, at - 10.5, size, 'body', { width: 160, align: 'center' });
    if (below) text(below, mid - 80, at + 3, size - 0.6, 'body', { width: 160, align: 'center' }, grey);
  }

  function drawDimensions() {
    const first = y.deckTop + y.deckBand + y.girder + 5 + 10 + y.column + 72;
    spec.spansFt.forEach((s, i) => dimension(xAt(supportsFt[i]!), xAt(supportsFt[i + 1]!), first, feetInches(s), `Span ${i + 1}`));
    dimension(xAt(0), xAt(lengthFt), first + 30, `${feetInches(lengthFt)} total`, 'C/L Brg. Abut 1 to C/L Brg. Abut 2');
  }

  function drawNotesAndLegend() {
    const top = 512;
    const notesX = frame.left + 24;
    const notesWidth = 560;
    if (spec.notes.length > 0) text('NOTES', notesX, top, 9, 'strong', { characterSpacing: 0.8 });
    let ny = top + 15;
    // A note that would run into the title block is refused rather than silently left off.
    doc.font('body').fontSize(7.8);
    const notesHeight = spec.notes.reduce((h, note) => h + doc.heightOfString(note, { width: notesWidth, lineGap: 1 }) + 3, 0);
    if (ny + notesHeight > titleBlockTop - 6) throw new Error(`submittalSketch: the notes need ${Math.ceil(notesHeight)} pt and the sheet has ${titleBlockTop - 6 - ny}; shorten them or put them on a second sheet`);
    spec.notes.forEach((note, i) => {
      doc.font('body').fontSize(7.8).fillColor(ink);
      text(`${i + 1}.`, notesX, ny, 7.8);
      doc.text(note, notesX + 14, ny, { width: notesWidth, lineGap: 1 });
      ny = doc.y + 3;
    });

    // Legend of what the drawing uses, then the placement sequence as a table.
    const lx = 650;
    text('LEGEND', lx, top, 9, 'strong', { characterSpacing: 0.8 });
    let ly = top + 18;
    const used = new Set((spec.marks ?? []).map((m) => m.kind));
    for (const kind of ['planned', 'proposed', 'emergency'] as const) {
      if (!used.has(kind)) continue;
      doc.save().lineWidth(kind === 'proposed' ? 1.1 : 0.8).strokeColor(kind === 'proposed' ? red : ink);
      const dash = kindDash[kind];
      if (dash) dashPattern(doc, dash);
      doc.moveTo(lx, ly + 3).lineTo(lx + 30, ly + 3).stroke().undash().restore();
      text(`${kindWords[kind]} construction joint`, lx + 38, ly, 7.6);
      ly += 13;
    }
    if ((spec.segments ?? []).length > 0) {
      doc.save().rect(lx, ly, 30, 7).fill('#C9CED3').restore();
      doc.save().lineWidth(0.6).strokeColor(ink).fillColor('#FFFFFF').circle(lx + 15, ly + 3.5, 5.5).fillAndStroke().restore();
      text('n', lx + 10, ly - 0.3, 6.5, 'strong', { width: 10, align: 'center' });
      text('Deck placement, numbered in placement order', lx + 38, ly, 7.6);
      ly += 13;
    }
    if ((spec.expansionJoints ?? []).length > 0) {
      for (let k = -1; k <= 1; k++) line(lx + 15 + k * 1.8, ly, lx + 15 + k * 1.8, ly + 6, 0.5);
      text('Deck expansion joint', lx + 38, ly, 7.6);
      ly += 13;
    }

    const segments = [...(spec.segments ?? [])].sort((a, b) => a.order - b.order);
    if (segments.length === 0) return;
    const tx = 900;
    text('PLACEMENT SEQUENCE', tx, top, 9, 'strong', { characterSpacing: 0.8 });
    const cols = [tx, tx + 40, tx + 110, tx + 180, tx + 260];
    const headers = ['No.', 'From', 'To', 'Length'];
    let ty = top + 17;
    line(tx, ty - 3, cols[4]!, ty - 3, 0.6);
    headers.forEach((h, i) => text(h, cols[i]! + 3, ty, 7, 'medium', {}, grey));
    ty += 11;
    line(tx, ty - 2, cols[4]!, ty - 2, 0.4);
    if (ty + segments.length * 11 + 14 > titleBlockTop) throw new Error(`submittalSketch: ${segments.length} placements do not fit the placement table (at most ${Math.floor((titleBlockTop - 14 - ty) / 11)})`);
    for (const s of segments) {
      [String(s.order), feetInches(s.fromFt), feetInches(s.toFt), feetInches(s.toFt - s.fromFt)].forEach((cell, i) => text(cell, cols[i]! + 3, ty, 7.6));
      ty += 11;
      line(tx, ty - 2, cols[4]!, ty - 2, 0.25, grey);
    }
    text('Stations from C/L Brg. Abut 1.', tx, ty + 2, 6.8, 'body', {}, grey);
  }
}
