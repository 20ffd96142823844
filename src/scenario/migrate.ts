import { describeValue, problemAt, type Problem } from './problems';

/** The scenario format version this build writes, and the newest it reads. */
export const CURRENT_SCENARIO_VERSION = 5;

/** A scenario document of some version, before it is validated. */
export type RawDocument = Readonly<Record<string, unknown>>;

/**
 * One step of the upgrade chain: reads a document of version `from` and
 * returns a new document of version `from + 1` (with `version` set to it).
 * Steps are pure: they never change their input, read no clock or storage,
 * and do not validate (the current schema checks the end result). A step may
 * assume the fields its version had, but must not throw on odd input: it
 * passes odd fields through for the schema to report.
 */
export interface Migration {
  readonly from: number;
  readonly to: number;
  /** What changed, in a sentence (shown in docs/scenario-schema.md). */
  readonly summary: string;
  readonly up: (doc: RawDocument) => RawDocument;
}

/**
 * Version 1 → 2: the streamflow record joins the document. A version 1
 * document had none, so it gets `streamflow: null` and nothing else
 * changes. A `streamflow` field already there (only a hand-edited file
 * could have one) is passed through for the schema to check like any
 * version 2 record, rather than dropped.
 */
const addStreamflow: Migration = {
  from: 1,
  to: 2,
  summary: "Adds `streamflow`: the event's streamflow record and its baseflow separation, null when there is none.",
  up: (doc) => ({ ...doc, version: 2, streamflow: Object.hasOwn(doc, 'streamflow') ? doc['streamflow'] : null }),
};

/**
 * Version 2 → 3: the event set joins the document. A version 2 document is
 * one workbench storm with no set, so it gets an empty set with nothing on
 * the workbench taken from it (`activeId: null`): the storm, observed runoff
 * and record stay where they were and mean what they meant, so every old
 * link and file opens to the same screen and numbers. (Making the storm a
 * one-event set instead would put an event into fits and summaries the user
 * never added.) An `eventSet` already there is passed through for the
 * schema to check.
 */
const addEventSet: Migration = {
  from: 2,
  to: 3,
  summary:
    "Adds `eventSet`: the catchment's observed events, the one on the workbench, the parameter fitted for all and the design value pick; version 2 documents get an empty set.",
  up: (doc) => ({
    ...doc,
    version: 3,
    eventSet: Object.hasOwn(doc, 'eventSet')
      ? doc['eventSet']
      : { events: [], activeId: null, parameter: null, designPick: 'median' },
  }),
};

const isObject = (x: unknown): x is Readonly<Record<string, unknown>> =>
  x !== null && typeof x === 'object' && !Array.isArray(x);

/**
 * A version 3 loss method with the settings version 4 added, each as the
 * version 3 document computed it: no recovery in dry spells (Horton with its
 * rate at the default, so that turning recovery on starts from it;
 * Green–Ampt with the soil values its redistribution reads, Sᵢ 0.3 and λ 0.22
 * of loam, the default soil, read only once recovery is on), and for the
 * curve number on the 0.05 basis the constant ratio
 * S₀.₀₅ = 1.42 S₀.₂, the only conversion version 3 had. On the 0.2 basis the
 * conversion is not used, and gets the new default, the power relation.
 * Settings already there, and anything odd, are passed through for the
 * schema to check.
 */
function methodToV4(method: unknown): unknown {
  if (!isObject(method)) return method;
  const kind = method['kind'];
  const missing = (key: string): boolean => !Object.hasOwn(method, key);
  if (kind === 'horton') {
    return {
      ...method,
      ...(missing('recovers') ? { recovers: false } : {}),
      ...(missing('recoveryPerH') ? { recoveryPerH: 0.05 } : {}),
    };
  }
  if (kind === 'green-ampt') {
    return {
      ...method,
      ...(missing('recovers') ? { recovers: false } : {}),
      ...(missing('initialSaturation') ? { initialSaturation: 0.3 } : {}),
      ...(missing('poreSizeIndex') ? { poreSizeIndex: 0.22 } : {}),
    };
  }
  if (kind === 'curve-number' && missing('conversion')) {
    return { ...method, conversion: method['iaRatio'] === 0.05 ? 'ratio' : 'power' };
  }
  return method;
}

/**
 * Version 3 → 4: the infiltration methods gain settings (issue 10): Horton
 * `recovers` and `recoveryPerH`, Green–Ampt `recovers`, `initialSaturation`
 * and `poreSizeIndex` (capacity recovery in dry spells), the curve number
 * `conversion` (how S converts to the 0.05 basis).
 * `method` and every `methodMemory` entry get them with the values that
 * compute what version 3 computed, so every old link and file opens to the
 * same numbers. Horton by the clock (`ponding: false`) now loses the exact
 * ∫ min(i, f) dt per bar from the first bar with rain; its numbers change
 * where the old rule was wrong (inside a bar where capacity crosses the
 * rain, and after dry bars before the rain), which is the fix, not a change
 * of meaning. Baseflow methods gain only optional parameters and need nothing.
 */
