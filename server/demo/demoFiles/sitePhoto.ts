// A site photo for the demo requests: the subject drawn as a simple scene in perspective, then
// softened, textured, grained and compressed like a phone camera's JPEG. No text in the picture.
import type { DemoFile, SitePhotoSubject } from './types';
import { requireFileName } from './pdfDocument';
import { seededRandom, type Random } from './photo/random';
import { finishPhoto } from './photo/finish';
import { svgDocument, type Scene } from './photo/svgKit';
import { bulkheadWithDowels } from './photo/scenes/bulkheadWithDowels';
import { deckPour } from './photo/scenes/deckPour';
import { deliveryTicket } from './photo/scenes/deliveryTicket';
import { fingerJoint } from './photo/scenes/fingerJoint';
import { rebarMat } from './photo/scenes/rebarMat';
import { roughenedJoint } from './photo/scenes/roughenedJoint';
import { slabEdgeCracks } from './photo/scenes/slabEdgeCracks';
import { stripSealInstalled } from './photo/scenes/stripSealInstalled';

export const photoSize = { width: 1600, height: 1200 };

const scenes: Record<SitePhotoSubject, (rng: Random, width: number, height: number) => Scene> = {
  deck_pour: deckPour,
  roughened_joint: roughenedJoint,
  bulkhead_with_dowels: bulkheadWithDowels,
  strip_seal_installed: stripSealInstalled,
  finger_joint: fingerJoint,
  rebar_mat: rebarMat,
  slab_edge_cracks: slabEdgeCracks,
  retarder_delivery_ticket: deliveryTicket,
};

export const sitePhotoSubjects = Object.keys(scenes) as SitePhotoSubject[];

export async function sitePhoto(spec: { fileName: string; subject: SitePhotoSubject; seed: number }): Promise<DemoFile> {
  requireFileName('sitePhoto', spec.fileName, /\.jpe?g$/i, '.jpg or .jpeg');
  const draw = Object.hasOwn(scenes, spec.subject) ? scenes[spec.subject] : undefined;
  if (!draw) throw new Error(`sitePhoto: no scene for subject "${spec.subject}"; one of ${sitePhotoSubjects.join(', ')}`);
  if (!Number.isSafeInteger(spec.seed)) throw new Error(`sitePhoto: seed ${spec.seed} must be a whole number`);
  const rng = seededRandom(spec.seed);
  const { width, height } = photoSize;
  const scene = draw(rng, width, height);
  // With a backdrop the picture is drawn on a transparent ground so the backdrop shows through.
  const picture = scene.backdrop ? svgDocument(width, height, scene.defs, scene.picture, 'none') : svgDocument(width, height, scene.defs, scene.picture);
  const bytes = await finishPhoto(rng, picture, svgDocument(width, height, [], scene.mask, '#000'), {
    width,
    height,
    textureStrength: scene.textureStrength,
    grain: scene.grain,
    quality: scene.quality,
    backdrop: scene.backdrop && svgDocument(width, height, scene.defs, scene.backdrop),
  });
  return { fileName: spec.fileName, contentType: 'image/jpeg', bytes };
}
