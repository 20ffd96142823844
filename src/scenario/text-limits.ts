/**
 * How long the scenario's texts may be. A name is a line a person reads in a
 * list or a heading; notes are a few pages. The caps keep a crafted document
 * (or a paste gone wrong) from filling the screen, a link or the browser's
 * storage with text nobody wrote on purpose. Our own numbers.
 */

/** Longest name: of a scenario, its catchment, an event, a saved entry. */
export const MAX_NAME_LENGTH = 200;

/** Longest notes text. */
export const MAX_NOTES_LENGTH = 10_000;

const grouped = (n: number): string => n.toLocaleString('en-US');

/** "has 201 characters; it may have at most 200.", the end of every too-long message. */
export function tooLongText(length: number, max: number): string {
  return `has ${grouped(length)} characters; it may have at most ${grouped(max)}.`;
}

/** Why `text` is too long to be `what` (e.g. "The scenario name"), or null. Counts UTF-16 code units, as `maxLength` does. */
export function textLengthProblem(what: string, text: string, max: number): string | null {
  return text.length <= max ? null : `${what} ${tooLongText(text.length, max)}`;
}
