import { describeValue, problemAt, type Problem } from './problems';

/** The scenario format version this build writes, and the newest it reads. */
export const CURRENT_SCENARIO_VERSION = 3;

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

/**
 * The upgrade chain, oldest first. When the document changes (e.g. the
 * event set), bump CURRENT_SCENARIO_VERSION and append the next step
 * `{ from, to: from + 1, summary, up }`; never edit a released step.
 */
export const MIGRATIONS: readonly Migration[] = [addStreamflow, addEventSet];

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
