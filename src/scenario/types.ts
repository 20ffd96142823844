import type {
  BaseflowKind,
  BaseflowMethod,
  LossKind,
  LossMethod,
  Transform,
  TransformKind,
  TransformObjective,
  UnitSystem,
} from '../core';

/**
 * The scenario document: everything the user chose, and nothing derived.
 * It is what the store holds, what the browser saves, what a file and a
 * share link carry. Results are always recomputed from it by the core.
 *
 * Version 1 is below; later versions add fields and a migration in `migrate.ts`
 * (version 2: the streamflow record).
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

/**
 * A streamflow record for the event, how it lines up with the storm, and
 * how baseflow is separated from it. Added in version 2.
 */
export interface Streamflow {
  /** Time of each sample, h after the first sample (strictly increasing; steps may differ). */
  readonly timesH: readonly number[];
  /** Discharge at each sample, m³/s (≥ 0); one per time. */
  readonly dischargeM3s: readonly number[];
  /** Clock time of the first sample, ISO 8601 date-time; left out when the record has no clock. */
  readonly startIso?: string;
  /**
   * Hours from the start of the storm to the first sample (negative when the
   * record starts before the rain). Used to line the two up when either has
   * no clock time; when both have one, the clocks decide and this is kept
   * for when one of them is taken away.
   */
  readonly offsetH: number;
  /**
   * The baseflow separation with its parameters. Times in its parameters
   * (an end point) are hours after the first sample, like `timesH`; a start
   * of rise is a 0-based sample index.
   */
  readonly baseflow: BaseflowMethod;
  /** Last parameters used for each separation method, so switching back restores them. */
  readonly baseflowMemory: Partial<Record<BaseflowKind, BaseflowMethod>>;
  /**
   * The observed runoff to match is this separation's direct-runoff depth,
   * worked out afresh from the record, the method and the catchment area
   * (so `observed.value` is not read while this is on). Needs `observed`.
   */
  readonly useAsObserved: boolean;
}

/**
 * Version 2: version 1 with the event's streamflow record (or null). A
 * version 1 document upgrades with no record.
 */
export interface ScenarioV2 extends Omit<ScenarioV1, 'version'> {
  readonly version: 2;
  readonly streamflow: Streamflow | null;
}

/** An event's observed runoff: a depth (mm) or a volume (m³), or null when none was measured. */
export interface EventObserved {
  readonly as: 'depth' | 'volume';
  /** mm when `as` is 'depth', m³ when 'volume'. */
  readonly value: number;
}

/**
 * One observed event of the catchment: its storm and the runoff it produced
 * (typed, or the direct-runoff depth of its own streamflow record, as on the
 * workbench). Added in version 3.
 */
export interface SetEvent {
  /** Stable key, unique in the set (survives rename and reorder). */
  readonly id: string;
  readonly name: string;
  readonly storm: ScenarioV1['storm'];
  readonly observed: EventObserved | null;
  readonly streamflow: Streamflow | null;
}

/** How the design value is chosen from the fitted values: a statistic, or a number of the user's own. */
export type DesignPickDoc = 'median' | 'mean' | 'min' | 'max' | { readonly value: number };

/**
 * The catchment's event set (version 3). While `activeId` names an event,
 * that event is the one on the workbench: the top-level `storm`, `observed`
 * (as, value) and `streamflow` are its data, and the store copies every
 * workbench edit into its entry, so the two never differ in a saved document.
 * With `activeId` null the workbench holds a storm of its own (a version 2
 * document, a design storm).
 */
export interface EventSet {
  readonly events: readonly SetEvent[];
  readonly activeId: string | null;
  /** Parameter of the active method fitted for every event; null: the workbench's (observed.parameter, else the method's first). */
  readonly parameter: string | null;
  readonly designPick: DesignPickDoc;
}

/**
 * Version 3: version 2 with the event set. A version 2 document upgrades
 * with an empty set and its storm as the workbench's own, so it opens to
 * exactly the same screen and numbers.
 */
export interface ScenarioV3 extends Omit<ScenarioV2, 'version'> {
  readonly version: 3;
  readonly eventSet: EventSet;
}

/**
 * Version 4: version 3 whose loss methods carry every setting of the core's
 * method table, including those added for issue 10 (Horton `recovers`,
 * `recoveryPerH`; Green–Ampt `recovers`, `initialSaturation`,
 * `poreSizeIndex`; curve number `conversion`). The shape of the
 * document is unchanged; a version 3 document upgrades with the values that
 * compute what it computed.
 */
export interface ScenarioV4 extends Omit<ScenarioV3, 'version'> {
  readonly version: 4;
}

/**
 * The runoff hydrograph (version 5): how the rainfall excess is routed to a
 * direct runoff hydrograph, and how a transform parameter is fitted to an
 * observed record.
 */
export interface HydrographSettings {
  /** The transform from excess to direct runoff; null: no hydrograph is computed (the screen of version 4). */
  readonly transform: Transform | null;
  /** Last parameters used for each transform kind, so switching back restores them (a pasted unit hydrograph too). */
  readonly transformMemory: Partial<Record<TransformKind, Transform>>;
  /** The transform parameter "Fit" sets; null: the kind's first fittable parameter (lag, or Nash's k). */
  readonly fitParameter: string | null;
  /** What the fit matches: the observed peak, its time, or the best Nash–Sutcliffe efficiency. */
  readonly objective: TransformObjective;
}

/**
 * Version 5: version 4 with the runoff hydrograph (issue 13) and the
 * uncertainty of the observed runoff. A version 4 document upgrades with no
 * transform and no uncertainty, so it opens to the same screen and numbers.
 */
export interface ScenarioV5 extends Omit<ScenarioV4, 'version'> {
  readonly version: 5;
  readonly hydrograph: HydrographSettings;
  /**
   * Uncertainty of the observed runoff, ± % (0 ≤ u < 100; 0: none). Gauge and
   * rating errors: the fitted loss parameter is shown with the fits at the
   * two ends. It never changes the fit itself.
   */
  readonly observedUncertaintyPct: number;
}

export type Scenario = ScenarioV5;
