// A concrete delivery ticket held up on a clipboard beside the truck, photographed to record the
// retarder on the load. The print is drawn as bars and boxes, never as letters: the photo carries
// no text, and nobody should read figures off a made-up ticket.
import type { Random } from '../random';
import { attrs, newScene, type Scene } from '../svgKit';

export function deliveryTicket(rng: Random, width: number, height: number): Scene {
  const scene = newScene(14, 4);
  const { defs, picture, mask } = scene;
  // Background, out of focus: sky, the mixer's drum with its stripes, the chassis, gravel.
  defs.push(`<linearGradient id="bgsky" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#8FB1D2"/><stop offset="1" stop-color="#DCE6EC"/></linearGradient>`);
  defs.push(`<linearGradient id="drum" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#F2F2EE"/><stop offset="0.5" stop-color="#D5D6D2"/><stop offset="1" stop-color="#8E908C"/></linearGradient>`);
  const stripe = rng.pick(['#C23B2E', '#2F5E9E', '#E07B1F']);
  const drumX = rng.range(1080, 1180);
  const background = [
    `<rect x="-40" y="-40" width="${width + 80}" height="${height * 0.55}" fill="url(#bgsky)"/>`,
    `<rect x="-40" y="${height * 0.5}" width="${width + 80}" height="${height * 0.6}" fill="#8A8579"/>`,
    `<rect x="-40" y="${height * 0.48}" width="${width + 80}" height="40" fill="#66705A"/>`,
    // Chassis and wheels under the drum.
    `<rect ${attrs({ x: drumX - 380, y: height * 0.52, width: 1100, height: 90, fill: '#2E2F31' })}/>`,
    ...[-250, 120, 330].map((dx) => `<circle ${attrs({ cx: drumX + dx, cy: height * 0.63, r: 78, fill: '#1B1B1B' })}/><circle ${attrs({ cx: drumX + dx, cy: height * 0.63, r: 34, fill: '#77797B' })}/>`),
    // The drum, tilted up toward the back, with its spiral stripes.
    `<g transform="rotate(-9 ${drumX} ${height * 0.33})"><ellipse ${attrs({ cx: drumX, cy: height * 0.33, rx: 430, ry: 190, fill: 'url(#drum)' })}/>` +
      [-220, -80, 60, 200].map((dx) => `<path d="M${drumX + dx},${height * 0.33 - 185} q60,180 -10,370" stroke="${stripe}" stroke-width="46" fill="none" stroke-opacity="0.9"/>`).join('') +
      `</g>`,
    // Cab at the right edge.
    `<rect ${attrs({ x: drumX + 470, y: height * 0.18, width: 420, height: 330, rx: 30, fill: '#E9E7E1' })}/><rect ${attrs({ x: drumX + 520, y: height * 0.22, width: 250, height: 120, rx: 12, fill: '#3F4E5A' })}/>`,
  ];
  scene.backdrop = background;
  mask.push(`<rect width="${width}" height="${height}" fill="#444"/>`);

  // Clipboard and ticket, turned a little and leaning away (a skew stands in for perspective).
  const turn = rng.range(-7, 3);
  const cx = width * rng.range(0.4, 0.47);
  const cy = height * 0.58;
  const frame = `translate(${cx.toFixed(1)} ${cy.toFixed(1)}) rotate(${turn.toFixed(2)}) skewX(${rng.range(-4, 4).toFixed(2)}) scale(1 0.94)`;
  const board = { w: 860, h: 1180 };
  const paper = { w: 760, h: 980 };
  defs.push(`<linearGradient id="light" x1="0" y1="0" x2="1" y2="1"><stop offset="0" stop-color="#FFFFFF" stop-opacity="0.18"/><stop offset="0.6" stop-color="#FFFFFF" stop-opacity="0"/><stop offset="1" stop-color="#000000" stop-opacity="0.16"/></linearGradient>`);
  defs.push(`<linearGradient id="clip" x1="0" y1="0" x2="1" y2="0"><stop offset="0" stop-color="#8D9296"/><stop offset="0.45" stop-color="#E6E9EB"/><stop offset="1" stop-color="#7A7F83"/></linearGradient>`);
  const paperTint = rng.pick(['#F3EEC2', '#F6F5EF', '#F4DCE0']);
  const ink = rng.pick(['#B0433D', '#3E5F9A']);
  const parts: string[] = [];
  // A soft shadow behind the board from a few widening, fainter outlines (cheaper than a blur).
  for (let k = 4; k >= 1; k--) parts.push(`<rect ${attrs({ x: -board.w / 2 + 30 - k * 6, y: -board.h / 2 + 40 - k * 6, width: board.w + k * 12, height: board.h + k * 12, rx: 26 + k * 6, fill: '#000', 'fill-opacity': 0.08 })}/>`);
  parts.push(`<rect ${attrs({ x: -board.w / 2, y: -board.h / 2, width: board.w, height: board.h, rx: 26, fill: '#7B5B3C' })}/>`);
  const px = -paper.w / 2;
  const py = -board.h / 2 + 120;
  parts.push(`<rect ${attrs({ x: px + 6, y: py + 8, width: paper.w, height: paper.h, fill: '#000', 'fill-opacity': 0.18 })}/>`);
  parts.push(`<rect ${attrs({ x: px, y: py, width: paper.w, height: paper.h, fill: paperTint })}/>`);

  // The printed form: a header block with a plain mark, boxed fields, a load table, remarks.
  const lines: string[] = [];
  const bar = (x: number, y: number, w: number, h: number, fill: string, opacity = 1) => lines.push(`<rect ${attrs({ x: px + x, y: py + y, width: w, height: h, rx: h / 2, fill, 'fill-opacity': opacity })}/>`);
  lines.push(`<rect ${attrs({ x: px + 40, y: py + 36, width: 70, height: 70, rx: 14, fill: ink })}/>`);
  bar(130, 44, rng.range(250, 330), 20, ink);
  bar(130, 78, rng.range(180, 260), 10, ink, 0.7);
  bar(130, 96, rng.range(160, 220), 10, ink, 0.7);
  bar(paper.w - 200, 50, 150, 14, '#2A2A2A', 0.85);
  const box = (x: number, y: number, w: number, h: number) => lines.push(`<rect ${attrs({ x: px + x, y: py + y, width: w, height: h, fill: 'none', stroke: ink, 'stroke-width': 2 })}/>`);
  let y = 140;
  for (let row = 0; row < 4; row++) {
    for (let col = 0; col < 3; col++) {
      const x = 40 + col * 230;
      box(x, y, 220, 64);
      bar(x + 8, y + 8, rng.range(50, 110), 7, ink, 0.75);
      bar(x + 12, y + 30, rng.range(80, 180), 14, '#2B2B2B', 0.85);
    }
    y += 74;
  }
  // The load table: a header row and printed values in narrow grey bars.
  y += 20;
  box(40, y, paper.w - 80, 300);
  lines.push(`<rect ${attrs({ x: px + 40, y: py + y, width: paper.w - 80, height: 34, fill: ink, 'fill-opacity': 0.85 })}/>`);
  const cols = [40, 120, 380, 520, paper.w - 40];
  for (const c of cols.slice(1, -1)) lines.push(`<line ${attrs({ x1: px + c, y1: py + y, x2: px + c, y2: py + y + 300, stroke: ink, 'stroke-width': 1.5 })}/>`);
  for (let r = 0; r < 7; r++) {
    const ry = y + 48 + r * 36;
    lines.push(`<line ${attrs({ x1: px + 40, y1: py + ry + 24, x2: px + paper.w - 40, y2: py + ry + 24, stroke: ink, 'stroke-width': 0.8, 'stroke-opacity': 0.6 })}/>`);
    bar(cols[0]! + 14, ry + 4, rng.range(30, 50), 11, '#333333', 0.8);
    bar(cols[1]! + 14, ry + 4, rng.range(120, 230), 11, '#333333', 0.8);
    bar(cols[2]! + 14, ry + 4, rng.range(40, 100), 11, '#333333', 0.8);
    bar(cols[3]! + 14, ry + 4, rng.range(40, 130), 11, '#333333', 0.8);
  }
  // A hand circle around one line of the table (the retarder), and the driver's scrawl.
  const circled = y + 48 + rng.int(2, 5) * 36 + 10;
  lines.push(`<ellipse ${attrs({ cx: px + 260, cy: py + circled, rx: 170, ry: 26, fill: 'none', stroke: '#1F3F8F', 'stroke-width': 4, transform: `rotate(-2 ${px + 260} ${py + circled})` })}/>`);
  y += 330;
  bar(40, y, 120, 8, ink, 0.75);
  lines.push(`<line ${attrs({ x1: px + 40, y1: py + y + 70, x2: px + 360, y2: py + y + 70, stroke: ink, 'stroke-width': 1.5 })}/>`);
  let sig = `M${px + 60},${py + y + 60}`;
  for (let k = 0; k < 9; k++) {
    sig += ` q${rng.range(-10, 10).toFixed(1)},${rng.range(-50, -20).toFixed(1)} ${rng.range(10, 24).toFixed(1)},${rng.range(-9, 9).toFixed(1)}`;
  }
  lines.push(`<path d="${sig}" stroke="#1F3F8F" stroke-width="3.5" fill="none" stroke-linecap="round"/>`);
  lines.push(`<line ${attrs({ x1: px + 420, y1: py + y + 70, x2: px + paper.w - 40, y2: py + y + 70, stroke: ink, 'stroke-width': 1.5 })}/>`);
  bar(440, y + 40, rng.range(90, 160), 14, '#2B2B2B', 0.85);
  parts.push(...lines);
  // Light falling across the sheet, then the spring clip over its top edge.
  parts.push(`<rect ${attrs({ x: px, y: py, width: paper.w, height: paper.h, fill: 'url(#light)' })}/>`);
  parts.push(`<rect ${attrs({ x: -170, y: -board.h / 2 + 40, width: 340, height: 110, rx: 22, fill: 'url(#clip)' })}/>`);
  parts.push(`<rect ${attrs({ x: -120, y: -board.h / 2 + 120, width: 240, height: 44, rx: 10, fill: '#C7CBCE' })}/>`);
  picture.push(`<g transform="${frame}">${parts.join('')}</g>`);
  mask.push(`<g transform="${frame}"><rect ${attrs({ x: -board.w / 2, y: -board.h / 2, width: board.w, height: board.h, rx: 26, fill: '#999' })}/><rect ${attrs({ x: px, y: py, width: paper.w, height: paper.h, fill: '#2A2A2A' })}/></g>`);

  // A gloved thumb holding the board at its left edge.
  const glove = rng.pick(['#C9B27A', '#6E7A3E', '#D7D3C8']);
  const tx = cx - (board.w / 2) * 0.98;
  const ty = cy + rng.range(80, 260);
  picture.push(`<g transform="rotate(${(turn - 12).toFixed(1)} ${tx.toFixed(1)} ${ty.toFixed(1)})"><rect ${attrs({ x: tx - 180, y: ty - 60, width: 240, height: 150, rx: 60, fill: glove })}/><rect ${attrs({ x: tx - 20, y: ty - 52, width: 150, height: 62, rx: 31, fill: glove })}/><rect ${attrs({ x: tx - 20, y: ty - 20, width: 150, height: 26, rx: 13, fill: '#000', 'fill-opacity': 0.12 })}/></g>`);
  return scene;
}
