// The share link's format facts, read by the first screen (./link.ts) and by the reader fetched when a link is
// opened (./link-read.ts); the layout is described in ./link.ts.

export const LINK_FORMAT_VERSION = 1;
export const LINK_PREFIX = `rc${LINK_FORMAT_VERSION}.`;

/**
 * Longest fragment read. Browsers keep far longer URLs, but mail and chat
 * programs cut long ones; a link this long should be a file instead.
 * `encodeScenarioLink` may return longer text: compare with this before
 * offering the link, and offer the file when it is over.
 */
export const MAX_LINK_CHARS = 200_000;

/** Largest JSON text a link may unpack to (2 MiB). */
export const MAX_LINK_JSON_BYTES = 2 * 1024 * 1024;

/** "rc", a link format number, ".": the start of a scenario link of any format. */
export const PREFIX_PATTERN = /^rc(\d{1,6})\./;
