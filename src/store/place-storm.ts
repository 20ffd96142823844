import { validateStorm, type Storm } from '../core';
import { ownedStorm } from './edits';
import { nextTask, SLICE } from './next-task';
import type { WorkbenchStore } from './scenario-store';

// Imported by path, by the import dialogs that load on first use: not through store/index.ts.

/** Storms from this many bars are placed in steps (below); a shorter one's copy and check take a few ms. */
export const PLACE_IN_STEPS_FROM = 1 << 16;

/** column[from, to) into list (a plain function: V8 optimises a loop inside an async function late or never). */
function copyInto(column: ArrayLike<number>, list: number[], from: number, to: number): void {
  for (let k = from; k < to; k++) list[k] = column[k] as number;
}

/** A column as the document's plain list: a plain array is taken as it is (see below), any other copied in slices. */
async function plainColumn(column: ArrayLike<number>): Promise<number[]> {
  if (Array.isArray(column)) return column as number[];
  const n = column.length;
  const list = new Array<number>(n);
  for (let from = 0; from < n; from += SLICE) {
    await nextTask();
    copyInto(column, list, from, Math.min(n, from + SLICE));
  }
  return list;
}

/**
 * Replaces the storm with an imported one as setImportedStorm does (one
 * undoable edit), with the long work before the edit spread over tasks of
 * their own: the core's check and the results' arrays (issue 11: the click
 * that used 10⁶ bars held the page 222 ms in one task). The edit then
 * renders the new storm in one task, in which `placed` runs (the dialog
 * closes in the same render); the chart draws a long storm in steps after
 * it (ui/chart/staged-frame.ts). Throws the core's InputError, changing
 * nothing, when it refuses the storm.
 *
 * The imported storm is handed over: its plain lists become the document's
 * own, not copied again (10⁶ bars copied were 60 ms of the click); the
 * importer made them for this import alone and keeps no other use of them.
 */
export async function placeImportedStorm(
  store: WorkbenchStore,
  imported: Storm,
  label: string,
  placed: () => void,
): Promise<void> {
  const durationsH = await plainColumn(imported.durationsH);
  const depthsMm = await plainColumn(imported.depthsMm);
  const storm =
    imported.startIso === undefined ? { durationsH, depthsMm } : { durationsH, depthsMm, startIso: imported.startIso };
  await nextTask();
  validateStorm(storm);
  const own = ownedStorm(storm);
  await store.derived.prepareStorm(own);
  await nextTask();
  store.getState().actions.setImportedStorm(own, label);
  placed();
}
