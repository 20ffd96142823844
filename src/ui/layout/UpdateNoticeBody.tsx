import { useSyncExternalStore } from 'react';
import type { UpdateChannel } from '../../offline/updates';
import { useWorkbench } from '../../store';
import { useLinkState, useServices } from '../services/services';

/** Why a reload now would lose something on screen, in words, or null when everything is saved. */
function useUnsavedWork(): string | null {
  const link = useLinkState();
  const notice = useWorkbench((s) => s.notice);
  const { storage } = useServices();
  if (link.kind === 'shared') {
    return 'The shared scenario on screen is not saved in this browser: a reload shows it again as the link holds it, without your changes. Keep it, or save it as a file, first.';
  }
  if (storage === null || notice?.kind === 'unavailable') {
    return 'This browser does not let Raincut save here, so a reload would lose the scenario on screen. Save it as a file first.';
  }
  if (notice?.kind === 'save-failed') {
    return 'The latest change could not be saved in this browser, so a reload would lose it. Save the scenario as a file first.';
  }
  return null;
}

/**
 * Says when a new version of Raincut is ready, and reloads only when the
 * user chooses, warning first when the scenario on screen is not saved. It
 * floats at the foot of the window, so nothing under the pointer moves when
 * it appears.
 */
export function UpdateNoticeBody({ updates }: { updates: UpdateChannel }) {
  const state = useSyncExternalStore(updates.subscribe, updates.getState);
  const unsaved = useUnsavedWork();
  if (state.kind === 'none') return null;
  const head =
    state.kind === 'taken-elsewhere'
      ? 'Raincut was updated in another tab.'
      : state.kind === 'reloading'
        ? 'Reloading with the new version…'
        : 'A new version of Raincut is ready.';
  const body =
    state.kind === 'reloading'
      ? null
      : (unsaved ??
        (state.kind === 'taken-elsewhere'
          ? 'This page still runs the previous version; reload it when convenient. Your scenario is saved in this browser.'
          : 'Reload when convenient to use it. Your scenario is saved in this browser and opens as you left it.'));
  return (
    <section className="update-notice" aria-label="New version" aria-live="polite">
      <p>
        <strong>{head}</strong> {body}
      </p>
      {state.kind === 'reloading' ? null : (
        <div className="update-notice__actions">
          <button type="button" className={unsaved ? undefined : 'button--primary'} onClick={updates.reload}>
            {unsaved ? 'Reload anyway' : 'Reload now'}
          </button>
          <button type="button" onClick={updates.dismiss}>
            Later
          </button>
        </div>
      )}
    </section>
  );
}
