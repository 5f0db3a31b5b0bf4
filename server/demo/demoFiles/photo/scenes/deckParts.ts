// Parts several deck scenes share: the land around the bridge, stay-in-place forms, mats of
// epoxy-coated bars with their shadows, and the edge forms with their handrail.
import type { Camera, Vec3 } from '../camera';
import type { Random } from '../random';
import { attrs, bar, face, sky, treeLine, type Scene } from '../svgKit';

// Direction the sunlight travels (down, a little to the right and toward the camera).
const sun: Vec3 = [0.42, -1, -0.28];

export const epoxy = { colour: '#3F6A3B', light: '#84AE72', shadow: '#203620' };

export function horizonY(cam: Camera, eyeHeight: number): number {
  const p = cam.project([0, eyeHeight, 20000]);
  return p ? p[1] : -200;
}

// Sky, far trees and the valley floor, with the approach roadway running on past the deck.
export function surroundings(scene: Scene, cam: Camera, rng: Random, eyeHeight: number, deckEndZ: number): number {
  const hy = horizonY(cam, eyeHeight);
  sky(scene, rng, cam.width, hy);
  treeLine(scene, rng, cam.width, hy + 3, rng.range(40, 80));
  face(scene, cam, [[-3000, -35, 60], [3000, -35, 60], [3000, -35, 9000], [-3000, -35, 9000]], '#7D8A63', 0.5);
  // Fields and hedges on the valley floor, hazier with distance.
  for (let i = 0; i < 9; i++) {
    const z = rng.range(150, 2500);
    const x = rng.range(-1500, 1500);
    face(scene, cam, [[x, -35, z], [x + rng.range(100, 500), -35, z], [x + rng.range(100, 500), -35, z + rng.range(40, 200)], [x, -35, z + rng.range(40, 200)]], rng.pick(['#8E9868', '#6F7F52', '#9A9A70']), 0.5, { 'fill-opacity': 0.6 });
  }
  face(scene, cam, [[-22, -0.2, deckEndZ], [22, -0.2, deckEndZ], [22, -0.2, 4000], [-22, -0.2, 4000]], '#6F6F6B', 0.4);
  // Haze over the distance, thickest at the horizon.
  if (!scene.defs.some((d) => d.includes('id="haze"'))) {
    scene.defs.push(`<linearGradient id="haze" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#DCE4E8" stop-opacity="0"/><stop offset="0.5" stop-color="#DCE4E8" stop-opacity="0.45"/><stop offset="1" stop-color="#DCE4E8" stop-opacity="0"/></linearGradient>`);
  }
  scene.picture.push(`<rect x="0" y="${(hy - 90).toFixed(1)}" width="${cam.width}" height="180" fill="url(#haze)"/>`);
  return hy;
}

// Galvanised stay-in-place forms: flutes running across the bridge between the girders.
export function stayInPlaceForms(scene: Scene, cam: Camera, x0: number, x1: number, z0: number, z1: number, y: number): void {
  face(scene, cam, [[x0, y, z0], [x1, y, z0], [x1, y, z1], [x0, y, z1]], '#A7ADAF', 0.3);
  for (let z = z0; z < z1; z += 0.667) {
    face(scene, cam, [[x0, y + 0.01, z], [x1, y + 0.01, z], [x1, y + 0.01, z + 0.2], [x0, y + 0.01, z + 0.2]], '#8E9597', 0.2);
    face(scene, cam, [[x0, y + 0.01, z + 0.2], [x1, y + 0.01, z + 0.2], [x1, y + 0.01, z + 0.26], [x0, y + 0.01, z + 0.26]], '#C7CCCD', 0.1);
  }
}

// The shadow a bar casts on a horizontal surface below it.
export function barShadow(scene: Scene, cam: Camera, a: Vec3, b: Vec3, diameterFt: number, onY: number, darkness = 0.32): void {
  const drop = (p: Vec3): Vec3 => {
    const t = (onY - p[1]) / sun[1];
    return [p[0] + sun[0] * t, onY + 0.005, p[2] + sun[2] * t];
  };
  bar(scene, cam, drop(a), drop(b), diameterFt * 1.4, `rgba(25,30,28,${darkness})`, 'rgba(0,0,0,0)', 0.4);
}

export type MatSpec = { x0: number; x1: number; z0: number; z1: number; topY: number; bottomY: number; formY: number; spacingFt: number; shadowsToZ: number; jitter: number };

