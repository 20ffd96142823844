import { InputError } from '../errors';
import { writeIsoDateTime, zoneSuffix } from '../iso-write';
import { readIsoDateTime } from '../wall-clock';

const MS_PER_H = 3_600_000;

/**
 * An ISO 8601 date-time `hours` later, written as the original was: the same
 * zone suffix (or none), so a storm start without a zone stays a wall-clock
 * reading and one with a zone keeps it. Read by the one strict reader
 * (wall-clock.ts) and shifted on its zone-free axis in whole milliseconds;
 * text it refuses (30 February, 24:01) is an InputError, never rolled over.
 */
export function shiftIso(iso: string, hours: number): string {
  const text = iso.trim();
  const read = readIsoDateTime(text);
  if (read === null) throw new InputError('startIso', `The storm start "${iso}" is not an ISO 8601 date-time.`);
  return writeIsoDateTime(read.wallMs + Math.round(hours * MS_PER_H), zoneSuffix(text));
}
