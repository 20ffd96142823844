import { useState } from 'react';
import { instantMs } from '../../core';
import type { ScenarioLibrary } from '../../scenario';
import { recoverScenarios, type SetAsideCopy, type SetAsideKind } from '../../store/set-aside';
import { openEntry, saveToList } from '../../store/large-library';
import type { Scenario } from '../../scenario/types';
import type { StorageLike } from '../../store';
import { readLargeMarker, type LargeMarker } from '../../store/large-marker';
import { ListProblems } from './ListProblems';

const WHAT: Readonly<Record<SetAsideKind, string>> = {
  scenario: 'Saved scenario',
  list: 'Saved list of scenarios',
  pins: 'Pinned scenarios',
  other: 'Saved data',
};

const stampFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/** "Saved scenario set aside 1 Mar 2026, 10:00" (the key when it carries no time). */
function setAsideLabel(copy: SetAsideCopy): string {
  const t = copy.setAsideAt === null ? null : instantMs(copy.setAsideAt);
  return t === null
    ? `${WHAT[copy.kind]} set aside (${copy.key})`
    : `${WHAT[copy.kind]} set aside ${stampFormat.format(t)}`;
}

/** "saved scenario set aside Dec 4 …": the label inside a sentence (only its first letter lowered). */
const lowerFirst = (text: string): string => text.charAt(0).toLowerCase() + text.slice(1);

function sizeText(chars: number): string {
  return chars < 1024 ? `${chars} characters` : `${(chars / 1024).toFixed(1)} k characters`;
}

/** "raincut-set-aside-2026-03-01T10-00-00Z.json" from the copy's key. */
function fileNameOf(copy: SetAsideCopy): string {
  const stamp = (copy.setAsideAt ?? copy.key).replace(/[^\w-]+/g, '-').replace(/-+$/, '');
  return `raincut-set-aside-${copy.kind}-${stamp}.json`;
}

/** The large store's code (idb-keyval), fetched when a set-aside marker is acted on. */
const loadLarge = (): Promise<typeof import('../../store/large-store')> => import('../../store/large-store');

/** Where a set-aside marker's scenario is: its record in the larger database, not the marker's own text. */
const largeWhere = (marker: LargeMarker): string =>
  `kept in this browser’s larger database (IndexedDB) as record “${marker.id}”`;

type Verb = 'Restore' | 'Download' | 'Delete';
const ACTIONS: readonly { readonly verb: Verb; readonly danger: boolean }[] = [
  { verb: 'Restore', danger: false },
  { verb: 'Download', danger: false },
  { verb: 'Delete', danger: true },
];

export type SetAsideStatus =
  | { readonly kind: 'done'; readonly text: string }
  | {
      readonly kind: 'deleted';
      readonly copy: SetAsideCopy;
      readonly kept: string;
      /** For a set-aside marker: the record it named, deleted with it and put back by Undo. */
      readonly record?: { readonly id: string; readonly raw: unknown };
    }
  | { readonly kind: 'problem'; readonly text: string; readonly details: readonly string[] };

export interface SetAsideCopiesProps {
  readonly copies: readonly SetAsideCopy[];
  readonly storage: StorageLike;
  readonly library: ScenarioLibrary;
  readonly saveFile: (blob: Blob, fileName: string) => void;
  /** Called after any change to storage, so the lists on screen are read again. */
  readonly onChanged: () => void;
}

const why = (error: unknown): string => (error instanceof Error ? error.message : String(error));

/**
 * The set-aside copies (src/store/set-aside.ts), each with Restore (the
 * scenarios in it that this version reads join the saved list), Download
 * (the text exactly as it was kept) and Delete (with Undo while the panel is
 * open). Nothing here opens a copy on the workbench: a copy may be the
 * scenario that stopped the screen, and the list is where it can be looked
 * at first.
 */
