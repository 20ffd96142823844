import * as v from 'valibot';
import {
  FIRST_CLOCK_YEAR,
  LAST_CLOCK_YEAR,
  MAX_RECORD_YEARS,
  clockYearProblem,
  describeHours,
  hoursBetweenClocks,
  MAX_RECORD_H,
  SHORTEST_STEP_ACCEPTED_H,
  isBaseflowKind,
  attempt,
  isInputError,
  isSpanH,
  isLossKind,
  isTransformKind,
  fittableTransformKeys,
  TRANSFORM_OBJECTIVES,
  validateBaseflowMethod,
  validateHydrograph,
  validateStorm,
  type BaseflowMethod,
} from '../core';
import { baseflowRecordProblem, readBaseflowMethod } from './baseflow-check';
import { isIsoDateTime } from './iso-date-time';
import { fittableParameters, readMethod, type ReportAt } from './method-check';
import { CURRENT_SCENARIO_VERSION, migrate, type RawDocument } from './migrate';
import {
  capProblems,
  describeValue,
  failure,
  problem,
  problemAt,
  type PathKey,
  type Problem,
  type ScenarioResult,
} from './problems';
import { MAX_NAME_LENGTH, MAX_NOTES_LENGTH, tooLongText } from './text-limits';
import { readTransform } from './transform-check';

/**
 * The most bars a storm may have: a year of one-minute bars is about half
 * of it. Keeps a crafted document from asking for endless work.
 */
const MAX_BARS = 1_000_000;

/** What each field holds, for "is missing" messages and the schema page. */
export const FIELD_HELP: Readonly<Record<string, string>> = {
  version: `the format version, ${CURRENT_SCENARIO_VERSION}`,
  name: 'the scenario name, text',
  notes: 'free notes, text (may be empty)',
  storm: 'the storm: durationsH and depthsMm, one entry per bar',
  'storm.durationsH': 'the duration of each bar, hours',
  'storm.depthsMm': 'the rain depth of each bar, mm',
  catchment: 'the catchment: name and areaM2',
  'catchment.name': 'the catchment name, text',
  'catchment.areaM2': 'the catchment area, m², 0 when not known',
  units: 'the display units, "si" or "us"',
  method: 'the active loss method, with its kind and parameters',
  methodMemory: 'the last parameters used for each method, an object keyed by kind (may be empty)',
  observed: 'the observed runoff to match, or null',
  'observed.as': 'whether the observed runoff is a "depth" or a "volume"',
  'observed.value': 'the observed runoff, mm for a depth or m³ for a volume',
  'observed.parameter': 'the parameter of the active method to fit',
  'observed.locked': 'whether the fit follows the bars as they change, true or false',
  streamflow: 'the streamflow record of the event and its baseflow separation, or null',
  'streamflow.timesH': 'the time of each sample, hours after the first sample',
  'streamflow.dischargeM3s': 'the discharge of each sample, m³/s',
  'streamflow.offsetH': 'hours from the storm start to the first sample (negative when the record starts first)',
  'streamflow.baseflow': 'the baseflow separation method, with its kind and parameters',
  'streamflow.baseflowMemory':
    'the last parameters used for each baseflow method, an object keyed by kind (may be empty)',
  'streamflow.useAsObserved': 'whether the observed runoff is the separated direct-runoff depth, true or false',
  eventSet: 'the event set: events, activeId, parameter and designPick',
  'eventSet.events': 'the observed events of the catchment, a list (may be empty)',
  'eventSet.activeId': 'the id of the event on the workbench, or null',
  'eventSet.parameter': "the parameter fitted for every event, or null for the workbench's",
  'eventSet.designPick': 'the design value: "median", "mean", "min", "max" or { "value": number }',
  hydrograph: 'the runoff hydrograph: transform, transformMemory, fitParameter and objective',
  'hydrograph.transform': 'the transform from rainfall excess to direct runoff, with its kind and parameters, or null',
  'hydrograph.transformMemory': 'the last parameters used for each transform, an object keyed by kind (may be empty)',
  'hydrograph.fitParameter': "the transform parameter to fit, or null for the kind's first",
  'hydrograph.objective': 'what the transform fit matches: "peak", "time-of-peak" or "nse"',
  observedUncertaintyPct: 'the uncertainty of the observed runoff, ± per cent from 0 to below 100 (0: none)',
};

