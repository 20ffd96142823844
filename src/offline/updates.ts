import { createStore, type StoreApi } from 'zustand/vanilla';

/**
 * Where a new version of the app stands, as this page sees it.
 *
 * - `none`: nothing new, or the user said "Later".
 * - `waiting`: a new version is stored in the browser and waits for the user
 *   to reload; nothing happens until they choose to.
 * - `reloading`: the user chose; the new version is taking over and the page
 *   reloads as soon as it has.
 * - `taken-elsewhere`: another tab of the app took the new version; this
 *   page still runs the old one until the user reloads it.
 */
export type UpdateState =
  | { readonly kind: 'none' }
  | { readonly kind: 'waiting' }
  | { readonly kind: 'reloading' }
  | { readonly kind: 'taken-elsewhere' };

export interface UpdateChannel extends Pick<StoreApi<UpdateState>, 'getState' | 'subscribe'> {
  /** The user's choice: take the new version and reload. */
  reload(): void;
  /** The user's "Later": the notice goes until the next new version. */
  dismiss(): void;
}

/** What the service-worker registration tells (vite-plugin-pwa's registerSW options, the ones used here). */
export interface RegisterCallbacks {
  onNeedRefresh?: () => void;
  onNeedReload?: () => void;
  onRegisteredSW?: (swUrl: string, registration: ServiceWorkerRegistration | undefined) => void;
  onRegisterError?: (error: unknown) => void;
}

export interface UpdateChannelOptions {
  /** Registers the service worker; returns what moves a waiting version in (vite-plugin-pwa's registerSW). */
  readonly register: (callbacks: RegisterCallbacks) => (reloadPage?: boolean) => Promise<void>;
  /** Writes anything still pending (the scenario saves after a short quiet time) before the page goes. */
  readonly beforeReload: () => void;
  readonly reloadPage: () => void;
  /** How often an open page asks whether there is a new version, ms (a failed check offline is harmless). */
  readonly checkEveryMs?: number;
  readonly setInterval?: (task: () => void, ms: number) => unknown;
  /** How long a chosen reload waits for the new version to take over before reloading anyway, ms. */
  readonly takeOverMs?: number;
  readonly setTimeout?: (task: () => void, ms: number) => unknown;
}

/**
 * The page's side of app updates. A new version never replaces the page on
 * its own: the service worker waits ("prompt" registration, no skipWaiting)
 * until the user chooses to reload here, so nothing is reloaded under their
 * work; when another tab takes the new version, this page only says so.
 */
export function createUpdateChannel(options: UpdateChannelOptions): UpdateChannel {
  const { register, beforeReload, reloadPage } = options;
  const every = options.checkEveryMs ?? 60 * 60 * 1000;
  const repeat = options.setInterval ?? ((task: () => void, ms: number) => setInterval(task, ms));
  const later = options.setTimeout ?? ((task: () => void, ms: number) => setTimeout(task, ms));
  const takeOverMs = options.takeOverMs ?? 5000;
  const state = createStore<UpdateState>()(() => ({ kind: 'none' }));
  let askedHere = false;
  let gone = false;

  const reloadNow = (): void => {
    if (gone) return;
    gone = true;
    beforeReload();
    reloadPage();
  };

  const takeWaiting = register({
    onNeedRefresh: () => state.setState({ kind: 'waiting' }, true),
    // The new version has taken over the page: reload only when the user asked for it here.
    onNeedReload: () => {
      if (askedHere) reloadNow();
      else state.setState({ kind: 'taken-elsewhere' }, true);
    },
    onRegisteredSW: (_url, registration) => {
      if (!registration) return;
      repeat(() => {
        registration.update().catch(() => {
          // Offline, or the server is away: the next check will tell.
        });
      }, every);
    },
    onRegisterError: () => {
      // Without a service worker the page works as an ordinary page (private windows, some locked-down browsers).
    },
  });

  return {
    getState: state.getState,
    subscribe: state.subscribe,
    reload: () => {
      const now = state.getState();
      if (now.kind === 'taken-elsewhere') {
        // The new version already serves this page's files: a plain reload takes it.
        reloadNow();
        return;
      }
      if (now.kind !== 'waiting') return;
      askedHere = true;
      state.setState({ kind: 'reloading' }, true);
      void takeWaiting(true);
      // The user asked to reload: should the new version not take over (its worker gone meanwhile), reload anyway.
      later(() => {
        if (state.getState().kind === 'reloading') reloadNow();
      }, takeOverMs);
    },
    dismiss: () => state.setState({ kind: 'none' }, true),
  };
}
