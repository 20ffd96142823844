/** The large store's database and object store (large-store.ts); never renamed (users' work is in them). */
export const LARGE_DB = 'raincut';
export const LARGE_OBJECTS = 'scenarios';

/** A record for the large store's writer (large-write.worker.ts) to put, and its answer. */
export interface LargeWrite {
  readonly job: number;
  readonly key: string;
  readonly value: unknown;
}
export type LargeWritten =
  { readonly job: number; readonly ok: true } | { readonly job: number; readonly ok: false; readonly message: string };
