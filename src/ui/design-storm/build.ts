import {
  alternatingBlockStorm,
  attempt,
  isInputError,
  scaleStormToDepth,
  uniformStorm,
  type Idf,
  type IdfDurationUnit,
  type RateUnit,
  type Storm,
} from '../../core';
import { readTyped, stormDepthRefusal, type TypedQuantity } from '../fields/read-typed';
import { currentNumberFormat } from '../number-format/preference';
import { parseNumber } from '../parse-number';
import { formatForField } from '../format';
import type { UnitSystem } from '../../core';

/** What the design storm form holds: text as typed, so nothing typed is ever lost. */
export interface DesignForm {
  readonly shape: 'formula' | 'table' | 'uniform';
  readonly formula: 'a/(t+b)^c' | 'a/(t^c+b)';
  readonly a: string;
  readonly b: string;
  readonly c: string;
  readonly tableText: string;
  readonly durationUnit: IdfDurationUnit;
  readonly intensityUnit: RateUnit;
  readonly durationMin: string;
  readonly stepMin: string;
  readonly peak: string;
  readonly depthMm: string;
  readonly scale: boolean;
  readonly scaleMm: string;
  /** The unit the storm depth and the scaled depth are typed in (mm when left out); follows the SI / US switch. */
  readonly depthUnit?: 'mm' | 'in';
}

/** Field ids of the form, and the name each one has on screen (used in messages). */
export const FIELD_LABELS = {
  a: 'a',
  b: 'b',
  c: 'c',
  tableText: 'IDF table',
  durationMin: 'Storm duration',
  stepMin: 'Time step',
  peak: 'Peak position',
  depthMm: 'Storm depth',
  scaleMm: 'Scaled total depth',
} as const;
export type FormField = keyof typeof FIELD_LABELS;

export type Built =
  | { readonly ok: true; readonly storm: Storm; readonly description: string }
  | { readonly ok: false; readonly field: FormField; readonly message: string };

class FieldProblem extends Error {
  constructor(
    readonly field: FormField,
    message: string,
  ) {
    super(message);
  }
}

const MINUTES = { toSI: (min: number) => min / 60, fromSI: (h: number) => h * 60, unit: 'min' } as const;

/** "A whole number of steps" to rounding, as the core judges it (core/design/steps.ts). */
const WHOLE_REL_TOL = 1e-9;

/**
 * The step against the duration, in the form's own minutes and as typed:
 * the core checks the same in hours (its unit), which a form in minutes
 * should not make the user convert ("2.083 h", "0.1167 h").
 */
function checkSteps(form: DesignForm, durationMin: number, stepMin: number): void {
  const duration = `${form.durationMin.trim()} min`;
  const step = `${form.stepMin.trim()} min`;
  if (stepMin > durationMin * (1 + WHOLE_REL_TOL)) {
    throw new FieldProblem(
      'stepMin',
      `${FIELD_LABELS.stepMin}: The time step (${step}) is longer than the storm (${duration}).`,
    );
  }
  const n = Math.round(durationMin / stepMin);
  if (Math.abs(n * stepMin - durationMin) > WHOLE_REL_TOL * durationMin) {
    throw new FieldProblem(
      'stepMin',
      `${FIELD_LABELS.stepMin}: The storm duration (${duration}) is not a whole number of time steps of ${step}; choose a step that divides it.`,
    );
  }
}

const MM_PER_IN = 25.4; // exact (NIST SP 811, 2008)
const DEPTH = {
  si: { quantity: 'depth', unit: 'mm' },
  us: {
    quantity: 'depth',
    unit: 'in',
    toSI: (inches: number) => inches * MM_PER_IN,
    fromSI: (mm: number) => mm / MM_PER_IN,
  },
} as const satisfies Record<UnitSystem, TypedQuantity>;

/** The depth unit the form's depth fields are typed in, by unit system. */
export const FORM_DEPTH_UNIT: Record<UnitSystem, 'mm' | 'in'> = { si: 'mm', us: 'in' };

/** The plausible range each field's number falls in (src/io/plausible.ts); the core bounds the rest (a, b, c, peak). */
function range(field: FormField, system: UnitSystem): TypedQuantity | undefined {
  if (field === 'depthMm' || field === 'scaleMm') return DEPTH[system];
  if (field === 'durationMin') return { quantity: 'stormDuration', ...MINUTES };
  if (field === 'stepMin') return { quantity: 'barDuration', ...MINUTES };
  return undefined;
}

/** A field's number, in SI for depths (mm) and as typed for the rest. */
function num(form: DesignForm, field: FormField, system: UnitSystem = 'si'): number {
  const what = range(field, system);
  const parsed = readTyped(form[field] as string, what);
  if (!parsed.ok) throw new FieldProblem(field, `${FIELD_LABELS[field]}: ${parsed.message}`);
  return (field === 'depthMm' || field === 'scaleMm') && what?.toSI ? what.toSI(parsed.value) : parsed.value;
}

/** Typed text re-expressed in another unit (`factor` new per old), or left as typed when it does not read as a number. */
function rescaled(text: string, factor: number): string {
  const parsed = parseNumber(text);
  return parsed.ok ? formatForField(parsed.value * factor) : text;
}

/**
 * The form re-expressed for another unit system, so it follows the SI / US switch: depths in mm or in, and
 * intensities in mm/h or in/h (the IDF formula's a, which i is proportional to, and each row of the table).
 * Durations stay in minutes or hours, as both systems write them.
 */
