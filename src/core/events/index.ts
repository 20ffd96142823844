// Several events for one catchment: fit each, summarise the fitted values,
// pick a design value and see each event's runoff with it.
// Re-exported from src/core/index.ts.
export { validateEventList, type CatchmentEvent } from './event';
export { fitEvents, type EventFit } from './fit';
export { summariseFits, summariseValues, type FitSummary } from './summary';
export {
  fitEventTransforms,
  summariseTransformFits,
  type EventTransformFit,
  type HydrographEvent,
  type TransformFitSettings,
} from './transform-fit';
export { pickDesignValue, type DesignPick } from './design-value';
export { applyDesignValue, type EventRunoff } from './apply';