/** The most events a set may hold: far more than anyone calibrates by hand, small enough to keep fits instant. */
export const MAX_EVENTS = 200;

/**
 * The most samples a streamflow record may have: a year of one-minute
 * readings is about half of it, as for bars.
 */
const MAX_SAMPLES = 1_000_000;

type Message = (issue: v.BaseIssue<unknown>) => string;
const must =
  (rule: string): Message =>
  (issue) =>
    `must be ${rule} (got ${describeValue(issue.input)}).`;

// -0 and 0 are the same amount; keep one so that documents compare equal.
const unsignedZero = (x: number): number => (x === 0 ? 0 : x);

function numberField(rule: string, test: (x: number) => boolean) {
  const message = must(rule);
  return v.pipe(v.number(message), v.check(test, message), v.transform(unsignedZero));
}

const text = () => v.string(must('text'));
/** Text of at most `max` characters (src/scenario/text-limits.ts). */
const cappedText = (max: number) =>
  v.pipe(
    v.string(must('text')),
    v.maxLength(max, (issue) => tooLongText((issue.input as string).length, max)),
  );
const nonNegative = (x: number): boolean => Number.isFinite(x) && x >= 0;
// The limits of time (core/time-limits.ts) as local tests: these run once per bar or sample.
const SHORTEST_H = SHORTEST_STEP_ACCEPTED_H;
const LONGEST_H = MAX_RECORD_H;
const barDuration = (x: number): boolean => x >= SHORTEST_H && x <= LONGEST_H;
const withinSpan = (x: number): boolean => x >= -LONGEST_H && x <= LONGEST_H;

/** Bad bars listed one by one per list; the rest are counted in one message. */
export const LISTED_BARS = 10;

/**
 * A list with one number per bar. Checked in one loop rather than one schema
 * per item, so that a list of a million bad values costs a million tests and
 * a handful of messages, not a million message objects.
 */
function barList(what: string, rule: string, test: (x: number) => boolean) {
  return v.pipe(
    v.array(v.unknown(), must(`a list of ${what}, one per bar`)),
    v.maxLength(
      MAX_BARS,
      (issue) => `has ${(issue.input as unknown[]).length} bars; a scenario holds at most ${MAX_BARS}.`,
    ),
    v.rawTransform(({ dataset, addIssue, NEVER }): number[] => {
      const list = dataset.value;
      const out: number[] = [];
      let bad = 0;
      for (let k = 0; k < list.length; k++) {
        const x = list[k];
        if (typeof x === 'number' && test(x)) {
          out.push(unsignedZero(x));
          continue;
        }
        bad++;
        if (bad <= LISTED_BARS) {
          addIssue({ message: `must be ${rule} (got ${describeValue(x)}).`, path: issuePath(list, [k]) });
        }
      }
      if (bad > LISTED_BARS) {
        const rest = bad - LISTED_BARS;
        addIssue({
          message: `${rest} more bar${rest === 1 ? ' is' : 's are'} wrong too (only the first ${LISTED_BARS} are listed).`,
        });
      }
      return bad > 0 ? NEVER : out;
    }),
  );
}

const isRecord = (x: unknown): x is Record<string, unknown> => x !== null && typeof x === 'object' && !Array.isArray(x);

/**
 * An object with the given fields. valibot's object schema also takes a
 * list (an array is an object), so lists are refused first.
 */