// Bottom mat, chairs, then top mat; bars of #5 size (0.052 ft), shadows only near the camera.
export function deckMats(scene: Scene, cam: Camera, rng: Random, spec: MatSpec): void {
  const d = 0.052;
  // Past about 60 ft the bars are closer than two pixels apart: there the mat is drawn as the
  // green-grey it blends to, which also keeps the JPEG from spending bytes on aliasing.
  const detailTo = Math.min(spec.z1, 60);
  if (spec.z1 > detailTo) face(scene, cam, [[spec.x0, spec.topY, detailTo - 1], [spec.x1, spec.topY, detailTo - 1], [spec.x1, spec.topY, spec.z1], [spec.x0, spec.topY, spec.z1]], '#56704F', 0.5);
  const m = { ...spec, z1: detailTo };
  const j = () => rng.range(-m.jitter, m.jitter);
  const bottomShade = { colour: '#2E4E2C', light: '#5E8752' };
  for (let z = m.z0 + 0.3; z < m.z1; z += m.spacingFt) {
    if (z < m.shadowsToZ) barShadow(scene, cam, [m.x0, m.bottomY, z], [m.x1, m.bottomY, z], d, m.formY);
    bar(scene, cam, [m.x0, m.bottomY, z + j()], [m.x1, m.bottomY, z + j()], d, bottomShade.colour, bottomShade.light);
  }
  for (let x = m.x0 + 0.2; x <= m.x1; x += m.spacingFt * 1.5) {
    bar(scene, cam, [x + j(), m.bottomY + d, m.z0], [x + j(), m.bottomY + d, m.z1], d, bottomShade.colour, bottomShade.light);
  }
  // Chairs holding the top mat up.
  for (let z = m.z0 + 1.2; z < Math.min(m.z1, m.shadowsToZ * 2); z += 3) {
    for (let x = m.x0 + 1; x <= m.x1; x += 4) bar(scene, cam, [x, m.bottomY + 2 * d, z], [x, m.topY - d, z], 0.035, '#7E8183', '#B4B6B8', 0.5);
  }
  for (let x = m.x0 + 0.2 + m.spacingFt * 0.75; x <= m.x1; x += m.spacingFt * 1.5) {
    const a: Vec3 = [x + j(), m.topY - d, m.z0];
    const b: Vec3 = [x + j(), m.topY - d, m.z1];
    barShadow(scene, cam, a, [b[0], b[1], Math.min(m.z1, m.shadowsToZ)], d, m.formY);
    bar(scene, cam, a, b, d, epoxy.colour, epoxy.light);
  }
  for (let z = m.z0 + 0.4; z < m.z1; z += m.spacingFt) {
    const a: Vec3 = [m.x0, m.topY, z + j()];
    const b: Vec3 = [m.x1, m.topY, z + j()];
    if (z < m.shadowsToZ) barShadow(scene, cam, a, b, d, m.formY);
    bar(scene, cam, a, b, d, epoxy.colour, epoxy.light);
  }
}

// The timber edge form along the deck's side and the handrail on its overhang brackets.
export function edgeForms(scene: Scene, cam: Camera, side: -1 | 1, halfWidth: number, z0: number, z1: number, topY: number): void {
  const x = side * halfWidth;
  face(scene, cam, [[x, topY - 0.9, z0], [x, topY + 0.1, z0], [x, topY + 0.1, z1], [x, topY - 0.9, z1]], '#A07E55', 0.8);
  face(scene, cam, [[x, topY + 0.1, z0], [x + side * 0.15, topY + 0.1, z0], [x + side * 0.15, topY + 0.1, z1], [x, topY + 0.1, z1]], '#C2A072', 0.6);
  for (let z = z0 + 1; z < z1; z += 8) bar(scene, cam, [x + side * 0.6, topY - 1, z], [x + side * 0.6, topY + 3.5, z], 0.3, '#A8824F', '#CCA877');
  for (const h of [1.8, 3.4]) bar(scene, cam, [x + side * 0.6, topY + h, z0], [x + side * 0.6, topY + h, z1], 0.14, '#B8935E', '#DDBB88');
}

// Soft blotches of lighter and darker tone that stop a large surface looking flat-shaded.
export function mottle(scene: Scene, cam: Camera, rng: Random, x0: number, x1: number, z0: number, z1: number, y: number, count: number, strength = 0.12): void {
  if (!scene.defs.some((d) => d.includes('id="mottle-dark"'))) {
    scene.defs.push(`<radialGradient id="mottle-dark"><stop offset="0" stop-color="#000" stop-opacity="${strength}"/><stop offset="1" stop-color="#000" stop-opacity="0"/></radialGradient>`);
    scene.defs.push(`<radialGradient id="mottle-light"><stop offset="0" stop-color="#FFF" stop-opacity="${strength}"/><stop offset="1" stop-color="#FFF" stop-opacity="0"/></radialGradient>`);
  }
  for (let i = 0; i < count; i++) {
    const c: Vec3 = [rng.range(x0, x1), y, rng.range(z0, z1)];
    const p = cam.project(c);
    if (!p) continue;
    const r = cam.pixels(c, rng.range(1, 4));
    scene.picture.push(`<ellipse ${attrs({ cx: p[0], cy: p[1], rx: r, ry: r * rng.range(0.3, 0.6), fill: rng.next() < 0.5 ? 'url(#mottle-dark)' : 'url(#mottle-light)' })}/>`);
  }
}
