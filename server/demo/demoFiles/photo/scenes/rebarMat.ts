// Deck reinforcement before the pour: top and bottom mats of epoxy-coated bars on their chairs,
// over the stay-in-place forms, seen by someone standing on the mat, crew tying farther on.
import { camera } from '../camera';
import type { Random } from '../random';
import { newScene, worker, type Scene } from '../svgKit';
import { deckMats, edgeForms, stayInPlaceForms, surroundings } from './deckParts';

export function rebarMat(rng: Random, width: number, height: number): Scene {
  const scene = newScene(16, 4.5, 72);
  const eyeY = 5.3;
  const cam = camera({ eye: [rng.range(-6, 2), eyeY, 0], yawDeg: rng.range(-10, 6), pitchDeg: rng.range(15, 19), rollDeg: rng.range(-1.2, 1.2), focalPx: 1300, width, height });
  surroundings(scene, cam, rng, eyeY, 150);
  stayInPlaceForms(scene, cam, -23, 23, 0.5, 150, -0.72);
  for (const side of [-1, 1] as const) edgeForms(scene, cam, side, 23, 0.5, 150, 0);
  // 8 in spacing of deck bars (common practice).
  deckMats(scene, cam, rng, { x0: -23, x1: 23, z0: 0.5, z1: 150, topY: -0.2, bottomY: -0.58, formY: -0.71, spacingFt: 0.667, shadowsToZ: 45, jitter: 0.03 });
  worker(scene, cam, [rng.range(-14, -6), -0.2, rng.range(38, 48)], rng, { bend: 0.9, armsOut: true });
  worker(scene, cam, [rng.range(4, 12), -0.2, rng.range(55, 70)], rng, { bend: 0.7, armsOut: true, facing: 'side' });
  worker(scene, cam, [rng.range(-2, 6), -0.2, rng.range(85, 100)], rng, {});
  return scene;
}