function fields<const E extends v.ObjectEntries>(entries: E, what: string) {
  const message = must(what);
  return v.pipe(v.custom<Record<string, unknown>>(isRecord, message), v.object(entries, message));
}

/**
 * An optional start clock: an ISO 8601 date-time in the years a start may
 * have (core/time-limits.ts), or left out.
 */
function startClock() {
  return v.exactOptional(
    v.pipe(
      v.string(must('text: an ISO 8601 date-time such as "2026-07-14T15:00", or left out')),
      v.check(isIsoDateTime, must('an ISO 8601 date-time such as "2026-07-14T15:00" or "2026-07-14T15:00:00Z"')),
      v.check(
        (iso) => clockYearProblem('', iso) === null,
        must(`a date-time in the years ${FIRST_CLOCK_YEAR} to ${LAST_CLOCK_YEAR}`),
      ),
    ),
  );
}

const StormEntries = {
  durationsH: barList(
    'durations in hours',
    `a number of hours from 1 second (0.000278) to ${MAX_RECORD_YEARS} years (bar duration)`,
    barDuration,
  ),
  depthsMm: barList('rain depths in mm', 'a number ≥ 0 (rain depth, mm)', nonNegative),
  startIso: startClock(),
};

const CatchmentEntries = {
  name: cappedText(MAX_NAME_LENGTH),
  areaM2: numberField('a number ≥ 0 (catchment area, m²; 0 when not known)', nonNegative),
};

/**
 * A list with one number per streamflow sample, checked in one loop like
 * the bar lists (a million bad values cost a handful of messages).
 */
function sampleList(what: string, rule: string, test: (x: number) => boolean) {
  return v.pipe(
    v.array(v.unknown(), must(`a list of ${what}, one per sample`)),
    v.maxLength(
      MAX_SAMPLES,
      (issue) => `has ${(issue.input as unknown[]).length} samples; a streamflow record holds at most ${MAX_SAMPLES}.`,
    ),
    v.rawTransform(({ dataset, addIssue, NEVER }): number[] => {
      const list = dataset.value;
      const out: number[] = [];
      let bad = 0;
      for (let k = 0; k < list.length; k++) {
        const x = list[k];
        if (typeof x === 'number' && test(x)) {
          out.push(unsignedZero(x));
          continue;
        }
        bad++;
        if (bad <= LISTED_BARS) {
          addIssue({ message: `must be ${rule} (got ${describeValue(x)}).`, path: issuePath(list, [k]) });
        }
      }
      if (bad > LISTED_BARS) {
        const rest = bad - LISTED_BARS;
        addIssue({
          message: `${rest} more sample${rest === 1 ? ' is' : 's are'} wrong too (only the first ${LISTED_BARS} are listed).`,
        });
      }
      return bad > 0 ? NEVER : out;
    }),
  );
}

const finite = (x: number): boolean => Number.isFinite(x);

const ObservedEntries = {
  as: v.picklist(['depth', 'volume'], must('"depth" or "volume"')),
  value: numberField('a number ≥ 0 (mm for a depth, m³ for a volume)', nonNegative),
  parameter: text(),
  locked: v.boolean(must('true or false')),
};

/** Path items for issues raised inside a transform, relative to its input. */
function issuePath(root: unknown, keys: readonly PathKey[]): [v.IssuePathItem, ...v.IssuePathItem[]] | undefined {
  const items: v.IssuePathItem[] = [];
  let input: unknown = root;
  for (const key of keys) {
    const value = input !== null && typeof input === 'object' ? (input as Record<PathKey, unknown>)[key] : undefined;
    items.push(
      typeof key === 'number'
        ? { type: 'array', origin: 'value', input: Array.isArray(input) ? input : [], key, value }
        : { type: 'object', origin: 'value', input: (input ?? {}) as Record<string, unknown>, key, value },
    );
    input = value;
  }
  const [first, ...rest] = items;
  return first ? [first, ...rest] : undefined;
}

