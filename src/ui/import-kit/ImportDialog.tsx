import { useDeferredValue, useId, useMemo, useRef, useState, type ComponentType, type ReactNode } from 'react';
import type { ImportProblem, ReaderContext, ReaderName, SeriesSettings, TextRow } from '../../io';
import { Modal } from '../layout/Modal';
import { HeldText } from './HeldText';
import { OpenFileButton } from './OpenFileButton';
import { ReadProgress } from './ReadProgress';
import { useLongRead } from './use-long-read';
import { ProblemTable } from './ProblemTable';
import type { SettingsPanelProps } from './settings-panel';
import { isLongText } from './read-file';
import type { ReadSource } from './reader-messages';
import { useTextFile } from './use-text-file';

/** What an import dialog opens on: empty for a paste, a file's text for an opened file, or a long file unread. */
export interface ImportDraft<Patch> {
  readonly text: string;
  /** A long file held unread (text empty): its reader decodes it off the page's thread. */
  readonly file?: Blob | null;
  /** The file the text came from, or null for pasted text. */
  readonly fileName: string | null;
  /** The guesses the user corrected; every other setting is guessed afresh from the text. */
  readonly corrections: Patch;
}

/** What the io layer's preview of an import says, whatever is imported. */
export interface ImportPreview {
  readonly summary: string;
  readonly header: readonly string[] | null;
  readonly rows: readonly TextRow[];
  readonly columnCount: number;
  readonly problems: readonly ImportProblem[];
}

/** The words of one kind of import: what the dialog, its text area and its buttons say. */
export interface ImportWords {
  readonly title: string;
  readonly intro: string;
  readonly textLabel: string;
  readonly placeholder: string;
  /** Accessible name of the dialog's hidden file input. */
  readonly fileInputLabel: string;
  /** Names the record in file messages ("the rainfall"). */
  readonly fileWhat: string;
  readonly acceptLabel: string;
}

/** One kind of import (rainfall, streamflow): its words and how its text is guessed, previewed and read. */
export interface ImportKind<S extends SeriesSettings, R> {
  readonly words: ImportWords;
  readonly className: string;
  /** Kept stable between renders: the guesses are memoised on it. */
  readonly guess: (text: string) => S;
  readonly preview: (text: string, settings: S) => ImportPreview;
  /** What the text becomes, or null when it cannot be used. */
  readonly apply: (text: string, settings: S) => R | null;
  readonly Settings: ComponentType<SettingsPanelProps<S>>;
  /** How the problem table names this import's settings, where it differs from the default. */
  readonly problemWords?: Readonly<Record<string, string>>;
  /**
   * The same import by name, for long texts and files (isLongText, read-file.ts):
   * they are read in a Web Worker (src/io/readers.ts names the readers), so
   * the page keeps answering.
   */
  readonly reader: { readonly name: ReaderName; readonly context: ReaderContext };
}

export interface ImportDialogProps<S extends SeriesSettings, R> {
  readonly kind: ImportKind<S, R>;
  readonly initial: ImportDraft<Partial<S>>;
  /** Called on cancel and after a successful use; nothing of the dialog is kept. */
  readonly onClose: () => void;
  /** The preview of what the text became. */
  readonly renderPreview: (imported: R) => ReactNode;
  /** What accepting does to what is on screen, and how to undo it. */
  readonly keepText: string;
  /**
   * Applies the import as one undoable edit; returns why it could not, to show while the dialog stays open.
   * A promise when the edit is made in steps (a long import): the dialog says so and waits for it. The
   * caller then closes the dialog itself, in the task of its edit (a render between the two would read the
   * text again for the new screen), and the promise gives null; or it gives why it could not.
   */
  readonly onUse: (imported: R, fileName: string | null) => string | null | Promise<string | null>;
}

const inWords = (
  problems: readonly ImportProblem[],
  words: Readonly<Record<string, string>> | undefined,
): readonly ImportProblem[] =>
  words ? problems.map((p) => (words[p.field] ? { ...p, field: words[p.field] as string } : p)) : problems;

