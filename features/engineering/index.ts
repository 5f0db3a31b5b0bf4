// Engineering plots and the caution box. Not yet wired into screens.
export { MomentDiagram } from './MomentDiagram';
export { PlacementSequencePlot } from './PlacementSequencePlot';
export { OpeningTemperaturePlot } from './OpeningTemperaturePlot';
export { EngineeringCaution } from './EngineeringCaution';
export { momentDiagramSummary, placementSequenceSummary, openingTemperatureSummary } from './summaries';
