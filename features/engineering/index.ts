// Engineering plots, the caution box, and a whole check as the form and the request show it.
export { MomentDiagram } from './MomentDiagram';
export { PlacementSequencePlot } from './PlacementSequencePlot';
export { OpeningTemperaturePlot } from './OpeningTemperaturePlot';
export { EngineeringCaution } from './EngineeringCaution';
export { EngineeringCheckView } from './EngineeringCheckView';
export { momentDiagramSummary, placementSequenceSummary, openingTemperatureSummary } from './summaries';
