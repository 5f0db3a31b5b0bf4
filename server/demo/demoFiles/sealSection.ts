// The small cross-section figure of a seal data sheet: the seal in its joint between two deck
// edges, drawn at the mid-range opening with the opening range dimensioned. A strip seal shows
// its steel edge rails with the gland locked into them; a compression seal shows a cellular
// profile squeezed between armoured edges.
export type SectionBox = { x: number; y: number; width: number; height: number };

const ink = '#111111';
const concrete = '#E3E1DC';
const steel = '#8C949B';
const rubber = '#2A2A2A';

export function drawSealSection(
  doc: PDFKit.PDFDocument,
  box: SectionBox,
  seal: { family: 'strip' | 'compression'; minOpeningIn: number; maxOpeningIn: number },
): void {
  const midIn = (seal.minOpeningIn + seal.maxOpeningIn) / 2;
  // The opening is drawn at a fixed share of the box so every seal reads at the same size.
  const gap = box.width * 0.16;
  const cx = box.x + box.width / 2;
  const deckTop = box.y + box.height * 0.3;
  const deckBottom = box.y + box.height * 0.86;
  const left = cx - gap / 2;
  const right = cx + gap / 2;

  doc.save();
  // Deck concrete either side, with a few aggregate marks so it reads as a section cut.
  doc.lineWidth(0.8).strokeColor(ink).fillColor(concrete);
  doc.rect(box.x, deckTop, left - box.x, deckBottom - deckTop).fillAndStroke();
  doc.rect(right, deckTop, box.x + box.width - right, deckBottom - deckTop).fillAndStroke();
  doc.fillColor('#B9B5AC');
  for (let i = 0; i < 26; i++) {
    const side = i % 2 === 0 ? box.x + 6 : right + 6;
    const w = left - box.x - 12;
    const px = side + ((i * 37) % 97) / 97 * w;
    const py = deckTop + 8 + ((i * 53) % 89) / 89 * (deckBottom - deckTop - 14);
    doc.circle(px, py, 0.9 + (i % 3) * 0.5).fill();
  }
  // Break lines at the outer ends of the section.
  doc.fillColor('#FFFFFF').rect(box.x - 2, deckTop - 2, 4, deckBottom - deckTop + 4).fill();
  doc.rect(box.x + box.width - 2, deckTop - 2, 4, deckBottom - deckTop + 4).fill();
  doc.lineWidth(0.5).strokeColor(ink);
  for (const bx of [box.x, box.x + box.width]) {
    const mid = (deckTop + deckBottom) / 2;
    doc.moveTo(bx, deckTop).lineTo(bx, mid - 5).lineTo(bx + 3, mid - 2).lineTo(bx - 3, mid + 2).lineTo(bx, mid + 5).lineTo(bx, deckBottom).stroke();
  }

  if (seal.family === 'strip') {
    // Edge rails: a steel extrusion flush with the deck on each side, anchored with studs.
    const railW = 14;
    const railH = 22;
    doc.lineWidth(0.7).strokeColor(ink).fillColor(steel);
    for (const [edge, dir] of [[left, -1], [right, 1]] as const) {
      const outer = edge + dir * railW;
      doc.polygon([edge, deckTop], [outer, deckTop], [outer, deckTop + railH], [edge, deckTop + railH], [edge, deckTop + 14], [edge - dir * 4, deckTop + 11], [edge - dir * 4, deckTop + 7], [edge, deckTop + 5]).fillAndStroke();
      doc.lineWidth(1.4).strokeColor(steel);
      doc.moveTo(outer - dir * 4, deckTop + railH).lineTo(outer + dir * 10, deckTop + railH + 24).stroke();
      doc.lineWidth(0.7).strokeColor(ink);
    }
    // The gland: a folded membrane hanging between the rails' cavities.
    doc.lineWidth(2.6).strokeColor(rubber);
    doc
      .moveTo(left - 3, deckTop + 9)
      .bezierCurveTo(left + gap * 0.05, deckTop + 30, cx - gap * 0.15, deckTop + 44, cx, deckTop + 44)
      .bezierCurveTo(cx + gap * 0.15, deckTop + 44, right - gap * 0.05, deckTop + 30, right + 3, deckTop + 9)
      .stroke();
  } else {
    // Armour angles on both edges and the cellular seal squeezed between them.
    doc.lineWidth(0.7).strokeColor(ink).fillColor(steel);
    doc.polygon([left, deckTop], [left - 12, deckTop], [left - 12, deckTop + 2.5], [left - 2.5, deckTop + 2.5], [left - 2.5, deckTop + 12], [left, deckTop + 12]).fillAndStroke();
    doc.polygon([right, deckTop], [right + 12, deckTop], [right + 12, deckTop + 2.5], [right + 2.5, deckTop + 2.5], [right + 2.5, deckTop + 12], [right, deckTop + 12]).fillAndStroke();
    const top = deckTop + 4;
    const h = 34;
    doc.lineWidth(1.6).strokeColor(rubber).fillColor('#3B3B3B');
    doc.rect(left, top, gap, h).fillAndStroke();
    doc.lineWidth(0.9).strokeColor('#9A9A9A');
    doc.moveTo(left + 2, top + 2).lineTo(right - 2, top + h - 2).moveTo(right - 2, top + 2).lineTo(left + 2, top + h - 2).stroke();
    doc.moveTo(cx, top + 2).lineTo(cx, top + h - 2).stroke();
  }

  // The opening dimensioned above the deck, with its range written beside it.
  const dimY = deckTop - 16;
  doc.lineWidth(0.35).strokeColor(ink);
  doc.moveTo(left, deckTop - 2).lineTo(left, dimY - 5).moveTo(right, deckTop - 2).lineTo(right, dimY - 5).stroke();
  doc.moveTo(left, dimY).lineTo(right, dimY).stroke();
  doc.fillColor(ink).polygon([left, dimY], [left + 5, dimY - 1.6], [left + 5, dimY + 1.6]).fill();
  doc.polygon([right, dimY], [right - 5, dimY - 1.6], [right - 5, dimY + 1.6]).fill();
  doc.font('body').fontSize(7.5).fillColor(ink);
  doc.text(`Opening ${trim(seal.minOpeningIn)}" to ${trim(seal.maxOpeningIn)}" (${trim(midIn)}" shown)`, cx - 110, dimY - 13, { width: 220, align: 'center', lineBreak: false });
  doc.font('body').fontSize(6.8).fillColor('#555555');
  doc.text('Deck slab', box.x + 8, deckBottom - 12, { lineBreak: false });
  doc.text('Deck slab', box.x + box.width - 48, deckBottom - 12, { lineBreak: false });
  doc.restore();
}

const trim = (n: number) => String(Math.round(n * 1000) / 1000);
