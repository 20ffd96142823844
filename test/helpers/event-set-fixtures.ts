import { DEMO_SCENARIO } from '../../src/scenario';
import type { Scenario, SetEvent } from '../../src/scenario/types';

/**
 * INVENTED storms for measuring links: `count` events of `bars` bars of
 * 15 minutes, each a rise and fall with a wobble, depths at the 0.2 mm
 * resolution of a tipping-bucket gauge (as logged records are). Deterministic.
 */
export function inventedEvents(count: number, bars: number, resolutionMm: number | null = 0.2): SetEvent[] {
  let seed = 12345;
  const next = (): number => {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    return seed / 2147483648;
  };
  return Array.from({ length: count }, (_, e) => {
    const peak = 20 + ((e * 37) % 60);
    const depthsMm = Array.from({ length: bars }, (_, k) => {
      const shape = Math.exp(-(((k - peak) / 12) ** 2)) * (3 + e) + next() * 0.8;
      return resolutionMm === null ? shape : Math.round(shape / resolutionMm) * resolutionMm;
    }).map((x) => (resolutionMm === null ? x : Number(x.toFixed(1))));
    return {
      id: `e${e + 1}`,
      name: `Invented storm ${e + 1}`,
      storm: {
        durationsH: Array.from({ length: bars }, () => 0.25),
        depthsMm,
        startIso: `2026-0${1 + (e % 9)}-1${e % 10}T06:00`,
      },
      observed: { as: 'depth', value: 5 + e },
      streamflow: null,
    };
  });
}

/** A scenario holding a set, with its first event on the workbench as the store keeps it. */
export function withSet(events: SetEvent[]): Scenario {
  const first = events[0] as SetEvent;
  return {
    ...DEMO_SCENARIO,
    storm: first.storm,
    observed: first.observed && { ...first.observed, parameter: 'rateMmH', locked: false },
    eventSet: { events, activeId: first.id, parameter: null, designPick: 'median' },
  };
}
