// Generators of the demo scenario's attachments: drawings, data sheets, letters and site photos
// made from a spec, the same bytes every time. Nothing here stores anything.
export type { DemoFile, SitePhotoSubject } from './types';
export { submittalSketch, sketchDisclaimer, titleBlockStamp, type SketchSpec } from './submittalSketch';
export { sealDataSheet, toMm, mmPerInch, type SealSheetSpec } from './sealDataSheet';
export { letterDocument, type LetterSpec } from './letterDocument';
export { sitePhoto, sitePhotoSubjects, photoSize } from './sitePhoto';
