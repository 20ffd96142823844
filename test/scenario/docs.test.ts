// docs/scenario-schema.md describes every field and every loss method; this
// keeps the page in step with the schema and the core's method table.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { METHODS, type MethodSpec } from '../../src/core';
import { CURRENT_SCENARIO_VERSION, FIELD_HELP, LINK_PREFIX, MAX_LINK_CHARS } from '../../src/scenario';
import { FILE_FORMAT_TAG } from '../../src/scenario/file';
import { LIBRARY_FORMAT_TAG, LIBRARY_KEY, MAX_DELETED } from '../../src/scenario/library';

const page = readFileSync(join(import.meta.dirname, '../../docs/scenario-schema.md'), 'utf8');

describe('docs/scenario-schema.md', () => {
  it.each(Object.keys(FIELD_HELP))('describes the field %s', (field) => {
    expect(page).toContain(`| \`${field}\` |`);
  });

  it.each(Object.keys(METHODS))('describes the loss method %s and each of its parameters', (kind) => {
    const spec = METHODS[kind as keyof typeof METHODS] as MethodSpec;
    const row = page.split('\n').find((line) => line.startsWith(`| \`${kind}\` |`));
    expect(row, `add a row for "${kind}" to the loss method table`).toBeDefined();
    for (const key of [...spec.params.map((p) => String(p.key)), ...(spec.choices ?? []).map((c) => String(c.key))]) {
      expect(row, `add "${key}" to the row for "${kind}"`).toContain(`\`${key}\``);
    }
  });

  it('states the limits and names the code uses', () => {
    expect(page).toContain(`version ${CURRENT_SCENARIO_VERSION}`);
    expect(page).toContain(`\`${LINK_PREFIX}\``);
    expect(page).toContain(MAX_LINK_CHARS.toLocaleString('en-US'));
    expect(page).toContain(`"$format":\n"${FILE_FORMAT_TAG}"`);
    expect(page).toContain(`"$format": "${LIBRARY_FORMAT_TAG}"`);
    expect(page).toContain(`\`${LIBRARY_KEY}\``);
    expect(page).toContain(`the last ${MAX_DELETED} kept`);
  });
});
