import { createContext, useContext, useEffect, useMemo, useSyncExternalStore, type ReactNode } from 'react';
import type { StorageLike } from '../../scenario';
import type { LinkSession, LinkState } from '../../store/link-session';
import { createPinShelf, type PinShelf } from '../../store/pin-board';
import type { PinState } from '../../store/pins';
import { windowStorageEvents } from '../../store/other-tabs';
import { downloadBlob } from './download';

/**
 * What the share, file, export and compare tools need from the browser,
 * passed in (so tests give their own storage, clipboard and downloads).
 */
export interface ScenarioServices {
  /** The browser's storage for the saved list and the pins, or null where it is switched off. */
  readonly storage: StorageLike | null;
  /** The share-link session from start-up (null when the page was started without one). */
  readonly link: LinkSession | null;
  /** The page's address without its fragment; share links are this plus '#' and the link text. */
  readonly pageAddress: () => string;
  /** Where "Copy link" writes, or null where the browser has no clipboard. */
  readonly clipboard: { writeText(text: string): Promise<void> } | null;
  /** Hands a file to the user (a download in the browser). */
  readonly saveFile: (blob: Blob, fileName: string) => void;
  /** Opens the browser's print dialog. */
  readonly print: () => void;
  readonly now: () => Date;
}

/** The browser's storage, or null where it is switched off (reading `localStorage` can itself throw). */
function browserStorage(): StorageLike | null {
  try {
    return typeof window === 'undefined' ? null : (window.localStorage ?? null);
  } catch {
    return null;
  }
}

export function browserServices(overrides: Partial<ScenarioServices> = {}): ScenarioServices {
  return {
    storage: browserStorage(),
    link: null,
    // The address as it is, less its fragment: for a page opened from a file (the single-file build) the
    // origin is "null", so origin + path would not be an address at all.
    pageAddress: () => window.location.href.replace(/#.*$/, ''),
    clipboard: typeof navigator !== 'undefined' && navigator.clipboard ? navigator.clipboard : null,
    saveFile: downloadBlob,
    print: () => window.print(),
    now: () => new Date(),
    ...overrides,
  };
}

interface Provided extends ScenarioServices {
  readonly pins: PinShelf;
}

const ServicesContext = createContext<Provided | null>(null);

export function ScenarioServicesProvider({
  services,
  children,
}: {
  services?: ScenarioServices | undefined;
  children?: ReactNode;
}) {
  const value = useMemo<Provided>(() => {
    const base = services ?? browserServices();
    return {
      ...base,
      pins: createPinShelf(base.storage, { now: base.now, watch: windowStorageEvents }),
    };
  }, [services]);
  // The pins are read just after the first frame; another tab's show here as soon as that tab writes them.
  useEffect(() => value.pins.watchOtherTabs(), [value]);
  return <ServicesContext.Provider value={value}>{children}</ServicesContext.Provider>;
}

export function useServices(): Provided {
  const value = useContext(ServicesContext);
  if (!value) throw new Error('useServices needs a <ScenarioServicesProvider> above it.');
  return value;
}

const NO_LINK: LinkState = { kind: 'none' };
const noSubscription = (): (() => void) => () => {};

/** The share-link state, following the session. */
export function useLinkState(): LinkState {
  const { link } = useServices();
  return useSyncExternalStore(link ? link.subscribe : noSubscription, link ? link.getState : () => NO_LINK);
}

/** The pinned scenarios, following the board. */
export function usePins(): PinState {
  const { pins } = useServices();
  return useSyncExternalStore(pins.subscribe, pins.getState);
}
