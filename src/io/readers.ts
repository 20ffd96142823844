import type { UnitSystem } from '../core';
import {
  readFlowImport,
  readPlainFlow,
  guessFlowSettings,
  type FlowColumns,
  type FlowImportSettings,
  type FlowRecord,
} from './flow-import';
import type { NumberFormat } from './number-format';
import type { ImportProblem } from './problems';
import {
  readPlainRain,
  readRainImport,
  type ImportedStorm,
  type RainImportSettings,
  type StormColumns,
} from './rain-import';
import { guessForScreen } from './screen-guess';
import type { SeriesSettings } from './series';
import type { TextRow } from './table-text';

/**
 * The text imports by name, for a reader that cannot be handed functions: a
 * Web Worker gets the name and a plain context, reads the text with the
 * same functions the dialog uses for short texts, and sends back plain data.
 */
export type ReaderName = 'rain' | 'flow';

/** What the screen knows that a reader needs; plain data, so it crosses to a worker as is. */
export interface ReaderContext {
  readonly numberFormat: NumberFormat;
  readonly units: UnitSystem;
  /** The storm on screen's step, minutes, when there is one (rainfall only). */
  readonly stepMinutes?: number | undefined;
}

/** What one read of a text says: the settings used, the preview, and what the text became (null when it cannot be used). */
export interface ReadOutcome<S extends SeriesSettings = SeriesSettings, R = unknown> {
  readonly settings: S;
  readonly summary: string;
  readonly header: readonly string[] | null;
  /** The first rows as split (PREVIEW_ROWS at most): the settings panel shows them. */
  readonly rows: readonly TextRow[];
  readonly rowCount: number;
  readonly columnCount: number;
  readonly problems: readonly ImportProblem[];
  readonly imported: R | null;
}

/** Rows of the split table a read sends back: the settings panel reads the first filled one, people the first few. */
export const PREVIEW_ROWS = 50;

export interface Reader<S extends SeriesSettings, R> {
  readonly guess: (text: string, context: ReaderContext) => S;
  readonly read: (text: string, settings: S, context: ReaderContext) => ReadOutcome<S, R>;
}

function outcome<S extends SeriesSettings, R>(
  settings: S,
  preview: {
    readonly summary: string;
    readonly header: readonly string[] | null;
    readonly rows: readonly TextRow[];
    readonly columnCount: number;
    readonly problems: readonly ImportProblem[];
  },
  imported: R | null,
): ReadOutcome<S, R> {
  return {
    settings,
    summary: preview.summary,
    header: preview.header,
    rows: preview.rows.slice(0, PREVIEW_ROWS),
    rowCount: preview.rows.length,
    columnCount: preview.columnCount,
    problems: preview.problems,
    imported,
  };
}

/**
 * A long plain record comes back in columns of doubles (handed from a
 * worker to the page without a copy); the page makes them plain arrays
 * (src/ui/import-kit/reader-messages.ts, unpackColumns).
 */
export const RAIN_READER: Reader<RainImportSettings, ImportedStorm | StormColumns> = {
  guess: (text, context) =>
    guessForScreen(text, context.units, { numberFormat: context.numberFormat, stepMinutes: context.stepMinutes }),
  read: (text, settings, context) => {
    // A long plain record is read by columns; any other text, or any problem, by the general reader.
    const plain = readPlainRain(text, settings, context.numberFormat, PREVIEW_ROWS);
    if (plain !== null) {
      const { storm, rows, ...rest } = plain;
      return { settings, ...rest, rows: rows.slice(0, PREVIEW_ROWS), problems: [], imported: storm };
    }
    const { preview, result } = readRainImport(text, settings, context.numberFormat);
    return outcome(settings, preview, result.ok ? result.storm : null);
  },
};

export const FLOW_READER: Reader<FlowImportSettings, FlowRecord | FlowColumns> = {
  guess: (text, context) => guessFlowSettings(text, { numberFormat: context.numberFormat }),
  read: (text, settings, context) => {
    // As for rainfall: a long plain record by columns; any other text, or any problem, by the general reader.
    const plain = readPlainFlow(text, settings, context.numberFormat, PREVIEW_ROWS);
    if (plain !== null) {
      const { record, rows, ...rest } = plain;
      return { settings, ...rest, rows: rows.slice(0, PREVIEW_ROWS), problems: [], imported: record };
    }
    const { preview, result } = readFlowImport(text, settings, context.numberFormat);
    return outcome(settings, preview, result.ok ? result.record : null);
  },
};

export const READERS = { rain: RAIN_READER, flow: FLOW_READER } as const;