/** Reads one method of a family (loss or baseflow) and reports its problems by path. */
type ReadOne<K extends string, M> = (input: unknown, report: ReportAt, storedAs?: K) => M | undefined;

/** A schema for one method of a family, checked by that family's reader. */
function methodSchema<K extends string, M>(read: ReadOne<K, M>) {
  return v.pipe(
    v.unknown(),
    v.rawTransform(({ dataset, addIssue, NEVER }) => {
      const method = read(dataset.value, (keys, message) =>
        addIssue({ message, path: issuePath(dataset.value, keys) }),
      );
      return method ?? NEVER;
    }),
  );
}

/**
 * A schema for a family's memory: the last parameters of each method, keyed
 * by kind, each entry a full method whose kind equals its key.
 */
function methodMemorySchema<K extends string, M>(
  read: ReadOne<K, M>,
  isKind: (key: string) => key is K,
  family: string,
) {
  return v.pipe(
    v.unknown(),
    v.rawTransform(({ dataset, addIssue, NEVER }): Partial<Record<K, M>> => {
      const input = dataset.value;
      if (input === null || typeof input !== 'object' || Array.isArray(input)) {
        addIssue({ message: `must be an object keyed by ${family} method kind, or {} (got ${describeValue(input)}).` });
        return NEVER;
      }
      const memory: Partial<Record<K, M>> = {};
      let ok = true;
      for (const key of Object.keys(input)) {
        const entry = (input as Record<string, unknown>)[key];
        if (!isKind(key)) {
          addIssue({
            message: `is not a ${family} method kind this version of Raincut knows.`,
            path: issuePath(input, [key]),
          });
          ok = false;
          continue;
        }
        const method = read(
          entry,
          (keys, message) => addIssue({ message, path: issuePath(input, [key, ...keys]) }),
          key,
        );
        if (method) memory[key] = method;
        else ok = false;
      }
      return ok ? memory : NEVER;
    }),
  );
}

const MethodSchema = methodSchema(readMethod);
const MethodMemorySchema = methodMemorySchema(readMethod, isLossKind, 'loss');
const BaseflowSchema = methodSchema(readBaseflowMethod);
const BaseflowMemorySchema = methodMemorySchema(readBaseflowMethod, isBaseflowKind, 'baseflow');

const TransformSchema = methodSchema(readTransform);
const TransformMemorySchema = methodMemorySchema(readTransform, isTransformKind, 'transform');

const HydrographEntries = {
  transform: v.nullable(TransformSchema),
  transformMemory: TransformMemorySchema,
  fitParameter: v.nullable(text()),
  objective: v.picklist(TRANSFORM_OBJECTIVES, must('"peak", "time-of-peak" or "nse"')),
};

const StreamflowEntries = {
  timesH: sampleList(
    'sample times in hours',
    `a number of hours after the first sample, within ${MAX_RECORD_YEARS} years of it`,
    withinSpan,
  ),
  dischargeM3s: sampleList('discharges in m³/s', 'a number ≥ 0 (discharge, m³/s)', nonNegative),
  startIso: startClock(),
  offsetH: numberField(
    `a number of hours from the storm start to the first sample, within ${MAX_RECORD_YEARS} years either way`,
    isSpanH,
  ),
  baseflow: BaseflowSchema,
  baseflowMemory: BaseflowMemorySchema,
  useAsObserved: v.boolean(must('true or false')),
};

/**
 * Checks of the streamflow record that need more than one field: lists of
 * equal length, the core's own record check (so a stored record is one the
 * core accepts), baseflow parameters that fit this record, and a link to
 * the observed runoff only where there is one.
 */
