import { useMemo, useCallback, useEffect, useState, type FormEvent, type KeyboardEvent } from 'react';
import { instantMs, methodSpec } from '../../core';
import type { DeletedEntry, LibraryListing, LibraryResult, Problem, SavedEntry } from '../../scenario';
import { scenarioFileName } from '../../scenario/file';
import { createScenarioLibrary, entryName } from '../../scenario/library';
import { problem } from '../../scenario/problems';
import { useWorkbenchStore } from '../../store';
import { entryFileText, largeWhere, LIST_LARGE_TEXT, openEntry, saveToList } from '../../store/large-library';
import { listSetAside, type SetAsideCopy } from '../../store/set-aside';
import { ListProblems } from './ListProblems';
import { SetAsideCopies } from './SetAsideCopies';
import { useServices } from '../services/services';
import { formatCount } from '../format';
import './share.css';

const savedAtFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
const quoted = (name: string): string => `“${name}”`;

function savedAtText(iso: string): string {
  const t = instantMs(iso);
  return t === null ? iso : savedAtFormat.format(t);
}

function summary(entry: SavedEntry): string {
  const [n, kind] =
    'large' in entry
      ? [entry.large.bars, entry.large.method]
      : [entry.scenario.storm.depthsMm.length, entry.scenario.method.kind];
  const where = 'large' in entry ? ` · ${largeWhere(entry.large.record)}` : '';
  return `${formatCount(n)} bar${n === 1 ? '' : 's'} · ${methodSpec(kind).label}${where}`;
}

/** What saving said: where a large entry is kept. */
const savedText = (entry: SavedEntry, verb: string): string =>
  `${verb} ${quoted(entryName(entry))}${verb === 'Saved' ? ' to the list' : ' in the list with the scenario on screen'}.${'large' in entry ? ` ${LIST_LARGE_TEXT}` : ''}`;

type Status =
  | { readonly kind: 'done'; readonly text: string }
  | { readonly kind: 'deleted'; readonly entry: DeletedEntry }
  | { readonly kind: 'problem'; readonly text: string; readonly problems: readonly Problem[] };

const EMPTY: LibraryListing = { entries: [], deleted: [], setAside: [], canWrite: false, problems: [] };

function RenameForm({ entry, onDone }: { entry: SavedEntry; onDone: (name: string | null) => void }) {
  const [name, setName] = useState(entryName(entry));
  const submit = (e: FormEvent): void => {
    e.preventDefault();
    onDone(name);
  };
  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>): void => {
    if (e.key === 'Escape') {
      e.preventDefault();
      onDone(null);
    }
  };
  return (
    <form className="library__rename" onSubmit={submit}>
      <input
        type="text"
        aria-label={`New name for ${entryName(entry)}`}
        value={name}
        autoFocus
        onChange={(e) => setName(e.currentTarget.value)}
        onKeyDown={onKeyDown}
      />
      <button type="submit" className="share-button--small">
        Save name
      </button>
      <button type="button" className="share-button--small" onClick={() => onDone(null)}>
        Cancel
      </button>
    </form>
  );
}

/**
 * The named list of scenarios kept in this browser (the scenario layer's
 * library on localStorage): save the current one, open, rename, duplicate
 * and delete, with Undo for a deletion.
 */
