import { defaultMethod, type UnitSystem } from '../core';
import type { Scenario } from './types';

/**
 * A new, empty scenario: no name, no notes, no catchment, no storm, no
 * observed runoff, no record, no event set and no runoff hydrograph, in the
 * units the user works in. The loss method is the one in use, at its default parameters (a
 * method is a working habit; its values belonged to the old storm).
 */
export function blankScenario(units: UnitSystem, method: Scenario['method']): Scenario {
  return {
    version: 5,
    name: '',
    notes: '',
    storm: { durationsH: [], depthsMm: [] },
    catchment: { name: '', areaM2: 0 },
    units,
    method: defaultMethod(method.kind),
    methodMemory: {},
    observed: null,
    streamflow: null,
    eventSet: { events: [], activeId: null, parameter: null, designPick: 'median' },
    hydrograph: { transform: null, transformMemory: {}, fitParameter: null, objective: 'nse' },
    observedUncertaintyPct: 0,
  };
}
