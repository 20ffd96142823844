import { useDeferredValue, useId, useMemo, useRef, useState } from 'react';
import { totalDepthMm } from '../../../core';
import { applyRainImport, previewRainImport, type RainImportSettings } from '../../../io';
import { useActions, useScenario } from '../../../store';
import { formatValue } from '../../format';
import { displayUnit, toDisplay, unitText } from '../../units';
import { Modal } from '../Modal';
import { guessForScreen } from './guess';
import { ImportSettings, type SettingsPatch } from './ImportSettings';
import { PreviewBars } from './PreviewBars';
import { ProblemTable } from './ProblemTable';
import { readTextFile } from './read-file';

/** What the dialog holds: kept when it is cancelled, so reopening shows the same text and corrections. */
export interface PasteDraft {
  readonly text: string;
  /** The file the text came from, or null for pasted text. */
  readonly fileName: string | null;
  /** The guesses the user corrected; every other setting is guessed afresh from the text. */
  readonly corrections: SettingsPatch;
}

export const EMPTY_DRAFT: PasteDraft = { text: '', fileName: null, corrections: {} };

export interface PasteDialogProps {
  readonly initial: PasteDraft;
  /** Called on cancel with what to keep, and on accept with null. */
  readonly onClose: (keep: PasteDraft | null) => void;
}

/**
 * Paste or open rainfall, see what was understood, correct any guess, and
 * only then replace the storm ("Use these bars": one undoable edit). The
 * storm on screen is untouched until then; cancelling changes nothing.
 */
export function PasteDialog({ initial, onClose }: PasteDialogProps) {
  const id = useId();
  const titleId = `${id}-title`;
  const actions = useActions();
  const storm = useScenario((s) => s.storm);
  const units = useScenario((s) => s.units);
  const [text, setText] = useState(initial.text);
  const [fileName, setFileName] = useState(initial.fileName);
  const [corrections, setCorrections] = useState<SettingsPatch>(initial.corrections);
  const [fileMessage, setFileMessage] = useState<string | null>(null);
  const textRef = useRef<HTMLTextAreaElement | null>(null);
  const fileRef = useRef<HTMLInputElement | null>(null);

  // Reading a long record takes a moment: the text area stays responsive and the preview follows.
  const shownText = useDeferredValue(text);
  const stale = shownText !== text;
  const empty = shownText.trim() === '';
  const guessed = useMemo(() => guessForScreen(shownText, units), [shownText, units]);
  const settings: RainImportSettings = useMemo(() => ({ ...guessed, ...corrections }), [guessed, corrections]);
  const preview = useMemo(() => (empty ? null : previewRainImport(shownText, settings)), [empty, shownText, settings]);
  const result = useMemo(
    () => (preview !== null && preview.problems.length === 0 ? applyRainImport(shownText, settings) : null),
    [preview, shownText, settings],
  );
  const imported = result?.ok ? result.storm : null;

  const depthUnit = displayUnit('depth', units);
  const current = storm.depthsMm.length;
  const currentText = `${current} bar${current === 1 ? '' : 's'}, ${formatValue(toDisplay('depth', totalDepthMm(storm), units))} ${unitText(depthUnit)}`;

  const correct = (patch: SettingsPatch): void => setCorrections((c) => ({ ...c, ...patch }));
  const cancel = (): void => onClose({ text, fileName, corrections });
  const accept = (): void => {
    if (!imported || stale) return;
    actions.setStorm(imported, fileName ? `Open rainfall file ${fileName}` : 'Paste rainfall');
    onClose(null);
  };

  const openFile = async (file: File | undefined): Promise<void> => {
    if (!file) return;
    const read = await readTextFile(file);
    if (!read.ok) {
      setFileMessage(read.message);
      return;
    }
    setFileMessage(null);
    setText(read.text);
    setFileName(read.name);
    setCorrections({});
  };

  return (
    <Modal labelledBy={titleId} describedBy={`${id}-intro`} onClose={cancel} initialFocus={textRef} className="paste">
      <div className="paste__head">
        <h2 id={titleId}>Paste rainfall</h2>
        <p id={`${id}-intro`} className="paste__intro">
          Paste from a spreadsheet or a text file: one column of values, or a time and a value on each line. Check what
          was understood, correct any guess, then use the bars.
        </p>
      </div>
      <div className="paste__body">
        <div className="paste__source">
          <div className="field">
            <label htmlFor={`${id}-text`}>Rainfall text</label>
            <textarea
              id={`${id}-text`}
              ref={textRef}
              className="paste__text"
              value={text}
              spellCheck={false}
              autoComplete="off"
              wrap="off"
              rows={14}
              placeholder={'10:10\t1.2\n10:20\t2.4\n10:30\t3.1'}
              aria-describedby={`${id}-summary`}
              onChange={(e) => {
                const next = e.currentTarget.value;
                if (text.trim() === '') setCorrections({});
                setText(next);
                if (fileName !== null && next.trim() === '') setFileName(null);
              }}
            />
          </div>
          <div className="paste__file">
            <button type="button" onClick={() => fileRef.current?.click()}>
              Open a file…
            </button>
            <input
              ref={fileRef}
              type="file"
              accept=".csv,.txt,.tsv,.dat,text/csv,text/plain"
              className="visually-hidden"
              tabIndex={-1}
              aria-label="Text file to read"
              onChange={(e) => {
                const input = e.currentTarget;
                void openFile(input.files?.[0]).finally(() => {
                  input.value = '';
                });
              }}
            />
            <span className="paste__file-name">{fileName ? `Read from ${fileName}` : ''}</span>
          </div>
          {fileMessage ? (
            <p className="paste__file-msg" role="alert">
              {fileMessage}
            </p>
          ) : null}
        </div>

        <div className="paste__check">
          <section className="paste__understood" aria-labelledby={`${id}-understood`}>
            <h3 id={`${id}-understood`}>What was understood</h3>
            <p
              id={`${id}-summary`}
              className={`paste__summary${preview && preview.problems.length > 0 ? ' paste__summary--bad' : ''}`}
              role="status"
            >
              {empty ? 'Nothing pasted yet.' : stale || preview === null ? 'Reading…' : preview.summary}
            </p>
            {imported && !stale ? <PreviewBars storm={imported} units={units} /> : null}
            {preview && preview.problems.length > 0 ? <ProblemTable problems={preview.problems} /> : null}
          </section>
          {!empty ? (
            <section className="paste__settings" aria-labelledby={`${id}-settings`}>
              <div className="paste__settings-head">
                <h3 id={`${id}-settings`}>Guesses to check</h3>
                {Object.keys(corrections).length > 0 ? (
                  <button type="button" className="button--small" onClick={() => setCorrections({})}>
                    Guess again
                  </button>
                ) : null}
              </div>
              <ImportSettings
                settings={settings}
                header={preview?.header ?? null}
                columnCount={preview?.columnCount ?? 0}
                rows={preview?.rows ?? []}
                onChange={correct}
              />
            </section>
          ) : null}
        </div>
      </div>
      <div className="paste__foot">
        <p className="paste__keep">
          Replaces the storm now on screen ({currentText}); Undo brings it back.
        </p>
        <button type="button" onClick={cancel}>
          Cancel
        </button>
        <button type="button" className="button--primary" onClick={accept} disabled={!imported || stale}>
          Use these bars
        </button>
      </div>
    </Modal>
  );
}
