// Engineering checks used by the request forms and by the server. Pure functions, US customary
// inputs with SI beside them in the results, no I/O.
export { engineeringVersion, engineeringCaution } from './meta';
export { EngineeringInputError, NegativeOpeningError } from './errors';
export * as units from './units';
export {
  ftToM,
  mToFt,
  inToMm,
  mmToIn,
  kipToKn,
  knToKip,
  kipFtToKnM,
  knMToKipFt,
  kipPerFtToKnPerM,
  knPerMToKipPerFt,
  cyToM3,
  m3ToCy,
  fToC,
  cToF,
} from './units';
export { MAX_SPANS } from './validation';

export {
  analyzeContinuousBeam,
  continuousBeamInputSchema,
  patchLoadSchema,
  regionAt,
  DEFAULT_STATIONS_PER_SPAN,
  MAX_STATIONS_PER_SPAN,
  type ContinuousBeamInput,
  type ContinuousBeamResult,
  type PatchLoad,
  type BeamStation,
  type MomentRegion,
  type MomentSign,
  type MomentPeak,
  type MomentPeakSI,
} from './continuousBeam';

export {
  planDeckPlacement,
  deckPlacementInputSchema,
  DEFAULT_CONCRETE_UNIT_WEIGHT_PCF,
  DEFAULT_SET_TIME_MARGIN_HR,
  type DeckPlacementInput,
  type DeckPlacementPlan,
  type PlacementSegment,
  type EmergencyJointZone,
} from './deckPlacement';
export {
  EXHAUSTIVE_SEGMENT_LIMIT,
  type StageCheck,
  type StageOrderResult,
  type StageSegmentResult,
} from './stageCheck';

export {
  checkConstructionJointLocation,
  constructionJointInputSchema,
  jointPlanes,
  NEAR_INFLECTION_SHARE_OF_SPAN,
  type ConstructionJointInput,
  type ConstructionJointCheck,
  type JointPlane,
} from './constructionJoint';

export {
  thermalMovementRange,
  thermalMovementInputSchema,
  procedureATemperaturesF,
  thermalCoefficientPerF,
  designTemperatures,
  deckMaterials,
  climates,
  type DeckMaterial,
  type Climate,
  type ThermalMovementInput,
  type ThermalMovementRange,
} from './thermal';

export {
  installationGap,
  installationGapInputSchema,
  DEFAULT_REFERENCE_TEMP_F,
  type InstallationGapInput,
  type InstallationGap,
  type OpeningRow,
} from './installationGap';

export {
  checkSealSubstitution,
  sealSubstitutionInputSchema,
  suggestJointFamily,
  familySuits,
  sealKinds,
  sealKindLabels,
  sealFamilyMovementIn,
  LARGE_MOVEMENT_IN,
  MODULAR_CELL_IN,
  type SealKind,
  type SealSpec,
  type SealSubstitutionInput,
  type SealSubstitutionCheck,
  type MovementClass,
} from './sealSubstitution';
