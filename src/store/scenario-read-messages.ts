import type { Problem } from '../scenario/problems';
import type { LargeMarker } from './large-marker';

/**
 * What the page asks the scenario reader (scenario-read.worker.ts): a
 * scenario file's bytes, the large store's record a marker names, or a
 * share link's fragment.
 */
export type ScenarioReadRequest =
  | { readonly job: number; readonly kind: 'file'; readonly file: Blob }
  | { readonly job: number; readonly kind: 'record'; readonly marker: LargeMarker }
  | { readonly job: number; readonly kind: 'link'; readonly fragment: string };

/**
 * The reader's answer: the scenario read through the one schema, its long
 * number columns as Float64Arrays handed over (large-read.ts `pack`, sharing
 * kept); or the problems, as the schema (or the large store) put them.
 */
export type ScenarioReadAnswer =
  | { readonly job: number; readonly ok: true; readonly packed: unknown }
  | { readonly job: number; readonly ok: false; readonly problems: readonly Problem[] };
