import {
  alternatingBlockStorm,
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

/** The plausible range each field's number falls in (src/io/plausible.ts); the core bounds the rest (a, b, c, peak). */
const RANGES: Partial<Record<FormField, TypedQuantity>> = {
  depthMm: { quantity: 'depth', unit: 'mm' },
  scaleMm: { quantity: 'depth', unit: 'mm' },
  durationMin: { quantity: 'stormDuration', ...MINUTES },
  stepMin: { quantity: 'barDuration', ...MINUTES },
};

function num(form: DesignForm, field: FormField): number {
  const parsed = readTyped(form[field] as string, RANGES[field]);
  if (!parsed.ok) throw new FieldProblem(field, `${FIELD_LABELS[field]}: ${parsed.message}`);
  return parsed.value;
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
  try {
    const durationH = num(form, 'durationMin') / 60;
    const stepH = num(form, 'stepMin') / 60;
    let storm: Storm;
    let description: string;
    if (form.shape === 'uniform') {
      storm = uniformStorm({ depthMm: num(form, 'depthMm'), durationH, stepH });
      description = `Uniform storm of ${form.depthMm} mm over ${form.durationMin} min`;
    } else {
      const units = { durationUnit: form.durationUnit, intensityUnit: form.intensityUnit };
      const idf: Idf =
        form.shape === 'table'
          ? { kind: 'table', ...units, ...parseIdfTable(form.tableText) }
          : { kind: form.formula, ...units, a: num(form, 'a'), b: num(form, 'b'), c: num(form, 'c') };
      storm = alternatingBlockStorm({ idf, durationH, stepH, peakFraction: num(form, 'peak') });
      description = `Alternating block storm, ${form.durationMin} min in ${form.stepMin} min steps, from the IDF ${form.shape === 'table' ? 'table' : form.formula}`;
    }
    const tooDeep = stormDepthRefusal(storm, 'si');
    if (tooDeep) {
      throw new FieldProblem(
        form.shape === 'uniform' ? 'depthMm' : form.shape === 'table' ? 'tableText' : 'a',
        tooDeep,
      );
    }
    if (form.scale) {
      const to = num(form, 'scaleMm');
      try {
        storm = scaleStormToDepth(storm, to);
      } catch (error) {
        if (isInputError(error)) throw new FieldProblem('scaleMm', `${FIELD_LABELS.scaleMm}: ${error.message}`);
        throw error;
      }
      description += `, scaled to ${form.scaleMm} mm`;
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
