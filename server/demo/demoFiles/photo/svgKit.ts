// Building blocks of the photo scenes as SVG text: every scene draws into a Scene, which keeps the
// picture and, apart, a grey mask of where surface texture (concrete, timber) belongs.
import type { Camera, Vec3 } from './camera';
import type { Random } from './random';

export type Scene = {
  defs: string[];
  picture: string[];
  // White where the texture shows at full strength, black where the surface is smooth (sky, steel).
  mask: string[];
  textureStrength: number;
  grain: number;
  // JPEG quality; scenes full of thin bars compress poorly and take a lower one to stay small.
  quality: number;
  // Drawn at a quarter of the size and enlarged: an out-of-focus background behind the picture.
  backdrop?: string[];
};

export const newScene = (textureStrength = 22, grain = 7, quality = 78): Scene => ({ defs: [], picture: [], mask: [], textureStrength, grain, quality });

// Shapes take fill-opacity or stroke-opacity, never opacity: librsvg draws an element with opacity
// on a surface of its own first, which made the scenes several times slower to render.
export const attrs = (a: Record<string, string | number | undefined>) =>
  Object.entries(a)
    .filter(([, v]) => v !== undefined)
    .map(([k, v]) => `${k}="${typeof v === 'number' ? Number(v.toFixed(2)) : v}"`)
    .join(' ');

// A world polygon drawn into the picture, and into the mask at the given texture strength (0-1).
export function face(scene: Scene, cam: Camera, points: Vec3[], fill: string, texture = 0, extra: Record<string, string | number> = {}): void {
  const pts = cam.polygon(points);
  if (!pts) return;
  scene.picture.push(`<polygon ${attrs({ points: pts, fill, ...extra })}/>`);
  if (texture > 0) scene.mask.push(`<polygon ${attrs({ points: pts, fill: grey(texture) })}/>`);
  else scene.mask.push(`<polygon ${attrs({ points: pts, fill: '#000' })}/>`);
}

export const grey = (level: number) => {
  const v = Math.round(Math.min(1, Math.max(0, level)) * 255)
    .toString(16)
    .padStart(2, '0');
  return `#${v}${v}${v}`;
};

// A round bar between two world points as a tapered quad (thicker where nearer), with a lit
// strip along its upper side.
export function bar(scene: Scene, cam: Camera, a: Vec3, b: Vec3, diameterFt: number, colour: string, light: string, minPx = 0.7): void {
  const seen = cam.segment(a, b);
  if (!seen) return;
  [a, b] = seen;
  const pa = cam.project(a);
  const pb = cam.project(b);
  if (!pa || !pb) return;
  const wa = Math.max(minPx, cam.pixels(a, diameterFt));
  const wb = Math.max(minPx, cam.pixels(b, diameterFt));
  const dx = pb[0] - pa[0];
  const dy = pb[1] - pa[1];
  const len = Math.hypot(dx, dy) || 1;
  // Normal pointing up the screen, so the highlight is on top.
  let nx = -dy / len;
  let ny = dx / len;
  if (ny > 0) {
    nx = -nx;
    ny = -ny;
  }
  // The bar's outline, or a narrower strip of it shifted toward its top (the highlight).
  const quad = (offset: number, scale: number) => {
    const ends = [
      [pa, (wa * scale) / 2, wa * offset],
      [pb, (wb * scale) / 2, wb * offset],
    ] as const;
    const [[qa, ha, oa], [qb, hb, ob]] = ends;
    return [
      [qa[0] + nx * (oa + ha), qa[1] + ny * (oa + ha)],
      [qb[0] + nx * (ob + hb), qb[1] + ny * (ob + hb)],
      [qb[0] + nx * (ob - hb), qb[1] + ny * (ob - hb)],
      [qa[0] + nx * (oa - ha), qa[1] + ny * (oa - ha)],
    ]
      .map((q) => q.map((n) => n.toFixed(1)).join(','))
      .join(' ');
  };
  scene.picture.push(`<polygon points="${quad(0, 1)}" fill="${colour}"/>`);
  if (wa > 1.6 || wb > 1.6) {
    scene.picture.push(`<polygon points="${quad(0.22, 0.35)}" fill="${light}" fill-opacity="0.75"/>`);
    // The underside turns away from the light.
    if (wa > 6 || wb > 6) scene.picture.push(`<polygon points="${quad(-0.32, 0.3)}" fill="#000" fill-opacity="0.25"/>`);
  }
  scene.mask.push(`<polygon points="${quad(0, 1)}" fill="#000"/>`);
}