/** `id` names the region for the button that opens it (ScenarioBar's aria-controls). */
export function LibraryPanel({ id }: { id: string }) {
  const { link, storage, saveFile, now } = useServices();
  // The saved list lives in this panel's code, loaded when the panel first opens (not with the first screen).
  const library = useMemo(() => (storage ? createScenarioLibrary(storage, { now }) : null), [storage, now]);
  const store = useWorkbenchStore();
  const [listing, setListing] = useState<LibraryListing>(() => library?.list() ?? EMPTY);
  const readAside = useCallback((): SetAsideCopy[] => (storage ? listSetAside(storage).copies : []), [storage]);
  const [aside, setAside] = useState<SetAsideCopy[]>(readAside);
  const [status, setStatus] = useState<Status | null>(null);
  const [renaming, setRenaming] = useState<string | null>(null);
  /** The entry the scenario on screen was opened from or saved as, offered for "Update". */
  const [currentId, setCurrentId] = useState<string | null>(null);
  /** A save, open or download of a large entry under way (they wait for the browser's larger database). */
  const [busy, setBusy] = useState(false);

  const refresh = useCallback(() => {
    // Reading the list may itself set damaged data aside, so the copies are read after it.
    setListing(library?.list() ?? EMPTY);
    setAside(readAside());
  }, [library, readAside]);
  useEffect(() => {
    // Another tab, or keeping a shared link, may change the list.
    window.addEventListener('storage', refresh);
    const stop = link?.subscribe(refresh);
    return () => {
      window.removeEventListener('storage', refresh);
      stop?.();
    };
  }, [refresh, link]);

  const usesLarge = listing.entries.some((e) => 'large' in e) || aside.some((c) => c.large !== undefined);
  useEffect(() => {
    // The large store is in use here: records nothing names are deleted later, at a quiet moment (src/store/large-sweep.ts).
    if (usesLarge)
      void import('../../store/large-store').then(
        (m) => m.sweepSoon(storage),
        () => undefined,
      );
  }, [usesLarge, storage]);

  /** Runs a library call; its problems (or its notices) show as the status. */
  function run<T>(result: LibraryResult<T>, done: (value: T) => Status | null): void {
    refresh();
    if (!result.ok) {
      setStatus({ kind: 'problem', text: 'That was not done.', problems: result.problems });
      return;
    }
    const next = done(result.value);
    setStatus(
      result.problems.length > 0
        ? { kind: 'problem', text: 'Done, but the saved list needed repair.', problems: result.problems }
        : next,
    );
  }

  /** Saves the scenario on screen (as a new entry, or over `id`): large ones wait for the larger database. */
  const saveCurrent = (id: string | undefined, verb: 'Saved' | 'Updated'): void => {
    setBusy(true);
    setStatus({ kind: 'done', text: `Saving ${quoted(store.getState().scenario.name)}…` });
    void saveToList(library as NonNullable<typeof library>, store.getState().scenario, {
      ...(id === undefined ? {} : { id }),
      now: now(),
    }).then((result) => {
      setBusy(false);
      run(result, (entry) => {
        setCurrentId(entry.id);
        return { kind: 'done', text: savedText(entry, verb) };
      });
    });
  };

  const open = (entry: SavedEntry): void => {
    const name = entryName(entry);
    if ('large' in entry) {
      setBusy(true);
      setStatus({ kind: 'done', text: `Opening ${quoted(name)} from this browser’s larger database…` });
    }
    void openEntry(entry).then((read) => {
      if (!read.ok) {
        setBusy(false);
        setStatus({ kind: 'problem', text: 'That was not opened.', problems: [problem(read.message)] });
        return;
      }
      const label = `Open ${quoted(name)} from the saved list`;
      const opened = (): void => {
        setBusy(false);
        setCurrentId(entry.id);
        setStatus({ kind: 'done', text: `Opened ${quoted(name)}. Undo brings back the scenario you had before.` });
      };
      if (!('large' in entry)) {
        store.getState().actions.replaceScenario(read.scenario, label);
        opened();
        return;
      }
      // A large entry's long storm: its check and arrays made ready in steps before the one edit (issue 11).
      void import('../../store/open-scenario')
        .then((m) => m.placeScenario(store, read.scenario, label))
        .then(opened, (error: unknown) => {
          setBusy(false);
          setStatus({
            kind: 'problem',
            text: 'That was not opened.',
            problems: [problem(`Its code could not be loaded (${String(error)}).`)],
          });
        });
    });
  };

  const download = (entry: SavedEntry): void => {
    void entryFileText(entry).then((file) => {
      if (!file.ok) {
        setStatus({ kind: 'problem', text: 'That was not downloaded.', problems: [problem(file.message)] });
        return;
      }
      const name = scenarioFileName({ name: entryName(entry) });
      saveFile(new Blob([file.text], { type: 'application/json' }), name);
      setStatus({ kind: 'done', text: `Downloaded ${name}.${file.note}` });
    });
  };

  if (!library) {
    return (
      <section className="panel library" id={id} aria-labelledby="library-title">
        <h2 id="library-title">Saved scenarios</h2>
        <p className="library__intro">This browser does not allow saving here. Use “Save as file” to keep scenarios.</p>
      </section>
    );
  }

  const current = currentId === null ? undefined : listing.entries.find((e) => e.id === currentId);

  return (
    <section className="panel library" id={id} aria-labelledby="library-title">
      <div className="library__head">
        <h2 id="library-title">Saved scenarios</h2>
        <p className="library__intro">Kept in this browser only; save a file to move a scenario to another computer.</p>
        <div className="library__actions">
          <button
            type="button"
            className="button--primary"
            disabled={busy}
            onClick={() => saveCurrent(undefined, 'Saved')}
          >
            Save current scenario to list
          </button>
          {current ? (
            <button type="button" disabled={busy} onClick={() => saveCurrent(current.id, 'Updated')}>
              Update {quoted(entryName(current))}
            </button>
          ) : null}
        </div>
      </div>

      {listing.problems.length > 0 ? <ListProblems details={listing.problems.map((p) => p.message)} /> : null}

      <div className="library__status" role="status">
        {status?.kind === 'done' ? <p>{status.text}</p> : null}
        {status?.kind === 'deleted' ? (
          <p>
            Deleted {quoted(entryName(status.entry))} —{' '}
            <button
              type="button"
              className="share-button--small"
              onClick={() =>
                run(library.restore(status.entry.id), (entry) => ({
                  kind: 'done',
                  text: `Brought back ${quoted(entryName(entry))}.`,
                }))
              }
            >
              Undo
            </button>
          </p>
        ) : null}
      </div>
      {status?.kind === 'problem' ? (
        <ListProblems text={status.text} details={status.problems.map((p) => p.message)} />
      ) : null}

      {listing.entries.length === 0 ? (
        <p className="library__empty">Nothing is saved in the list yet.</p>
      ) : (
        <ul className="library__list" aria-label="Scenarios saved in this browser">
          {listing.entries.map((entry) => {
            const name = entryName(entry);
            return (
              <li
                key={entry.id}
                className={`library__entry${entry.id === currentId ? ' library__entry--current' : ''}`}
              >
                {renaming === entry.id ? (
                  <RenameForm
                    entry={entry}
                    onDone={(next) => {
                      setRenaming(null);
                      if (next === null) return;
                      run(library.rename(entry.id, next), (renamed) => ({
                        kind: 'done',
                        text: `Renamed to ${quoted(entryName(renamed))}.`,
                      }));
                    }}
                  />
                ) : (
                  <div className="library__name">
                    <strong>{name}</strong>
                    <span className="library__meta">
                      {summary(entry)} · saved {savedAtText(entry.savedAt)}
                    </span>
                  </div>
                )}
                <div className="library__buttons" role="group" aria-label={`Actions for ${name}`}>
                  <button
                    type="button"
                    className="share-button--small"
                    aria-label={`Open ${name}`}
                    disabled={busy}
                    onClick={() => open(entry)}
                  >
                    Open
                  </button>
                  <button
                    type="button"
                    className="share-button--small"
                    aria-label={`Download ${name}`}
                    onClick={() => download(entry)}
                  >
                    Download
                  </button>
                  <button
                    type="button"
                    className="share-button--small"
                    aria-label={`Rename ${name}`}
                    onClick={() => setRenaming(entry.id)}
                  >
                    Rename
                  </button>
                  <button
                    type="button"
                    className="share-button--small"
                    aria-label={`Duplicate ${name}`}
                    onClick={() =>
                      run(library.duplicate(entry.id), (copy) => ({
                        kind: 'done',
                        text: `Made ${quoted(entryName(copy))}.`,
                      }))
                    }
                  >
                    Duplicate
                  </button>
                  <button
                    type="button"
                    className="share-button--small share-button--danger"
                    aria-label={`Delete ${name}`}
                    onClick={() =>
                      run(library.delete(entry.id), (gone) => {
                        if (gone.id === currentId) setCurrentId(null);
                        return { kind: 'deleted', entry: gone };
                      })
                    }
                  >
                    Delete
                  </button>
                </div>
              </li>
            );
          })}
        </ul>
      )}

      {storage ? (
        <SetAsideCopies copies={aside} storage={storage} library={library} saveFile={saveFile} onChanged={refresh} />
      ) : null}
    </section>
  );
}