/**
 * Paste or open a record, see what was understood, correct any guess, and
 * only then use it (one undoable edit). What is on screen is untouched until
 * then; cancelling changes nothing and keeps nothing for the next opening.
 */
export function ImportDialog<S extends SeriesSettings, R>({
  kind,
  initial,
  onClose,
  renderPreview,
  keepText,
  onUse,
}: ImportDialogProps<S, R>) {
  const { words, guess, preview: previewOf, apply, Settings } = kind;
  const id = useId();
  const titleId = `${id}-title`;
  const [text, setText] = useState(initial.text);
  const [heldFile, setHeldFile] = useState<Blob | null>(initial.file ?? null);
  const [fileName, setFileName] = useState(initial.fileName);
  const [corrections, setCorrections] = useState<Partial<S>>(initial.corrections);
  const [note, setNote] = useState<string | null>(null);
  const [using, setUsing] = useState(false);
  const textRef = useRef<HTMLTextAreaElement | null>(null);
  const file = useTextFile(words.fileWhat, (chosen, name) => {
    setText(chosen.text);
    setHeldFile(chosen.file);
    setFileName(name);
    setCorrections({});
    setNote(null);
  });

  // A long text (megabytes) or file never goes into the text area, and is read off the page's thread.
  const what = words.fileWhat;
  const source: ReadSource | null = useMemo(
    () =>
      heldFile !== null ? { file: heldFile, name: fileName ?? 'the file', what } : isLongText(text) ? { text } : null,
    [heldFile, fileName, text, what],
  );
  const offThread = source !== null;
  const long = useLongRead<S, R>(source, kind.reader, corrections, (message) => letGo(null, message));

  // Reading a short record takes a moment: the text area stays responsive and the preview follows.
  const shownText = useDeferredValue(offThread ? '' : text);
  const stale = offThread ? long.state.phase !== 'done' : shownText !== text;
  const empty = offThread ? false : shownText.trim() === '';
  const guessed = useMemo(() => (offThread ? null : guess(shownText)), [guess, shownText, offThread]);
  const settings: S | null = useMemo(
    () =>
      offThread
        ? long.state.phase === 'done'
          ? long.state.outcome.settings
          : null
        : { ...(guessed as S), ...corrections },
    [offThread, long.state, guessed, corrections],
  );
  const syncPreview = useMemo(
    () => (offThread || empty || settings === null ? null : previewOf(shownText, settings)),
    [previewOf, offThread, empty, shownText, settings],
  );
  const syncImported = useMemo(
    () =>
      !offThread && syncPreview !== null && syncPreview.problems.length === 0 && settings !== null
        ? apply(shownText, settings)
        : null,
    [apply, offThread, syncPreview, shownText, settings],
  );
  const preview: ImportPreview | null = offThread
    ? long.state.phase === 'done'
      ? long.state.outcome
      : null
    : syncPreview;
  const imported: R | null = offThread
    ? long.state.phase === 'done' && long.state.outcome.problems.length === 0
      ? long.state.outcome.imported
      : null
    : syncImported;

  /** Drops the held text or file: the dialog is as it opened empty, ready for a paste; `refused` says why a file was not used. */
  const letGo = (why: string | null, refused: string | null = null): void => {
    setText('');
    setHeldFile(null);
    setFileName(null);
    setCorrections({});
    setNote(why);
    if (refused !== null) file.setMessage(refused);
  };

  const correct = (patch: Partial<S>): void => setCorrections((c) => ({ ...c, ...patch }));
  const stopReading = (): void => {
    long.stop();
    letGo('Reading stopped. Nothing was changed; paste or open the record again when you are ready.');
  };
  // Once the import is being put on the workbench it goes through: closing waits for it.
  const cancel = (): void => {
    if (!using) onClose();
  };
  const refuse = (refused: string | null): void => {
    if (refused === null) return;
    setUsing(false);
    file.setMessage(refused);
  };
  const accept = (): void => {
    if (imported === null || stale || using) return;
    const outcome = onUse(imported, fileName);
    if (outcome instanceof Promise) {
      setUsing(true);
      void outcome.then(refuse);
    } else if (outcome === null) onClose();
    else refuse(outcome);
  };

  return (
    <Modal
      labelledBy={titleId}
      describedBy={`${id}-intro`}
      onClose={cancel}
      initialFocus={textRef}
      className={kind.className}
    >
      <div className="paste__head">
        <h2 id={titleId}>{words.title}</h2>
        <p id={`${id}-intro`} className="paste__intro">
          {words.intro}
        </p>
      </div>
      <div className="paste__body">
        <div className="paste__source">
          {offThread ? (
            <HeldText summary={long.summary} label={words.textLabel} fileName={fileName} onClear={() => letGo(null)} />
          ) : (
            <div className="field">
              <label htmlFor={`${id}-text`}>{words.textLabel}</label>
              <textarea
                id={`${id}-text`}
                ref={textRef}
                className="paste__text"
                value={text}
                spellCheck={false}
                autoComplete="off"
                wrap="off"
                rows={14}
                placeholder={words.placeholder}
                aria-describedby={`${id}-summary`}
                onPaste={(e) => {
                  // Megabytes pasted into a text area hold the page for seconds: keep them beside it instead.
                  const pasted = e.clipboardData.getData('text/plain');
                  if (!isLongText(pasted)) return;
                  e.preventDefault();
                  setText(pasted);
                  setHeldFile(null);
                  setFileName(null);
                  setCorrections({});
                  setNote(null);
                }}
                onChange={(e) => {
                  const next = e.currentTarget.value;
                  if (text.trim() === '') setCorrections({});
                  setText(next);
                  setNote(null);
                  if (fileName !== null && next.trim() === '') setFileName(null);
                }}
              />
            </div>
          )}
          <div className="paste__file">
            <OpenFileButton inputLabel={words.fileInputLabel} onFile={file.open}>
              Open a file…
            </OpenFileButton>
            <span className="paste__file-name">{fileName ? `Read from ${fileName}` : ''}</span>
          </div>
          {file.message ? (
            <p className="paste__file-msg" role="alert">
              {file.message}
            </p>
          ) : null}
          {note ? <p className="paste__note">{note}</p> : null}
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
            {offThread && long.state.phase === 'reading' ? (
              <ReadProgress stage={long.state.stage} lines={long.state.lines} onCancel={stopReading} />
            ) : null}
            {offThread && long.state.phase === 'failed' ? (
              <p className="paste__file-msg" role="alert">
                {`The text could not be read (${long.state.message}). Nothing was changed.`}
              </p>
            ) : null}
            {imported !== null && !stale ? renderPreview(imported) : null}
            {preview && preview.problems.length > 0 ? (
              <ProblemTable problems={inWords(preview.problems, kind.problemWords)} />
            ) : null}
          </section>
          {!empty && settings !== null ? (
            <section className="paste__settings" aria-labelledby={`${id}-settings`}>
              <div className="paste__settings-head">
                <h3 id={`${id}-settings`}>Guesses to check</h3>
                {Object.keys(corrections).length > 0 ? (
                  <button type="button" className="button--small" onClick={() => setCorrections({})}>
                    Guess again
                  </button>
                ) : null}
              </div>
              <Settings
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
        <p className="paste__keep" role={using ? 'status' : undefined}>
          {using ? 'Putting it on the workbench…' : keepText}
        </p>
        <button type="button" onClick={cancel} disabled={using}>
          Cancel
        </button>
        <button
          type="button"
          className="button--primary"
          onClick={accept}
          disabled={imported === null || stale || using}
        >
          {words.acceptLabel}
        </button>
      </div>
    </Modal>
  );
}