// Sky from a deeper blue overhead to haze at the horizon, with a few soft clouds.
export function sky(scene: Scene, rng: Random, width: number, horizonY: number, rollTop = 0): void {
  scene.defs.push(`<linearGradient id="sky" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#6F9BC8"/><stop offset="0.65" stop-color="#A9C4DD"/><stop offset="1" stop-color="#E3EAEE"/></linearGradient>`);
  // Soft clouds as radial gradients: a blur filter over the sky would cost far more time.
  scene.defs.push(`<radialGradient id="cloud"><stop offset="0" stop-color="#FFFFFF" stop-opacity="0.75"/><stop offset="0.6" stop-color="#FFFFFF" stop-opacity="0.35"/><stop offset="1" stop-color="#FFFFFF" stop-opacity="0"/></radialGradient>`);
  const bottom = Math.max(horizonY + 40, 60);
  scene.picture.push(`<rect x="-50" y="${rollTop - 60}" width="${width + 100}" height="${bottom - rollTop + 60}" fill="url(#sky)"/>`);
  const clouds: string[] = [];
  for (let i = 0; i < 7; i++) {
    const cx = rng.range(-100, width + 100);
    const cy = rng.range(rollTop, Math.max(rollTop + 20, horizonY - 60));
    clouds.push(`<ellipse ${attrs({ cx, cy, rx: rng.range(140, 340), ry: rng.range(25, 60), fill: 'url(#cloud)', 'fill-opacity': rng.range(0.5, 1) })}/>`);
  }
  scene.picture.push(clouds.join(''));
  scene.mask.push(`<rect x="-50" y="-60" width="${width + 100}" height="${bottom + 60}" fill="#000"/>`);
}

// A far tree line along the horizon, hazed and softened as a distant band would be.
export function treeLine(scene: Scene, rng: Random, width: number, baseY: number, heightPx: number, colour = '#4C6450'): void {
  const pts: string[] = [`-20,${baseY + 30}`];
  let h = heightPx * 0.6;
  for (let x = -20; x <= width + 20; x += 14) {
    h = Math.max(heightPx * 0.25, Math.min(heightPx, h + rng.normal() * heightPx * 0.12));
    pts.push(`${x},${(baseY - h - rng.range(0, heightPx * 0.15)).toFixed(1)}`);
  }
  pts.push(`${width + 20},${baseY + 30}`);
  // Softened by a faint copy raised a little above it (a blur filter across the frame costs more
  // than the whole rest of a simple scene).
  scene.picture.push(`<polygon points="${pts.join(' ')}" fill="${colour}" fill-opacity="0.45" transform="translate(0 -2.5)"/>`);
  scene.picture.push(`<polygon points="${pts.join(' ')}" fill="${colour}"/>`);
  scene.mask.push(`<polygon points="${pts.join(' ')}" fill="${grey(0.25)}"/>`);
}

