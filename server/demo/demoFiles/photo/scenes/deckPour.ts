// A deck placement under way, seen from the mat ahead of it: the pump's boom and hose dropping
// concrete at the front, the crew vibrating and striking it off, the finishing machine on its
// rails behind them and the finished deck beyond.
import { camera, type Vec3 } from '../camera';
import type { Random } from '../random';
import { attrs, bar, face, newScene, worker, type Scene } from '../svgKit';
import { deckMats, edgeForms, mottle, stayInPlaceForms, surroundings } from './deckParts';

export function deckPour(rng: Random, width: number, height: number): Scene {
  const scene = newScene(20, 4.5, 72);
  const eyeY = 5.4;
  const cam = camera({ eye: [rng.range(-5, 0), eyeY, 0], yawDeg: rng.range(-4, 6), pitchDeg: rng.range(9, 12), rollDeg: rng.range(-1, 1), focalPx: 1250, width, height });
  surroundings(scene, cam, rng, eyeY, 170);
  const front = rng.range(26, 32); // where the fresh concrete meets the mat
  const machineZ = front + rng.range(16, 22);

  // Finished deck behind the machine, still wet, with a sheen toward the sky.
  scene.defs.push(`<linearGradient id="wet" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#A9ADAD"/><stop offset="1" stop-color="#7C7C77"/></linearGradient>`);
  face(scene, cam, [[-23, 0, machineZ], [23, 0, machineZ], [23, 0, 170], [-23, 0, 170]], 'url(#wet)', 0.45);
  mottle(scene, cam, rng, -23, 23, machineZ, 170, 0.01, 40, 0.1);
  // The mat still to be covered (drawn before the fresh concrete, which buries its far end).
  stayInPlaceForms(scene, cam, -23, 23, 0.5, front + 2, -0.72);
  deckMats(scene, cam, rng, { x0: -23, x1: 23, z0: 0.5, z1: front + 2, topY: -0.2, bottomY: -0.58, formY: -0.71, spacingFt: 0.667, shadowsToZ: 22, jitter: 0.03 });
  // Struck-off but unfinished concrete between the front and the machine.
  face(scene, cam, [[-23, 0, front + 3], [23, 0, front + 3], [23, 0, machineZ], [-23, 0, machineZ]], '#77766F', 0.9);
  mottle(scene, cam, rng, -23, 23, front + 3, machineZ, 0.01, 60, 0.16);
  // The front: a ragged sloping edge of fresh concrete over the bars.
  const edge: Vec3[] = [];
  for (let x = -23; x <= 23.01; x += 1.5) edge.push([x, -0.1, front + rng.range(-1.2, 1.2)]);
  face(scene, cam, [...edge, [23, 0.05, front + 3], [-23, 0.05, front + 3]], '#6E6D66', 1);
  for (let i = 0; i < 70; i++) {
    const c: Vec3 = [rng.range(-20, 20), 0.05, rng.range(front, front + 4)];
    const p = cam.project(c);
    if (!p) continue;
    const r = cam.pixels(c, rng.range(0.3, 0.9));
    scene.picture.push(`<ellipse ${attrs({ cx: p[0], cy: p[1], rx: r, ry: r * 0.35, fill: rng.pick(['#85847C', '#605F59', '#7A796F']), 'fill-opacity': 0.8 })}/>`);
  }

  for (const side of [-1, 1] as const) edgeForms(scene, cam, side, 23, 0.5, 170, 0);
  // Finishing machine: rails on the edge forms, legs, a truss across the deck and its carriage.
  for (const side of [-1, 1]) bar(scene, cam, [side * 24, 0.4, 2], [side * 24, 0.4, 170], 0.15, '#5B5E60', '#9A9EA0');
  const yellow = '#D2A12B';
  const yLight = '#F0C95A';
  for (const side of [-1, 1]) {
    bar(scene, cam, [side * 24, 0.4, machineZ], [side * 24, 6.5, machineZ], 0.7, yellow, yLight);
    bar(scene, cam, [side * 24, 0.4, machineZ + 3], [side * 24, 6.5, machineZ + 3], 0.7, yellow, yLight);
  }
  for (const [y, z] of [[6.5, machineZ], [4.6, machineZ], [6.5, machineZ + 3], [4.6, machineZ + 3]] as const) bar(scene, cam, [-24, y, z], [24, y, z], 0.32, yellow, yLight);
  for (let x = -24; x < 24; x += 3) {
    bar(scene, cam, [x, 4.6, machineZ], [x + 3, 6.5, machineZ], 0.16, '#B98C22', yLight);
    bar(scene, cam, [x, 6.5, machineZ + 3], [x + 3, 4.6, machineZ + 3], 0.16, '#B98C22', yLight);
  }
  const carriageX = rng.range(-10, 10);
  // The carriage hangs from the bottom chords and rides across with its auger and roller.
  face(scene, cam, [[carriageX - 1.6, 1.6, machineZ + 0.2], [carriageX + 1.6, 1.6, machineZ + 0.2], [carriageX + 1.6, 4.6, machineZ + 0.2], [carriageX - 1.6, 4.6, machineZ + 0.2]], '#6E7477', 0.15);
  face(scene, cam, [[carriageX - 1.6, 3.6, machineZ + 0.19], [carriageX + 1.6, 3.6, machineZ + 0.19], [carriageX + 1.6, 4.6, machineZ + 0.19], [carriageX - 1.6, 4.6, machineZ + 0.19]], yellow, 0.1);
  for (const dz of [0, 1.2]) bar(scene, cam, [carriageX - 2.4, 0.45, machineZ + dz], [carriageX + 2.4, 0.45, machineZ + dz], 0.55, '#8B9092', '#C9CDCE');
  bar(scene, cam, [carriageX, 1.6, machineZ + 0.6], [carriageX, 0.7, machineZ + 0.6], 0.3, '#505557', '#8B9092');
  // Work bridge trailing the machine, with a finisher on it.
  face(scene, cam, [[-23, 1.4, machineZ + 8], [23, 1.4, machineZ + 8], [23, 1.4, machineZ + 11], [-23, 1.4, machineZ + 11]], '#8A8F8F', 0.2);
  face(scene, cam, [[-23, 0.9, machineZ + 8], [23, 0.9, machineZ + 8], [23, 1.4, machineZ + 8], [-23, 1.4, machineZ + 8]], '#5D6264', 0.2);
  worker(scene, cam, [rng.range(-8, 8), 1.4, machineZ + 9.5], rng, { bend: 0.8, armsOut: true });


  // Crew at the front: hose man, two with vibrators, one with a come-along.
  const hoseX = rng.range(-4, 6);
  worker(scene, cam, [hoseX + 1.5, 0, front + 3.5], rng, { bend: 0.3, armsOut: true });
  worker(scene, cam, [hoseX - 7, 0, front + 2], rng, { bend: 0.9, armsOut: true, facing: 'side' });
  worker(scene, cam, [hoseX + 9, 0, front + 2.5], rng, { bend: 0.7, armsOut: true });
  worker(scene, cam, [hoseX - 14, 0, front + 6], rng, { bend: 0.2 });
  // Pump boom coming in from the right, its end hose dropping to the front.
  const tip: Vec3 = [hoseX + 0.5, 10.5, front + 2.5];
  const knuckle: Vec3 = [hoseX + 16, 17, front + 9];
  bar(scene, cam, [hoseX + 55, 40, front + 30], knuckle, 1.6, '#E3E1D8', '#FFFFFF');
  bar(scene, cam, knuckle, tip, 1.2, '#E3E1D8', '#FFFFFF');
  bar(scene, cam, [hoseX + 55, 40.8, front + 30], [knuckle[0], knuckle[1] + 0.8, knuckle[2]], 0.25, '#1E1E1E', '#555555');
  bar(scene, cam, [knuckle[0], knuckle[1] + 0.6, knuckle[2]], [tip[0], tip[1] + 0.6, tip[2]], 0.25, '#1E1E1E', '#555555');
  bar(scene, cam, tip, [hoseX + 0.8, 1.2, front + 2.6], 0.42, '#1E1E1E', '#555555');
  bar(scene, cam, [hoseX + 0.8, 1.2, front + 2.6], [hoseX + 1.6, 0.2, front + 2.2], 0.42, '#1E1E1E', '#555555');
  return scene;
}
