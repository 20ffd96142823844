import { useSyncExternalStore } from 'react';
import type { UpdateChannel } from '../../offline/updates';
import { lazyPart } from './LazyPart';

// The notice's words and buttons load only when there is a new version to speak of (UpdateNoticeBody.tsx).
const Body = lazyPart<{ updates: UpdateChannel }>('update notice', () =>
  import('./UpdateNoticeBody').then((m) => m.UpdateNoticeBody),
);

/**
 * Says when a new version of Raincut is ready, and reloads only when the
 * user chooses, warning first when the scenario on screen is not saved. It
 * floats at the foot of the window, so nothing under the pointer moves when
 * it appears.
 */
export function UpdateNotice({ updates }: { updates: UpdateChannel }) {
  const state = useSyncExternalStore(updates.subscribe, updates.getState);
  return state.kind === 'none' ? null : <Body updates={updates} />;
}