// A site worker standing at a world spot, drawn in screen space at the height the camera gives
// a 5 ft 9 in person there: boots, trousers, a high-visibility vest with reflective bands, hard hat.
export function worker(
  scene: Scene,
  cam: Camera,
  at: Vec3,
  rng: Random,
  pose: { bend?: number; facing?: 'toward' | 'away' | 'side'; vest?: string; hat?: string; armsOut?: boolean } = {},
): void {
  const feet = cam.project(at);
  const head = cam.project([at[0], at[1] + 5.75, at[2]]);
  if (!feet || !head) return;
  const h = feet[1] - head[1];
  const u = h / 69; // pixels per inch of the person
  const x = feet[0];
  const y = feet[1];
  const bend = pose.bend ?? 0; // 0 upright, 1 bent well forward
  const vest = pose.vest ?? rng.pick(['#CFE83A', '#F07A22', '#D9EE45']);
  const hat = pose.hat ?? rng.pick(['#F4F4F0', '#F2C21B', '#F4F4F0', '#E8772A']);
  const trousers = rng.pick(['#2E3A4A', '#3B3A36', '#4A4F57']);
  const skin = rng.pick(['#C58E6B', '#8D5A3D', '#E0B394', '#A8714F']);
  const lean = bend * 16 * u * (pose.facing === 'away' ? -0.3 : 1);
  const hip = [x, y - 33 * u] as const;
  const shoulder = [x + lean, y - 56 * u + bend * 12 * u] as const;
  const neck = [shoulder[0] + lean * 0.15, shoulder[1] - 3 * u] as const;
  const p = (pts: (readonly [number, number])[]) => pts.map((q) => `${q[0].toFixed(1)},${q[1].toFixed(1)}`).join(' ');
  // Contact shadow on the ground, so the figure stands rather than floats.
  const parts: string[] = [`<ellipse ${attrs({ cx: x + 4 * u, cy: y - 0.5 * u, rx: 15 * u, ry: 3 * u, fill: '#000', 'fill-opacity': 0.28 })}/>`];
  // Legs and boots.
  for (const side of [-1, 1]) {
    const kneeOut = side * 3 * u;
    parts.push(`<polygon points="${p([[hip[0] + side * 1 * u, hip[1]], [hip[0] + side * 8 * u, hip[1]], [x + kneeOut + side * 6 * u, y - 2 * u], [x + kneeOut + side * 0.5 * u, y - 2 * u]])}" fill="${trousers}"/>`);
    parts.push(`<rect ${attrs({ x: x + kneeOut + (side < 0 ? -7 : 0) * u, y: y - 4 * u, width: 7.5 * u, height: 4 * u, rx: 1.5 * u, fill: '#2A221C' })}/>`);
  }
  // Torso with the vest and its two reflective bands.
  const torso = p([[hip[0] - 8 * u, hip[1] + 1 * u], [hip[0] + 8 * u, hip[1] + 1 * u], [shoulder[0] + 9 * u, shoulder[1]], [shoulder[0] - 9 * u, shoulder[1]]]);
  parts.push(`<polygon points="${torso}" fill="${vest}"/>`);
  for (const t of [0.3, 0.62]) {
    const yL = hip[1] + (shoulder[1] - hip[1]) * t;
    const xL = hip[0] + (shoulder[0] - hip[0]) * t;
    parts.push(`<polygon points="${p([[xL - 8.5 * u, yL], [xL + 8.5 * u, yL], [xL + 8.5 * u, yL - 2 * u], [xL - 8.5 * u, yL - 2 * u]])}" fill="#D8DCDC" fill-opacity="0.9"/>`);
  }
  // Arms: hanging, or reaching forward to a tool.
  for (const side of [-1, 1]) {
    const hand = pose.armsOut ? ([shoulder[0] + side * 6 * u + lean * 0.8, shoulder[1] + 20 * u] as const) : ([shoulder[0] + side * 11 * u, shoulder[1] + 24 * u] as const);
    parts.push(`<polyline points="${p([[shoulder[0] + side * 8 * u, shoulder[1] + 1 * u], hand])}" stroke="${vest === '#F07A22' ? '#5A5E63' : '#6F7A84'}" stroke-width="${(4.2 * u).toFixed(1)}" stroke-linecap="round" fill="none"/>`);
    parts.push(`<circle ${attrs({ cx: hand[0], cy: hand[1], r: 2.1 * u, fill: '#6B5A3E' })}/>`);
  }
  // Head and hard hat.
  const headC = [neck[0], neck[1] - 5 * u] as const;
  parts.push(`<ellipse ${attrs({ cx: headC[0], cy: headC[1], rx: 3.6 * u, ry: 4.6 * u, fill: pose.facing === 'away' ? '#3A2E26' : skin })}/>`);
  parts.push(`<path d="M${(headC[0] - 5.6 * u).toFixed(1)},${(headC[1] - 1.2 * u).toFixed(1)} a${(5.6 * u).toFixed(1)},${(5 * u).toFixed(1)} 0 0 1 ${(11.2 * u).toFixed(1)},0 z" fill="${hat}"/>`);
  parts.push(`<rect ${attrs({ x: headC[0] - 6.8 * u, y: headC[1] - 1.6 * u, width: 13.6 * u, height: 1.3 * u, rx: 0.6 * u, fill: hat })}/>`);
  scene.picture.push(`<g>${parts.join('')}</g>`);
  scene.mask.push(`<rect ${attrs({ x: x - 14 * u, y: y - h - 6 * u, width: 28 * u, height: h + 6 * u, fill: '#000' })}/>`);
}

export function svgDocument(width: number, height: number, defs: string[], body: string[], background = '#808080'): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}"><defs>${defs.join('')}</defs><rect width="${width}" height="${height}" fill="${background}"/>${body.join('')}</svg>`;
}
