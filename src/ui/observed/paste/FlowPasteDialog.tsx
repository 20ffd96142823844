import { useMemo } from 'react';
import {
  applyFlowImport,
  guessFlowSettings,
  previewFlowImport,
  type FlowImportSettings,
  type FlowRecord,
} from '../../../io';
import { attempt } from '../../../core';
import { useActions, useScenario, withStreamflowRecord } from '../../../store';
import { formatCount } from '../../format';
import { ImportDialog, type ImportDraft, type ImportKind } from '../../import-kit';
import { currentNumberFormat } from '../../number-format';
import { dischargeText } from '../discharge';
import { hoursText } from '../time-text';
import { FlowPreview } from './FlowPreview';
import { FlowSettings, type FlowSettingsPatch } from './FlowSettings';

/** What the dialog opens on (a file's text, or nothing). */
export type FlowDraft = ImportDraft<FlowSettingsPatch>;

function recordOf(text: string, settings: FlowImportSettings): FlowRecord | null {
  const result = applyFlowImport(text, settings, currentNumberFormat());
  return result.ok ? result.record : null;
}

const FLOW_KIND: Omit<ImportKind<FlowImportSettings, FlowRecord>, 'reader'> = {
  words: {
    title: 'Paste streamflow',
    intro:
      'Paste a gauge record of the event from a spreadsheet or a text file: a time and a discharge on each line (or discharges alone at a fixed step), in m³/s, L/s or ft³/s. Steps may differ. Check what was understood, correct any guess, then use the record.',
    textLabel: 'Streamflow text',
    placeholder: '2026-07-14 14:00\t0.42\n2026-07-14 14:15\t0.47\n2026-07-14 14:30\t0.95',
    fileInputLabel: 'Streamflow file to read',
    fileWhat: 'the streamflow record',
    acceptLabel: 'Use this record',
  },
  className: 'paste flow-paste',
  // Read in the reader's number format at call time (the views redraw when it changes).
  guess: (text) => guessFlowSettings(text, { numberFormat: currentNumberFormat() }),
  preview: (text, settings) => previewFlowImport(text, settings, currentNumberFormat()),
  apply: recordOf,
  Settings: FlowSettings,
  // The shared problem table names settings as the rainfall paste calls them; these read as this paste's own controls.
  problemWords: {
    valueColumn: 'Discharge column',
    unit: 'Discharge unit',
  },
};

export interface FlowPasteDialogProps {
  readonly initial: FlowDraft;
  /** Called on cancel and after the record is used. */
  readonly onClose: () => void;
}

/**
 * Paste or open a streamflow record, see what was understood, correct any
 * guess, and only then set the record ("Use this record": one undoable
 * edit). The record on screen is untouched until then; cancelling changes
 * nothing.
 */
export function FlowPasteDialog({ initial, onClose }: FlowPasteDialogProps) {
  const actions = useActions();
  const current = useScenario((s) => s.streamflow);
  const units = useScenario((s) => s.units);
  // Long records are read in a worker, which is told the number format rather than reading it from the page.
  const kind = useMemo(
    (): ImportKind<FlowImportSettings, FlowRecord> => ({
      ...FLOW_KIND,
      reader: { name: 'flow', context: { numberFormat: currentNumberFormat(), units } },
    }),
    [units],
  );

  const currentText = current
    ? (() => {
        const n = current.timesH.length;
        const span = (current.timesH[n - 1] as number) - (current.timesH[0] as number);
        let peak = 0;
        for (const q of current.dischargeM3s) if (q > peak) peak = q;
        return `Replaces the record now on screen (${formatCount(n)} samples over ${hoursText(span)}, peak ${dischargeText(peak, units)}); Undo brings it back.`;
      })()
    : 'Adds the record under the hyetograph; Undo takes it away.';

  return (
    <ImportDialog
      kind={kind}
      initial={initial}
      onClose={onClose}
      renderPreview={(record) => <FlowPreview record={record} units={units} />}
      keepText={currentText}
      onUse={(record, fileName) => {
        const r = attempt(() =>
          actions.edit(fileName ? `Open streamflow file ${fileName}` : 'Paste streamflow', (s) =>
            withStreamflowRecord(s, record),
          ),
        );
        // The import layer checks what the core checks; should they ever differ, say so and keep the dialog.
        return r.ok ? null : `The record could not be used: ${r.error.message}`;
      }}
    />
  );
}
