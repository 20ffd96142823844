import type { Scenario } from './types';

/**
 * The demo scenario. INVENTED: the catchment, the gauge and the storm were
 * made up for this project and describe no real place or event. 18 bars of
 * 10 minutes, 41.6 mm in all, over a 3.2 km² mixed rural–suburban catchment.
 */
export const DEMO_SCENARIO: Scenario = {
  version: 5,
  name: 'Demo: Fenmoor Brook storm (invented)',
  notes:
    'Invented example for trying the workbench: a made-up 3-hour summer storm over a made-up 3.2 km² catchment. ' +
    'Not real data.',
  storm: {
    durationsH: Array.from({ length: 18 }, () => 10 / 60),
    depthsMm: [0.4, 0.8, 1.2, 1.8, 2.6, 3.8, 5.6, 6.4, 4.8, 3.6, 2.8, 2.2, 1.6, 1.2, 1.0, 0.8, 0.6, 0.4],
    startIso: '2026-07-14T15:00:00',
  },
  catchment: { name: 'Fenmoor Brook above the mill weir (invented)', areaM2: 3.2e6 },
  units: 'si',
  method: { kind: 'constant', rateMmH: 8 },
  methodMemory: {},
  observed: { as: 'depth', value: 12.5, parameter: 'rateMmH', locked: false },
  streamflow: null,
  eventSet: { events: [], activeId: null, parameter: null, designPick: 'median' },
  hydrograph: { transform: null, transformMemory: {}, fitParameter: null, objective: 'nse' },
  observedUncertaintyPct: 0,
};

/**
 * Whether the scenario still carries the invented demo's identity: its name, its catchment's name or its notes.
 * A storm of the user's own laid over it would otherwise be saved, shared and printed under the demo's words.
 */
export function carriesDemoIdentity(s: Scenario): boolean {
  return (
    s.name === DEMO_SCENARIO.name ||
    s.catchment.name === DEMO_SCENARIO.catchment.name ||
    s.notes === DEMO_SCENARIO.notes
  );
}

/**
 * The scenario without the demo's identity: no name, notes or catchment name, and no observed runoff when it is
 * still the demo's (they describe the invented event, not the storm brought in). The area stays, shown under
 * "Catchment and notes" to be changed (the README's sample files are for the demo's catchment). Method and units stay.
 */
export function withoutDemoIdentity(s: Scenario): Scenario {
  const demoObserved = DEMO_SCENARIO.observed;
  const observedIsDemo =
    s.observed !== null &&
    demoObserved !== null &&
    s.observed.as === demoObserved.as &&
    s.observed.value === demoObserved.value;
  return {
    ...s,
    name: s.name === DEMO_SCENARIO.name ? '' : s.name,
    notes: s.notes === DEMO_SCENARIO.notes ? '' : s.notes,
    catchment: s.catchment.name === DEMO_SCENARIO.catchment.name ? { ...s.catchment, name: '' } : s.catchment,
    observed: observedIsDemo ? null : s.observed,
  };
}