function checkStreamflow(
  doc: Partial<Record<string, unknown>>,
  add: (keys: readonly PathKey[], message: string) => void,
): void {
  const flow = doc['streamflow'] as
    | {
        timesH?: unknown;
        dischargeM3s?: unknown;
        baseflow?: unknown;
        baseflowMemory?: unknown;
        useAsObserved?: unknown;
      }
    | null
    | undefined;
  if (!flow || typeof flow !== 'object') return;
  const { timesH, dischargeM3s } = flow;
  if (flow.useAsObserved === true && doc['observed'] === null) {
    add(
      ['streamflow', 'useAsObserved'],
      'is true, but there is no observed runoff to follow the separation (observed is null); set observed or make this false.',
    );
  }
  const stormStart = (doc['storm'] as { startIso?: unknown } | null | undefined)?.startIso;
  const recordStart = (flow as { startIso?: unknown }).startIso;
  if (typeof stormStart === 'string' && typeof recordStart === 'string') {
    // The two clocks line the record up with the storm: that offset is held to a record's span too.
    const between = hoursBetweenClocks(stormStart, recordStart);
    if (between !== null && !isSpanH(between.hours)) {
      add(
        ['streamflow', 'startIso'],
        `starts ${describeHours(Math.abs(between.hours))} ${between.hours < 0 ? 'before' : 'after'} the storm start; ` +
          `a record lies within ${MAX_RECORD_YEARS} years of its storm.`,
      );
    }
  }
  if (!Array.isArray(timesH) || !Array.isArray(dischargeM3s)) return;
  if (timesH.length !== dischargeM3s.length) {
    add(
      ['streamflow', 'dischargeM3s'],
      `has ${dischargeM3s.length} sample${dischargeM3s.length === 1 ? '' : 's'} but streamflow.timesH has ${timesH.length}; every sample needs both a time and a discharge.`,
    );
    return;
  }
  // The per-sample lists are checked above; only a clean record goes to the core.
  if (
    !timesH.every((t) => typeof t === 'number' && withinSpan(t)) ||
    !dischargeM3s.every((q) => typeof q === 'number' && nonNegative(q))
  )
    return;
  const record = { timesH: timesH as number[], dischargeM3s: dischargeM3s as number[] };
  const checked = attempt(() => validateHydrograph(record));
  if (!checked.ok) {
    const { error } = checked;
    const keys: PathKey[] = ['streamflow', error.field];
    if (error.index !== undefined) keys.push(error.index);
    add(keys, error.message);
    return;
  }
  const judge = (method: unknown, keys: readonly PathKey[]): void => {
    const kind = (method as { kind?: unknown } | null)?.kind;
    if (method === null || typeof method !== 'object' || !isBaseflowKind(kind)) return;
    try {
      validateBaseflowMethod(method as BaseflowMethod);
    } catch {
      return; // already reported, with its field, by the method check
    }
    const found = baseflowRecordProblem(record, method as BaseflowMethod);
    if (found) add([...keys, found[0]], found[1]);
  };
  judge(flow.baseflow, ['streamflow', 'baseflow']);
  const memory = flow.baseflowMemory;
  if (memory && typeof memory === 'object' && !Array.isArray(memory)) {
    for (const [key, entry] of Object.entries(memory)) judge(entry, ['streamflow', 'baseflowMemory', key]);
  }
}

const EventObservedEntries = {
  as: v.picklist(['depth', 'volume'], must('"depth" or "volume"')),
  value: numberField('a number ≥ 0 (mm for a depth, m³ for a volume)', nonNegative),
};

const EventEntries = {
  id: v.pipe(text(), v.nonEmpty(must('a non-empty id'))),
  name: cappedText(MAX_NAME_LENGTH),
  storm: fields(StormEntries, 'an object with durationsH and depthsMm'),
  observed: v.nullable(fields(EventObservedEntries, 'an object with as and value, or null')),
  streamflow: v.nullable(
    fields(
      StreamflowEntries,
      'an object with timesH, dischargeM3s, offsetH, baseflow, baseflowMemory and useAsObserved, or null',
    ),
  ),
};

