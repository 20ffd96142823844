import { useDeferredValue, useId, useMemo, useRef, useState } from 'react';
import { applyFlowImport, guessFlowSettings, previewFlowImport, type FlowImportSettings, type ImportProblem } from '../../../io';
import { isInputError } from '../../../core';
import { useActions, useScenario, withStreamflowRecord } from '../../../store';
import { Modal } from '../../storm-input/Modal';
import { ProblemTable } from '../../storm-input/paste/ProblemTable';
import { readTextFile } from '../../storm-input/paste/read-file';
import { dischargeText } from '../discharge';
import { hoursText } from '../time-text';
import { FlowPreview } from './FlowPreview';
import { FlowSettings, type FlowSettingsPatch } from './FlowSettings';

/** What the dialog holds: kept when it is cancelled, so reopening shows the same text and corrections. */
export interface FlowDraft {
  readonly text: string;
  /** The file the text came from, or null for pasted text. */
  readonly fileName: string | null;
  /** The guesses the user corrected; every other setting is guessed afresh from the text. */
  readonly corrections: FlowSettingsPatch;
}

export const EMPTY_FLOW_DRAFT: FlowDraft = { text: '', fileName: null, corrections: {} };

/**
 * The shared problem table names settings as the rainfall paste calls them;
 * these read as the streamflow paste's own controls.
 */
const FLOW_SETTING_WORDS: Readonly<Record<string, string>> = {
  valueColumn: 'Discharge column',
  unit: 'Discharge unit',
};

const inFlowWords = (problems: readonly ImportProblem[]): ImportProblem[] =>
  problems.map((p) => (FLOW_SETTING_WORDS[p.field] ? { ...p, field: FLOW_SETTING_WORDS[p.field] as string } : p));

export interface FlowPasteDialogProps {
  readonly initial: FlowDraft;
  /** Called on cancel with what to keep, and on accept with null. */
  readonly onClose: (keep: FlowDraft | null) => void;
}

/**
 * Paste or open a streamflow record, see what was understood, correct any
 * guess, and only then set the record ("Use this record": one undoable
 * edit). The record on screen is untouched until then; cancelling changes
 * nothing.
 */
export function FlowPasteDialog({ initial, onClose }: FlowPasteDialogProps) {
  const id = useId();
  const titleId = `${id}-title`;
  const actions = useActions();
  const current = useScenario((s) => s.streamflow);
  const units = useScenario((s) => s.units);
  const [text, setText] = useState(initial.text);
  const [fileName, setFileName] = useState(initial.fileName);
  const [corrections, setCorrections] = useState<FlowSettingsPatch>(initial.corrections);
  const [message, setMessage] = useState<string | null>(null);
  const textRef = useRef<HTMLTextAreaElement | null>(null);
  const fileRef = useRef<HTMLInputElement | null>(null);

  // Reading a long record takes a moment: the text area stays responsive and the preview follows.
  const shownText = useDeferredValue(text);
  const stale = shownText !== text;
  const empty = shownText.trim() === '';
  const guessed = useMemo(() => guessFlowSettings(shownText), [shownText]);
  const settings: FlowImportSettings = useMemo(() => ({ ...guessed, ...corrections }), [guessed, corrections]);
  const preview = useMemo(() => (empty ? null : previewFlowImport(shownText, settings)), [empty, shownText, settings]);
  const result = useMemo(
    () => (preview !== null && preview.problems.length === 0 ? applyFlowImport(shownText, settings) : null),
    [preview, shownText, settings],
  );
  const record = result?.ok ? result.record : null;

  const currentText = current
    ? (() => {
        const n = current.timesH.length;
        const span = (current.timesH[n - 1] as number) - (current.timesH[0] as number);
        let peak = 0;
        for (const q of current.dischargeM3s) if (q > peak) peak = q;
        return `Replaces the record now on screen (${n} samples over ${hoursText(span)}, peak ${dischargeText(peak, units)}); Undo brings it back.`;
      })()
    : 'Adds the record under the hyetograph; Undo takes it away.';

  const correct = (patch: FlowSettingsPatch): void => setCorrections((c) => ({ ...c, ...patch }));
  const cancel = (): void => onClose({ text, fileName, corrections });
  const accept = (): void => {
    if (!record || stale) return;
    try {
      actions.edit(fileName ? `Open streamflow file ${fileName}` : 'Paste streamflow', (s) => withStreamflowRecord(s, record));
    } catch (error) {
      // The import layer checks what the core checks; should they ever differ, say so and keep the dialog.
      if (!isInputError(error)) throw error;
      setMessage(`The record could not be used: ${error.message}`);
      return;
    }
    onClose(null);
  };

  const openFile = async (file: File | undefined): Promise<void> => {
    if (!file) return;
    const read = await readTextFile(file, 'the streamflow record');
    if (!read.ok) {
      setMessage(read.message);
      return;
    }
    setMessage(null);
    setText(read.text);
    setFileName(read.name);
    setCorrections({});
  };

  return (
    <Modal labelledBy={titleId} describedBy={`${id}-intro`} onClose={cancel} initialFocus={textRef} className="paste flow-paste">
      <div className="paste__head">
        <h2 id={titleId}>Paste streamflow</h2>
        <p id={`${id}-intro`} className="paste__intro">
          Paste a gauge record of the event from a spreadsheet or a text file: a time and a discharge on each line (or
          discharges alone at a fixed step), in m³/s, L/s or ft³/s. Steps may differ. Check what was understood,
          correct any guess, then use the record.
        </p>
      </div>
      <div className="paste__body">
        <div className="paste__source">
          <div className="field">
            <label htmlFor={`${id}-text`}>Streamflow text</label>
            <textarea
              id={`${id}-text`}
              ref={textRef}
              className="paste__text"
              value={text}
              spellCheck={false}
              autoComplete="off"
              wrap="off"
              rows={14}
              placeholder={'2026-07-14 14:00\t0.42\n2026-07-14 14:15\t0.47\n2026-07-14 14:30\t0.95'}
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
              aria-label="Streamflow file to read"
              onChange={(e) => {
                const input = e.currentTarget;
                void openFile(input.files?.[0]).finally(() => {
                  input.value = '';
                });
              }}
            />
            <span className="paste__file-name">{fileName ? `Read from ${fileName}` : ''}</span>
          </div>
          {message ? (
            <p className="paste__file-msg" role="alert">
              {message}
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
            {record && !stale ? <FlowPreview record={record} units={units} /> : null}
            {preview && preview.problems.length > 0 ? <ProblemTable problems={inFlowWords(preview.problems)} /> : null}
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
              <FlowSettings
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
        <p className="paste__keep">{currentText}</p>
        <button type="button" onClick={cancel}>
          Cancel
        </button>
        <button type="button" className="button--primary" onClick={accept} disabled={!record || stale}>
          Use this record
        </button>
      </div>
    </Modal>
  );
}
