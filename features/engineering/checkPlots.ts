// The plots of a check, drawn with d3's scales and shapes: with their own components about 145 KB
// of script that only the filing form's live check and a request's stored check use. They load as
// a chunk of their own, asked for when either comes into view, not with the first screen.
export { DeckCheckPlots } from './DeckCheckPlots';
export { JointCheckPlots } from './JointCheckPlots';
export { SealCheckPlots } from './SealCheckPlots';