export function SetAsideCopies({ copies, storage, library, saveFile, onChanged }: SetAsideCopiesProps) {
  const [status, setStatus] = useState<SetAsideStatus | null>(null);

  const textOf = (copy: SetAsideCopy): string | null => {
    try {
      return storage.getItem(copy.key);
    } catch {
      return null;
    }
  };

  const unreadable = (copy: SetAsideCopy): void =>
    setStatus({ kind: 'problem', text: `${setAsideLabel(copy)} could not be read.`, details: [] });

  /** A set-aside marker's record, as a document's text; a plain problem when the record is gone or unreadable. */
  const largeTextOf = async (copy: SetAsideCopy, marker: LargeMarker): Promise<string | null> => {
    const read = await loadLarge()
      .then((large) => large.readLargeText(marker))
      .catch((error: unknown) => ({
        ok: false as const,
        message: `The code of this browser’s large store could not be loaded (${why(error)}).`,
      }));
    if (read.ok) return read.text;
    setStatus({
      kind: 'problem',
      text: `${setAsideLabel(copy)} is only a pointer to a record in this browser’s larger database, and that record cannot be had: ${read.message} Delete the pointer if the record is gone for good.`,
      details: [],
    });
    return null;
  };

  const restore = (copy: SetAsideCopy): void => {
    const text = textOf(copy);
    if (text === null) return unreadable(copy);
    const marker = readLargeMarker(text);
    if (marker) {
      void largeTextOf(copy, marker).then((record) => (record === null ? undefined : restoreText(copy, record)));
      return;
    }
    void restoreText(copy, text);
  };

  /**
   * Each scenario the copy gives back joins the saved list the way a save
   * does (a large one through the large store, in a record of its own); a
   * saved list's pointer is read from the record it names first. The copy,
   * and any record it names, is kept as it was.
   */
  const restoreText = async (copy: SetAsideCopy, text: string): Promise<void> => {
    const { scenarios, pointers, problems } = recoverScenarios(text);
    const saved: string[] = [];
    const failed: string[] = problems.map((p) => p.message);
    const keep = async (scenario: Scenario): Promise<void> => {
      const result = await saveToList(library, scenario, { now: new Date() });
      if (result.ok) saved.push(`“${'large' in result.value ? result.value.large.name : result.value.scenario.name}”`);
      else for (const p of result.problems) failed.push(p.message);
    };
    for (const scenario of scenarios) await keep(scenario);
    for (const pointer of pointers) {
      const opened = await openEntry(pointer);
      if (opened.ok) await keep(opened.scenario);
      else failed.push(opened.message);
    }
    onChanged();
    if (saved.length === 0) {
      setStatus({
        kind: 'problem',
        text: `Nothing in ${lowerFirst(setAsideLabel(copy))} can be opened by this version of Raincut; it is kept as it was. Download it to keep or repair it.`,
        details: failed,
      });
      return;
    }
    const restored = `Restored ${saved.join(', ')} to the saved list; open ${saved.length === 1 ? 'it' : 'them'} from there. The set-aside copy is kept until you delete it.`;
    setStatus(
      failed.length === 0 ? { kind: 'done', text: restored } : { kind: 'problem', text: restored, details: failed },
    );
  };

  const download = (copy: SetAsideCopy): void => {
    const text = textOf(copy);
    if (text === null) return unreadable(copy);
    const marker = readLargeMarker(text);
    if (marker) {
      // The scenario the marker names, from the larger database: the marker alone holds none of the user's work.
      void largeTextOf(copy, marker).then((record) => {
        if (record !== null) downloadText(copy, record, ` from this browser’s larger database (record “${marker.id}”)`);
      });
      return;
    }
    downloadText(copy, text, '');
  };

  const downloadText = (copy: SetAsideCopy, text: string, from: string): void => {
    const name = fileNameOf(copy);
    saveFile(new Blob([text], { type: 'application/json' }), name);
    setStatus({ kind: 'done', text: `Downloaded ${name}, exactly as it was kept${from}.` });
  };

  const removeKey = (copy: SetAsideCopy): boolean => {
    try {
      storage.removeItem(copy.key);
      return true;
    } catch (error) {
      setStatus({ kind: 'problem', text: `${setAsideLabel(copy)} could not be deleted (${why(error)}).`, details: [] });
      return false;
    }
  };

  const remove = (copy: SetAsideCopy): void => {
    const text = textOf(copy);
    const marker = readLargeMarker(text);
    if (text !== null && marker) {
      void removeLarge(copy, text, marker);
      return;
    }
    if (!removeKey(copy)) return;
    onChanged();
    setStatus(text === null ? null : { kind: 'deleted', copy, kept: text });
  };

  /** A set-aside marker and the record it names go together: the record is kept in memory for Undo while the panel is open. */
  const removeLarge = async (copy: SetAsideCopy, text: string, marker: LargeMarker): Promise<void> => {
    let raw: unknown;
    let large: Awaited<ReturnType<typeof loadLarge>>;
    try {
      large = await loadLarge();
      raw = await large.keptRecord(marker.id);
    } catch (error) {
      setStatus({
        kind: 'problem',
        text: `${setAsideLabel(copy)} was not deleted: the record it names in this browser’s larger database could not be read (${why(error)}).`,
        details: [],
      });
      return;
    }
    // The pointer goes first, so no copy is ever listed that names a deleted record.
    if (!removeKey(copy)) return;
    await large.dropLarge(marker.id);
    onChanged();
    setStatus({ kind: 'deleted', copy, kept: text, ...(raw === undefined ? {} : { record: { id: marker.id, raw } }) });
  };

  const undoDelete = (
    copy: SetAsideCopy,
    text: string,
    record?: { readonly id: string; readonly raw: unknown },
  ): void => {
    if (record) {
      // The record first, then the marker naming it.
      void loadLarge()
        .then((large) => large.putRecord(record.id, record.raw))
        .then(
          () => undoDelete(copy, text),
          (error: unknown) =>
            setStatus({
              kind: 'problem',
              text: `${setAsideLabel(copy)} could not be put back in this browser’s larger database (${why(error)}).`,
              details: [],
            }),
        );
      return;
    }
    try {
      storage.setItem(copy.key, text);
    } catch (error) {
      setStatus({
        kind: 'problem',
        text: `${setAsideLabel(copy)} could not be put back (${why(error)}); download it below before leaving.`,
        details: [],
      });
      return;
    }
    onChanged();
    setStatus({ kind: 'done', text: `Brought back ${lowerFirst(setAsideLabel(copy))}.` });
  };

  const run: Record<Verb, (copy: SetAsideCopy) => void> = { Restore: restore, Download: download, Delete: remove };
  if (copies.length === 0 && status === null) return null;
  return (
    <section className="library__aside" aria-labelledby="set-aside-title">
      <h3 id="set-aside-title">Set-aside copies</h3>
      <p className="library__intro">
        Saved data Raincut could not open (damaged, or past what this version reads) is kept here exactly as it was.
      </p>
      <div className="library__status" role="status">
        {status?.kind === 'done' ? <p>{status.text}</p> : null}
        {status?.kind === 'deleted' ? (
          <p>
            Deleted {lowerFirst(setAsideLabel(status.copy))} —{' '}
            <button
              type="button"
              className="share-button--small"
              onClick={() => undoDelete(status.copy, status.kept, status.record)}
            >
              Undo
            </button>
          </p>
        ) : null}
      </div>
      {status?.kind === 'problem' ? <ListProblems text={status.text} details={status.details} /> : null}
      {copies.length > 0 ? (
        <ul className="library__list" aria-label="Set-aside copies">
          {copies.map((copy) => {
            const label = setAsideLabel(copy);
            return (
              <li key={copy.key} className="library__entry">
                <div className="library__name">
                  <strong>{label}</strong>
                  <span className="library__meta">
                    {copy.large ? largeWhere(copy.large) : sizeText(copy.chars)} · browser storage key “{copy.key}”
                  </span>
                </div>
                <div className="library__buttons" role="group" aria-label={`Actions for ${label}`}>
                  {ACTIONS.map(({ verb, danger }) => (
                    <button
                      key={verb}
                      type="button"
                      className={danger ? 'share-button--small share-button--danger' : 'share-button--small'}
                      aria-label={`${verb} ${label}`}
                      onClick={() => run[verb](copy)}
                    >
                      {verb}
                    </button>
                  ))}
                </div>
              </li>
            );
          })}
        </ul>
      ) : null}
    </section>
  );
}