export function formInUnits(form: DesignForm, system: UnitSystem): DesignForm {
  const depthFactor = system === 'us' ? 1 / MM_PER_IN : MM_PER_IN;
  const wantRate: RateUnit = system === 'us' ? 'in/h' : 'mm/h';
  const rateFactor = form.intensityUnit === wantRate ? 1 : depthFactor;
  const depth = (form.depthUnit ?? 'mm') === FORM_DEPTH_UNIT[system] ? 1 : depthFactor;
  return {
    ...form,
    depthUnit: FORM_DEPTH_UNIT[system],
    depthMm: depth === 1 ? form.depthMm : rescaled(form.depthMm, depth),
    scaleMm: depth === 1 ? form.scaleMm : rescaled(form.scaleMm, depth),
    intensityUnit: wantRate,
    a: rateFactor === 1 ? form.a : rescaled(form.a, rateFactor),
    tableText:
      rateFactor === 1
        ? form.tableText
        : form.tableText
            .split(/\r?\n/)
            .map((line) => {
              const m = /^(\s*\S+)(\s*[;\t]\s*|\s+)(\S+)\s*$/.exec(line);
              return m ? `${m[1]}${m[2]}${rescaled(m[3] as string, rateFactor)}` : line;
            })
            .join('\n'),
  };
}

/**
 * Reads "duration intensity" rows: a tab or a semicolon between the two
 * values, or else spaces (and a comma too, when the number format uses no
 * comma). Numbers are read in the reader's number format, so "1,440" under
 * 1,234.5 is a day in minutes; where the format groups with a space, put a
 * tab or a semicolon between the values.
 */
function parseIdfTable(text: string): { durations: number[]; intensities: number[] } {
  const durations: number[] = [];
  const intensities: number[] = [];
  const format = currentNumberFormat();
  const commaFree = format.decimal !== ',' && format.group !== ',';
  const between = commaFree ? /[\s,]+/ : /\s+/;
  const lines = text.split(/\r?\n/);
  lines.forEach((line, k) => {
    if (line.trim() === '') return;
    const cells = line.includes(';') || line.includes('\t') ? line.split(/[;\t]/) : line.trim().split(between);
    const parts = cells.map((c) => c.trim()).filter((c) => c !== '');
    if (parts.length !== 2) {
      throw new FieldProblem(
        'tableText',
        `IDF table, row ${k + 1}: needs two values, a duration and an intensity (found ${parts.length})` +
          (format.group === ' ' ? '; with spaces inside numbers, put a tab or a semicolon between the two.' : '.'),
      );
    }
    parts.forEach((cell, col) => {
      const parsed = parseNumber(cell);
      if (!parsed.ok) {
        throw new FieldProblem(
          'tableText',
          `IDF table, row ${k + 1}, column ${col + 1} (${col === 0 ? 'duration' : 'intensity'}): ${parsed.message}`,
        );
      }
      (col === 0 ? durations : intensities).push(parsed.value);
    });
  });
  return { durations, intensities };
}

// The core's field names (InputError.field) and the form field each belongs to.
const CORE_FIELDS: Readonly<Record<string, FormField>> = {
  a: 'a',
  b: 'b',
  c: 'c',
  durations: 'tableText',
  intensities: 'tableText',
  durationH: 'durationMin',
  stepH: 'stepMin',
  peakFraction: 'peak',
  depthMm: 'depthMm',
};

/**
 * Builds the design storm the form describes, by the core (alternatingBlockStorm,
 * uniformStorm, scaleStormToDepth). A problem names the form field, by its
 * label, and for a table the row and column.
 */
export function buildDesignStorm(form: DesignForm): Built {
  const system: UnitSystem = form.depthUnit === 'in' ? 'us' : 'si';
  try {
    const durationMin = num(form, 'durationMin');
    const stepMin = num(form, 'stepMin');
    checkSteps(form, durationMin, stepMin);
    const durationH = durationMin / 60;
    const stepH = stepMin / 60;
    let storm: Storm;
    let description: string;
    if (form.shape === 'uniform') {
      storm = uniformStorm({ depthMm: num(form, 'depthMm', system), durationH, stepH });
      description = `Uniform storm of ${form.depthMm} ${form.depthUnit ?? 'mm'} over ${form.durationMin} min`;
    } else {
      const units = { durationUnit: form.durationUnit, intensityUnit: form.intensityUnit };
      const idf: Idf =
        form.shape === 'table'
          ? { kind: 'table', ...units, ...parseIdfTable(form.tableText) }
          : { kind: form.formula, ...units, a: num(form, 'a'), b: num(form, 'b'), c: num(form, 'c') };
      storm = alternatingBlockStorm({ idf, durationH, stepH, peakFraction: num(form, 'peak') });
      description = `Alternating block storm, ${form.durationMin} min in ${form.stepMin} min steps, from the IDF ${form.shape === 'table' ? 'table' : form.formula}`;
    }
    const tooDeep = stormDepthRefusal(storm, system);
    if (tooDeep) {
      throw new FieldProblem(
        form.shape === 'uniform' ? 'depthMm' : form.shape === 'table' ? 'tableText' : 'a',
        tooDeep,
      );
    }
    if (form.scale) {
      const to = num(form, 'scaleMm', system);
      const scaled = attempt(() => scaleStormToDepth(storm, to));
      if (!scaled.ok) throw new FieldProblem('scaleMm', `${FIELD_LABELS.scaleMm}: ${scaled.error.message}`);
      storm = scaled.value;
      description += `, scaled to ${form.scaleMm} ${form.depthUnit ?? 'mm'}`;
    }
    return { ok: true, storm, description };
  } catch (error) {
    if (error instanceof FieldProblem) return { ok: false, field: error.field, message: error.message };
    if (isInputError(error)) {
      const field = CORE_FIELDS[error.field] ?? 'durationMin';
      return { ok: false, field, message: `${FIELD_LABELS[field]}: ${error.message}` };
    }
    throw error;
  }
}
