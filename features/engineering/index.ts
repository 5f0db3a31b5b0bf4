// Engineering plots, the caution box, and a whole check as the form and the request show it.
// The plot components themselves (with d3) are not exported here: they load on demand through
// lazyCheckPlots.ts, and a static import of them from a screen would put d3 back into the first
// bundle.
export { EngineeringCaution } from './EngineeringCaution';
export { EngineeringCheckView } from './EngineeringCheckView';
export { loadCheckPlots, useCheckPlots } from './lazyCheckPlots';
export { momentDiagramSummary, placementSequenceSummary, openingTemperatureSummary } from './summaries';