const DesignPickSchema = v.union(
  [
    v.picklist(['median', 'mean', 'min', 'max']),
    fields({ value: numberField('a finite number', finite) }, 'an object with value'),
  ],
  must('"median", "mean", "min", "max" or an object { "value": number }'),
);

const EventSetEntries = {
  events: v.pipe(
    v.array(
      fields(EventEntries, 'an event: an object with id, name, storm, observed and streamflow'),
      must('a list of events'),
    ),
    v.maxLength(
      MAX_EVENTS,
      (issue) => `has ${(issue.input as unknown[]).length} events; a set holds at most ${MAX_EVENTS}.`,
    ),
  ),
  activeId: v.nullable(text()),
  parameter: v.nullable(text()),
  designPick: DesignPickSchema,
};

/** Storm lists of equal length, then the core's own storm check, with keys under `at`. */
function checkStorm(
  storm: unknown,
  at: readonly PathKey[],
  add: (keys: readonly PathKey[], message: string) => void,
  clean: boolean,
): void {
  const st = storm as { durationsH?: unknown; depthsMm?: unknown } | undefined;
  if (!st || !Array.isArray(st.durationsH) || !Array.isArray(st.depthsMm)) return;
  const n = st.durationsH.length;
  const m = st.depthsMm.length;
  if (n !== m) {
    add(
      [...at, 'depthsMm'],
      `has ${m} bar${m === 1 ? '' : 's'} but ${[...at, 'durationsH'].join('.')} has ${n}; every bar needs both a duration and a depth.`,
    );
    return;
  }
  // Bars already refused one by one are not reported again by the core.
  if (!clean) return;
  try {
    validateStorm(st as { durationsH: number[]; depthsMm: number[] });
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const keys: PathKey[] = [...at];
    if (isInputError(error)) {
      keys.push(error.field);
      if (error.index !== undefined) keys.push(error.index);
    }
    add(keys, message);
  }
}

/**
 * The event set's own cross-field checks: unique ids, an activeId that
 * names an event, and each event's storm and record checked as the
 * workbench's are.
 */
function checkEventSet(
  doc: Partial<Record<string, unknown>>,
  add: (keys: readonly PathKey[], message: string) => void,
  clean: boolean,
): void {
  const set = doc['eventSet'] as { events?: unknown; activeId?: unknown } | undefined;
  if (!set || typeof set !== 'object' || !Array.isArray(set.events)) return;
  const seen = new Map<string, number>();
  set.events.forEach((raw: unknown, k: number) => {
    if (!isRecord(raw)) return;
    const at: PathKey[] = ['eventSet', 'events', k];
    const id = raw['id'];
    if (typeof id === 'string') {
      const earlier = seen.get(id);
      if (earlier !== undefined)
        add([...at, 'id'], `"${id}" is already the id of event ${earlier + 1}; ids must be unique.`);
      else seen.set(id, k);
    }
    checkStorm(raw['storm'], [...at, 'storm'], add, clean);
    checkStreamflow(raw, (keys, message) => add([...at, ...keys], message));
  });
  if (typeof set.activeId === 'string' && !seen.has(set.activeId)) {
    add(['eventSet', 'activeId'], `"${set.activeId}" is not the id of any event in the set; use one of them or null.`);
  }
}

const DocumentEntries = {
  version: v.literal(CURRENT_SCENARIO_VERSION, must(`${CURRENT_SCENARIO_VERSION}`)),
  name: cappedText(MAX_NAME_LENGTH),
  notes: cappedText(MAX_NOTES_LENGTH),
  storm: fields(StormEntries, 'an object with durationsH and depthsMm'),
  catchment: fields(CatchmentEntries, 'an object with name and areaM2'),
  units: v.picklist(['si', 'us'], must('"si" or "us"')),
  method: MethodSchema,
  methodMemory: MethodMemorySchema,
  observed: v.nullable(fields(ObservedEntries, 'an object with as, value, parameter and locked, or null')),
  streamflow: v.nullable(
    fields(
      StreamflowEntries,
      'an object with timesH, dischargeM3s, offsetH, baseflow, baseflowMemory and useAsObserved, or null',
    ),
  ),
  eventSet: fields(EventSetEntries, 'an object with events, activeId, parameter and designPick'),
  hydrograph: fields(HydrographEntries, 'an object with transform, transformMemory, fitParameter and objective'),
  observedUncertaintyPct: numberField(
    'a number of per cent from 0 to below 100 (uncertainty of the observed runoff; 0 for none)',
    (x) => Number.isFinite(x) && x >= 0 && x < 100,
  ),
};

