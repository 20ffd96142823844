import { InputError } from './errors';

/**
 * The one factory behind the core's tables of kinds: loss methods
 * (loss/methods.ts), transforms (transform/transforms.ts) and baseflow
 * separations (baseflow/methods.ts). Each is a discriminated union on `kind`
 * with one spec per kind; the factory gives every table the same typed
 * lookups, the same accessors by parameter key and one dispatch, so the cast
 * TypeScript needs to tie a union value to the entry of its own kind is
 * written here once and nowhere else.
 *
 * Declarative: no computation is imported here, so a table built with it
 * stays small enough for the first screen (its compute lives in other files,
 * reached through `byKind`).
 */

/** A value a parameter or setting of a table's item holds. */
export type KindValue = number | boolean | string;

/** The member of the union `U` whose kind is `K`. */
export type KindOf<U extends { readonly kind: string }, K extends U['kind']> = Extract<U, { readonly kind: K }>;

/** What the factory needs of every spec: the defaults of its own kind. */
export type SpecsOf<U extends { readonly kind: string }> = {
  readonly [K in U['kind']]: { readonly kind: K; readonly defaults: KindOf<U, K> };
};

export interface KindTable<U extends { readonly kind: string }, S extends SpecsOf<U>> {
  /** The specs by kind, in the order a picker shows them. */
  readonly specs: S;
  /** The kinds in the order a picker shows them. */
  readonly kinds: readonly U['kind'][];
  isKind(kind: unknown): kind is U['kind'];
  /** The spec of `kind`; an InputError on field 'kind' for a kind the table does not hold. */
  spec<K extends U['kind']>(kind: K): S[K];
  /** The defaults of `kind` (a fresh object). */
  defaults<K extends U['kind']>(kind: K): KindOf<U, K>;
  /** Whatever `item` holds at `key`, unchecked: for validation, which says what it got. */
  read(item: U, key: string): unknown;
  /**
   * The value `item` holds for the parameter or setting `key`, or undefined
   * when it holds none there (left out, or not a number, switch or choice).
   */
  value(item: U, key: string): KindValue | undefined;
  /** The number `item` holds for `key`, or undefined. */
  number(item: U, key: string): number | undefined;
  /**
   * A copy of `item` with `key` set to `value`, or left out when `value` is
   * undefined (an optional parameter back to its default). Not validated:
   * the caller checks the copy before it is used.
   */
  withValue<M extends U>(item: M, key: string, value: KindValue | undefined): M;
  /** Calls `fn` with the spec of the item's kind and the item, both typed to that one kind. */
  dispatch<R>(item: U, fn: <K extends U['kind']>(spec: S[K], item: KindOf<U, K>) => R): R;
}

/**
 * Builds the table of `specs` (keyed by kind, in picker order). `noun` names
 * an item in messages: 'loss method' gives `Unknown loss method "x".`
 */
export function kindTable<U extends { readonly kind: string }, S extends SpecsOf<U>>(
  specs: S,
  noun: string,
): KindTable<U, S> {
  const isKind = (kind: unknown): kind is U['kind'] => typeof kind === 'string' && Object.hasOwn(specs, kind);
  const spec = <K extends U['kind']>(kind: K): S[K] => {
    if (!isKind(kind)) throw new InputError('kind', `Unknown ${noun} "${String(kind)}".`);
    return specs[kind];
  };
  const read = (item: U, key: string): unknown => (item as unknown as Partial<Record<string, unknown>>)[key];
  const value = (item: U, key: string): KindValue | undefined => {
    const v = read(item, key);
    return typeof v === 'number' || typeof v === 'boolean' || typeof v === 'string' ? v : undefined;
  };
  return {
    specs,
    kinds: Object.keys(specs) as U['kind'][],
    isKind,
    spec,
    // SpecsOf ties each entry's defaults to its kind, but TypeScript widens S[K] to S[string] here.
    defaults: <K extends U['kind']>(kind: K) => ({ ...spec(kind).defaults }) as unknown as KindOf<U, K>,
    read,
    value,
    number: (item, key) => {
      const v = value(item, key);
      return typeof v === 'number' ? v : undefined;
    },
    withValue: <M extends U>(item: M, key: string, v: KindValue | undefined): M => {
      const next: Partial<Record<string, unknown>> = { ...item };
      if (v === undefined) delete next[key];
      else next[key] = v;
      return next as unknown as M;
    },
    dispatch: (item, fn) => byKind(specs, item, fn),
  };
}

/**
 * Calls `fn` with the entry of `entries` for the item's kind and the item,
 * both typed to that one kind: the single dispatch of every table keyed by
 * kind, the specs and the compute tables kept apart from them (a
 * transform's weights, a baseflow method's separation). TypeScript cannot
 * tie a union value to the entry of its own member: this is the one place
 * that says so.
 */
export function byKind<U extends { readonly kind: string }, T extends { readonly [K in U['kind']]: unknown }, R>(
  entries: T,
  item: U,
  fn: <K extends U['kind']>(entry: T[K], item: KindOf<U, K>) => R,
): R {
  const kind: U['kind'] = item.kind;
  return fn(entries[kind], item as KindOf<U, U['kind']>);
}
