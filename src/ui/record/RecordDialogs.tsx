import { useMemo } from 'react';
import type { UnitSystem } from '../../core';
import {
  applyFlowImport,
  applyRainImport,
  guessFlowSettings,
  previewFlowImport,
  previewRainImport,
  type FlowImportSettings,
  type FlowRecord,
  type ImportedStorm,
  type RainImportSettings,
} from '../../io';
import { ImportDialog, type ImportDraft, type ImportKind } from '../import-kit';
import { currentNumberFormat } from '../number-format';
import { FlowPreview } from '../observed/paste/FlowPreview';
import { FlowSettings } from '../observed/paste/FlowSettings';
import { guessForScreen } from '../../io/screen-guess';
import { ImportSettings } from '../storm-input/paste/ImportSettings';
import { PreviewBars } from '../storm-input/paste/PreviewBars';

// The import kit's dialog with the rainfall and streamflow imports' own
// guessing, preview and settings; only the words and what "use" does differ:
// the record is held by the view, not put on the workbench.

interface DialogProps<S, R> {
  readonly initial: ImportDraft<Partial<S>>;
  readonly units: UnitSystem;
  readonly onClose: () => void;
  /** Takes the record read; returns why it cannot be used, or null. */
  readonly onUse: (imported: R, fileName: string | null) => string | null;
  /** What using it replaces, in a sentence. */
  readonly keepText: string;
}

/** Paste or open a long rainfall record (a month or a year of gauge bars). */
export function RainRecordDialog({
  initial,
  units,
  onClose,
  onUse,
  keepText,
}: DialogProps<RainImportSettings, ImportedStorm>) {
  const kind: ImportKind<RainImportSettings, ImportedStorm> = useMemo(() => {
    const format = currentNumberFormat();
    return {
      words: {
        title: 'Paste a long rainfall record',
        intro:
          'Paste a gauge record from a spreadsheet or a text file: a time and a rainfall depth on each line, or depths alone at a fixed step. Check what was understood, then cut it into events.',
        textLabel: 'Rainfall record text',
        placeholder: '2026-03-01 00:00\t0\n2026-03-01 00:05\t0.2\n2026-03-01 00:10\t0.6',
        fileInputLabel: 'Rainfall record file to read',
        fileWhat: 'the rainfall record',
        acceptLabel: 'Use this record',
      },
      className: 'paste',
      guess: (text) => guessForScreen(text, units, { numberFormat: format }),
      preview: (text, settings) => previewRainImport(text, settings, format),
      apply: (text, settings) => {
        const result = applyRainImport(text, settings, format);
        return result.ok ? result.storm : null;
      },
      Settings: ImportSettings,
      // A year of 5-minute bars is read in a Web Worker, as the workbench's rainfall import is.
      reader: { name: 'rain', context: { numberFormat: format, units } },
    };
  }, [units]);
  return (
    <ImportDialog
      kind={kind}
      initial={initial}
      onClose={onClose}
      renderPreview={(storm) => <PreviewBars storm={storm} units={units} />}
      keepText={keepText}
      onUse={onUse}
    />
  );
}

/** Paste or open a streamflow record over the same period as the rainfall record. */
export function FlowRecordDialog({
  initial,
  units,
  onClose,
  onUse,
  keepText,
}: DialogProps<FlowImportSettings, FlowRecord>) {
  const kind: ImportKind<FlowImportSettings, FlowRecord> = useMemo(() => {
    const format = currentNumberFormat();
    return {
      words: {
        title: 'Paste a long streamflow record',
        intro:
          'Paste the stream gauge record over the same period as the rainfall: a time and a discharge on each line (or discharges alone at a fixed step), in m³/s, L/s or ft³/s. Each event takes its part of it.',
        textLabel: 'Streamflow record text',
        placeholder: '2026-03-01 00:00\t0.42\n2026-03-01 00:15\t0.47\n2026-03-01 00:30\t0.95',
        fileInputLabel: 'Streamflow record file to read',
        fileWhat: 'the streamflow record',
        acceptLabel: 'Use this record',
      },
      className: 'paste flow-paste',
      guess: (text) => guessFlowSettings(text, { numberFormat: format }),
      preview: (text, settings) => previewFlowImport(text, settings, format),
      apply: (text, settings) => {
        const result = applyFlowImport(text, settings, format);
        return result.ok ? result.record : null;
      },
      Settings: FlowSettings,
      problemWords: { valueColumn: 'Discharge column', unit: 'Discharge unit' },
      // Long records are read in a worker, told the number format rather than reading it from the page.
      reader: { name: 'flow', context: { numberFormat: format, units } },
    };
  }, [units]);
  return (
    <ImportDialog
      kind={kind}
      initial={initial}
      onClose={onClose}
      renderPreview={(record) => <FlowPreview record={record} units={units} />}
      keepText={keepText}
      onUse={onUse}
    />
  );
}