/**
 * Checks that need more than one field: bar lists of equal length, the fitted
 * parameter belonging to the active method, the streamflow record's own
 * checks (`checkStreamflow`), and the core's own storm check (so a document
 * that passes here is one the core accepts).
 */
const crossFieldChecks = v.rawCheck<v.InferOutput<v.ObjectSchema<typeof DocumentEntries, undefined>>>(
  ({ dataset, addIssue }) => {
    const doc = dataset.value as Partial<Record<string, unknown>>;
    const add = (keys: readonly PathKey[], message: string) => addIssue({ message, path: issuePath(doc, keys) });
    const storm = doc['storm'] as { durationsH?: unknown; depthsMm?: unknown } | undefined;
    if (storm && Array.isArray(storm.durationsH) && Array.isArray(storm.depthsMm)) {
      const n = storm.durationsH.length;
      const m = storm.depthsMm.length;
      if (n !== m) {
        add(
          ['storm', 'depthsMm'],
          `has ${m} bar${m === 1 ? '' : 's'} but storm.durationsH has ${n}; every bar needs both a duration and a depth.`,
        );
      }
    }
    const method = doc['method'] as { kind?: unknown } | undefined;
    const observed = doc['observed'] as { parameter?: unknown } | null | undefined;
    if (method && isLossKind(method.kind) && observed && typeof observed.parameter === 'string') {
      const keys = fittableParameters(method.kind);
      if (!keys.includes(observed.parameter)) {
        add(
          ['observed', 'parameter'],
          `${describeValue(observed.parameter)} is not a parameter of the active method "${method.kind}" ` +
            `(it can fit ${keys.join(', ') || 'nothing'}).`,
        );
      }
    }
    const hydrograph = doc['hydrograph'] as { transform?: unknown; fitParameter?: unknown } | undefined;
    const transformKind = (hydrograph?.transform as { kind?: unknown } | null | undefined)?.kind;
    if (isTransformKind(transformKind) && typeof hydrograph?.fitParameter === 'string') {
      const keys = fittableTransformKeys(transformKind);
      if (!keys.includes(hydrograph.fitParameter)) {
        add(
          ['hydrograph', 'fitParameter'],
          `${describeValue(hydrograph.fitParameter)} is not a parameter of the transform "${transformKind}" ` +
            `that can be fitted (it can fit ${keys.join(', ') || 'nothing'}; or null).`,
        );
      }
    }
    checkStreamflow(doc, add);
    checkEventSet(doc, add, !dataset.issues && dataset.typed);
    if (!dataset.issues && dataset.typed) {
      try {
        validateStorm(dataset.value.storm);
      } catch (error) {
        const message = error instanceof Error ? error.message : String(error);
        const keys: PathKey[] = ['storm'];
        if (isInputError(error)) {
          keys.push(error.field);
          if (error.index !== undefined) keys.push(error.index);
        }
        add(keys, message);
      }
    }
  },
);

/** The valibot schema of the current scenario version (after migration). */
const ScenarioSchema = v.pipe(
  v.custom<Record<string, unknown>>(isRecord, must('a scenario: a JSON object')),
  v.object(DocumentEntries, must('a scenario: a JSON object')),
  crossFieldChecks,
);

