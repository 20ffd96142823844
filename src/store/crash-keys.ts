/** The tab's note to leave the saved scenario unopened on the next load (written by the error screen). */
export const SKIP_SAVED_KEY = 'raincut.skip-saved';