const addInfiltrationSettings: Migration = {
  from: 3,
  to: 4,
  summary:
    'Adds `recovers` and `recoveryPerH` to Horton methods (false, 0.05), `recovers`, `initialSaturation` and `poreSizeIndex` to Green–Ampt methods (false, 0.3, 0.22) and `conversion` to curve-number methods ("ratio" on the 0.05 basis, as version 3 computed; "power" on the 0.2 basis, where it is not used), in `method` and every `methodMemory` entry.',
  up: (doc) => {
    const memory = doc['methodMemory'];
    return {
      ...doc,
      version: 4,
      method: methodToV4(doc['method']),
      methodMemory: isObject(memory)
        ? Object.fromEntries(Object.entries(memory).map(([key, entry]) => [key, methodToV4(entry)]))
        : memory,
    };
  },
};

/** What a version 4 document computed: no runoff hydrograph, the fit objective at its default. */
export const NO_HYDROGRAPH = { transform: null, transformMemory: {}, fitParameter: null, objective: 'nse' } as const;

/**
 * Version 4 → 5: the runoff hydrograph joins the document (issue 13):
 * `hydrograph` (the transform from excess to direct runoff, null for none,
 * with its memory, the parameter to fit and the fit's objective) and
 * `observedUncertaintyPct` (± % on the observed runoff, 0 for none). A
 * version 4 document had neither, so it gets no transform and no
 * uncertainty: it opens to exactly the same screen and numbers. Fields
 * already there are passed through for the schema to check.
 */
const addRunoffHydrograph: Migration = {
  from: 4,
  to: 5,
  summary:
    'Adds `hydrograph` (the transform from rainfall excess to a direct runoff hydrograph, its memory, the parameter to fit and the objective; version 4 documents get no transform) and `observedUncertaintyPct` (± % on the observed runoff; version 4 documents get 0, none).',
  up: (doc) => ({
    ...doc,
    version: 5,
    hydrograph: Object.hasOwn(doc, 'hydrograph') ? doc['hydrograph'] : NO_HYDROGRAPH,
    observedUncertaintyPct: Object.hasOwn(doc, 'observedUncertaintyPct') ? doc['observedUncertaintyPct'] : 0,
  }),
};

/**
 * The upgrade chain, oldest first. When the document changes (e.g. the
 * event set), bump CURRENT_SCENARIO_VERSION and append the next step
 * `{ from, to: from + 1, summary, up }`; never edit a released step.
 */
export const MIGRATIONS: readonly Migration[] = [
  addStreamflow,
  addEventSet,
  addInfiltrationSettings,
  addRunoffHydrograph,
];

export type MigrationResult =
  | { readonly ok: true; readonly doc: RawDocument; readonly fromVersion: number }
  | { readonly ok: false; readonly problems: readonly Problem[] };

/**
 * Brings a document up to `current` by running the chain's steps in turn.
 * Refuses, with a message on `version`, a missing or malformed version, a
 * version newer than `current`, and a version the chain cannot start from.
 */
export function migrate(
  doc: RawDocument,
  chain: readonly Migration[] = MIGRATIONS,
  current: number = CURRENT_SCENARIO_VERSION,
): MigrationResult {
  const fail = (text: string): MigrationResult => ({ ok: false, problems: [problemAt(['version'], text)] });
  const start = doc['version'];
  if (start === undefined) {
    return fail(
      `is missing; every scenario says which version of the format it uses (this version of Raincut writes ${current}).`,
    );
  }
  if (typeof start !== 'number' || !Number.isSafeInteger(start)) {
    return fail(`must be a whole number (got ${describeValue(start)}).`);
  }
  if (start > current) {
    return fail(
      `is ${start}, newer than this version of Raincut can read (it reads up to ${current}). ` +
        'Open the scenario in an up-to-date Raincut.',
    );
  }
  const oldest = chain.reduce((low, step) => Math.min(low, step.from), current);
  let version = start;
  let out = doc;
  while (version < current) {
    const step = chain.find((s) => s.from === version);
    if (!step) {
      return fail(
        version < oldest
          ? `is ${version}, but the oldest scenario version this Raincut reads is ${oldest}.`
          : `is ${version}, and this version of Raincut has no way to upgrade it.`,
      );
    }
    if (step.to !== version + 1) {
      return fail(`cannot be upgraded: the step from ${version} leads to ${step.to} instead of ${version + 1}.`);
    }
    let next: RawDocument;
    try {
      next = step.up(out);
    } catch (error) {
      const why = error instanceof Error ? error.message : String(error);
      return fail(`upgrading from version ${version} to ${step.to} failed: ${why}`);
    }
    if (next === null || typeof next !== 'object' || next['version'] !== step.to) {
      return fail(`upgrading from version ${version} to ${step.to} did not give a version ${step.to} document.`);
    }
    out = next;
    version = step.to;
  }
  return { ok: true, doc: out, fromVersion: start };
}