// The schema's output must be a Scenario: `validateCurrent` returns it as one,
// so this file stops compiling if types.ts and the schema drift apart.

/**
 * Fields the document has but the format does not: reported rather than
 * dropped, so that saving again never loses something silently.
 */
function unknownFields(doc: RawDocument): Problem[] {
  const found: Problem[] = [];
  const visit = (value: unknown, keys: readonly PathKey[], known: readonly string[], where: string): void => {
    if (value === null || typeof value !== 'object' || Array.isArray(value)) return;
    for (const key of Object.keys(value)) {
      if (!known.includes(key)) found.push(problemAt([...keys, key], `is not a field of ${where}.`));
    }
  };
  visit(doc, [], Object.keys(DocumentEntries), `a version ${CURRENT_SCENARIO_VERSION} scenario`);
  visit(doc['storm'], ['storm'], Object.keys(StormEntries), 'the storm');
  visit(doc['catchment'], ['catchment'], Object.keys(CatchmentEntries), 'the catchment');
  visit(doc['observed'], ['observed'], Object.keys(ObservedEntries), 'the observed runoff');
  visit(doc['streamflow'], ['streamflow'], Object.keys(StreamflowEntries), 'the streamflow record');
  visit(doc['hydrograph'], ['hydrograph'], Object.keys(HydrographEntries), 'the runoff hydrograph settings');
  const set = doc['eventSet'];
  visit(set, ['eventSet'], Object.keys(EventSetEntries), 'the event set');
  const events = isRecord(set) && Array.isArray(set['events']) ? (set['events'] as unknown[]) : [];
  events.forEach((event, k) => {
    const at: PathKey[] = ['eventSet', 'events', k];
    visit(event, at, Object.keys(EventEntries), `event ${k + 1}`);
    if (!isRecord(event)) return;
    visit(event['storm'], [...at, 'storm'], Object.keys(StormEntries), `the storm of event ${k + 1}`);
    visit(
      event['observed'],
      [...at, 'observed'],
      Object.keys(EventObservedEntries),
      `the observed runoff of event ${k + 1}`,
    );
    visit(
      event['streamflow'],
      [...at, 'streamflow'],
      Object.keys(StreamflowEntries),
      `the streamflow record of event ${k + 1}`,
    );
  });
  return found;
}

function keysOf(issue: v.BaseIssue<unknown>): PathKey[] {
  return (issue.path ?? []).map((item) => (typeof item.key === 'number' ? item.key : String(item.key)));
}

function toProblem(issue: v.BaseIssue<unknown>): Problem {
  const keys = keysOf(issue);
  const last = issue.path?.[issue.path.length - 1];
  if (issue.type === 'object' && last?.origin === 'key') {
    const help = FIELD_HELP[keys.join('.')];
    return problemAt(keys, help ? `is missing (${help}).` : 'is missing.');
  }
  return problemAt(keys, issue.message);
}

/** Validates a document that is already at the current version. */
function validateCurrent(doc: RawDocument): ScenarioResult {
  const result = v.safeParse(ScenarioSchema, doc);
  const problems = [...(result.success ? [] : result.issues.map(toProblem)), ...unknownFields(doc)];
  if (result.success && problems.length === 0) return { ok: true, scenario: result.output };
  return failure(capProblems(problems));
}

/**
 * Reads a scenario document from any way in (link, file, browser storage,
 * the store): upgrades older versions, then validates every field. Never
 * throws; every problem names its field path.
 */
export function parseScenario(input: unknown): ScenarioResult {
  if (input === null || typeof input !== 'object' || Array.isArray(input)) {
    return failure([
      problem(
        `A scenario must be a JSON object with a version, a storm and a loss method (got ${describeValue(input)}).`,
      ),
    ]);
  }
  const migrated = migrate(input as RawDocument);
  if (!migrated.ok) return failure(migrated.problems);
  return validateCurrent(migrated.doc);
}
