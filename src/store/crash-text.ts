/** What the error screen says of the saved scenario (./crash.ts, ./crash-large.ts): on the first screen, kept apart from the large store's code. */
export const SAVED_TEXT =
  'The scenario that stopped the screen is the one saved in this browser, so reloading would stop it again. ' +
  'Set it aside to start from the demo: it is kept, as it was, under Saved scenarios, “Set-aside copies”.';
export const OLDER_TEXT =
  'The change that stopped the screen was not saved: the scenario saved in this browser is the one from before it, ' +
  'and reloading opens that.';
