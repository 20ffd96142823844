import type { LossKind, LossMethod, UnitSystem } from '../core';

/**
 * The scenario document: everything the user chose, and nothing derived.
 * It is what the store holds, what the browser saves, what a file and a
 * share link carry. Results are always recomputed from it by the core.
 *
 * Version 1. Later versions add fields and a migration in `migrate.ts`.
 * Every way in (link, file, browser storage) goes through `parseScenario`
 * in `schema.ts`; docs/scenario-schema.md describes each field.
 */
export interface ScenarioV1 {
  readonly version: 1;
  readonly name: string;
  readonly notes: string;
  readonly storm: {
    /** Duration of each bar, h (> 0). */
    readonly durationsH: readonly number[];
    /** Rain depth of each bar, mm (≥ 0); one per duration. */
    readonly depthsMm: readonly number[];
    /** Start of the first bar, ISO 8601 date-time ("2026-07-14T15:00"); left out when not known. */
    readonly startIso?: string;
  };
  readonly catchment: {
    readonly name: string;
    /** Catchment area, m² (0 when not known: volumes are then not shown). */
    readonly areaM2: number;
  };
  /** Display units for the whole screen. Stored values are always SI. */
  readonly units: UnitSystem;
  /** The active loss method with its parameters. */
  readonly method: LossMethod;
  /** Last parameters used for each method, so switching back restores them. */
  readonly methodMemory: Partial<Record<LossKind, LossMethod>>;
  /** Observed runoff to match, or null. Depth in mm or volume in m³. */
  readonly observed: {
    readonly as: 'depth' | 'volume';
    /** mm when `as` is 'depth', m³ when 'volume'. */
    readonly value: number;
    /** Which parameter of the active method to fit. */
    readonly parameter: string;
    /** Keep the fitted value locked to the observed runoff while bars change. */
    readonly locked: boolean;
  } | null;
}

export type Scenario = ScenarioV1;
