import { useMemo } from 'react';
import { isInputError, totalDepthMm } from '../../../core';
import {
  applyRainImport,
  guessForScreen,
  previewRainImport,
  type ImportedStorm,
  type RainImportSettings,
} from '../../../io';
import { useActions, useScenario, useWorkbenchStore } from '../../../store';
import { placeImportedStorm, PLACE_IN_STEPS_FROM } from '../../../store/place-storm';
import { formatCount, formatValue } from '../../format';
import { currentNumberFormat } from '../../number-format';
import { ImportDialog, type ImportDraft, type ImportKind, type ImportWords } from '../../import-kit';
import { displayUnit, toDisplay, unitText } from '../../units';
import { ImportSettings, type SettingsPatch } from './ImportSettings';
import { PreviewBars } from './PreviewBars';
import { useReplaceConsequences } from '../../rainfall/active-event';

/** What the dialog opens on (a file's text, or nothing). */
export type PasteDraft = ImportDraft<SettingsPatch>;

export interface PasteDialogProps {
  readonly initial: PasteDraft;
  /** Called on cancel and after the bars are used. */
  readonly onClose: () => void;
}

const RAIN_WORDS: ImportWords = {
  title: 'Paste rainfall',
  intro:
    'Paste from a spreadsheet or a text file: one column of values, or a time and a value on each line. Check what was understood, correct any guess, then use the bars.',
  textLabel: 'Rainfall text',
  placeholder: '10:10\t1.2\n10:20\t2.4\n10:30\t3.1',
  fileInputLabel: 'Text file to read',
  fileWhat: 'the rainfall',
  acceptLabel: 'Use these bars',
};

/** The core's refusal of a storm placed in steps, in words for the dialog (anything else is a fault, thrown on). */
function refusal(error: unknown): string {
  if (isInputError(error)) return error.message;
  throw error;
}

function stormOf(text: string, settings: RainImportSettings): ImportedStorm | null {
  const result = applyRainImport(text, settings, currentNumberFormat());
  return result.ok ? result.storm : null;
}

/**
 * Paste or open rainfall, see what was understood, correct any guess, and
 * only then replace the storm ("Use these bars": one undoable edit). The
 * storm on screen is untouched until then; cancelling changes nothing.
 */
export function PasteDialog({ initial, onClose }: PasteDialogProps) {
  const actions = useActions();
  const store = useWorkbenchStore();
  const storm = useScenario((s) => s.storm);
  const units = useScenario((s) => s.units);
  // Without times in the text, bars are guessed to be as long as the storm's on screen.
  const stepMinutes = useScenario((s) =>
    s.storm.durationsH.length > 0 ? (s.storm.durationsH[0] as number) * 60 : undefined,
  );
  // The guesses follow the screen's units, number format and step (see guessForScreen), so the kind changes with them.
  const kind: ImportKind<RainImportSettings, ImportedStorm> = useMemo(() => {
    const format = currentNumberFormat();
    return {
      words: RAIN_WORDS,
      className: 'paste',
      guess: (text) => guessForScreen(text, units, { numberFormat: format, stepMinutes }),
      preview: (text, settings) => previewRainImport(text, settings, format),
      apply: stormOf,
      Settings: ImportSettings,
      reader: { name: 'rain', context: { numberFormat: format, units, stepMinutes } },
    };
  }, [units, stepMinutes]);

  const consequences = useReplaceConsequences();
  const depthUnit = displayUnit('depth', units);
  const current = storm.depthsMm.length;
  const currentText = `${formatCount(current)} bar${current === 1 ? '' : 's'}, ${formatValue(toDisplay('depth', totalDepthMm(storm), units))} ${unitText(depthUnit)}`;

  return (
    <ImportDialog
      kind={kind}
      initial={initial}
      onClose={onClose}
      renderPreview={(imported) => <PreviewBars storm={imported} units={units} />}
      keepText={`Replaces the storm now on screen (${currentText}); Undo brings it back.${consequences ? ` ${consequences}` : ''}`}
      onUse={(imported, fileName) => {
        const label = fileName ? `Open rainfall file ${fileName}` : 'Paste rainfall';
        // A long storm is copied and checked in steps before the edit, the page answering meanwhile (issue 11).
        if (imported.depthsMm.length >= PLACE_IN_STEPS_FROM) {
          return placeImportedStorm(store, imported, label, onClose).then(
            () => null,
            (error: unknown) => refusal(error),
          );
        }
        actions.setImportedStorm(imported, label);
        return null;
      }}
    />
  );
}
