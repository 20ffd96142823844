import { parseScenario } from '../scenario';
import type { Scenario } from '../scenario/types';

/**
 * Reads a scenario document from untrusted data (the browser's saved copy)
 * through the scenario layer's one schema (src/scenario/schema.ts: upgrades
 * older versions, checks every field, methods through the core). Never throws;
 * the message names the damaged fields.
 */
export type ReadResult =
  { readonly ok: true; readonly scenario: Scenario } | { readonly ok: false; readonly message: string };

export function readScenario(value: unknown): ReadResult {
  const result = parseScenario(value);
  if (result.ok) return { ok: true, scenario: result.scenario };
  return { ok: false, message: result.problems.map((p) => p.message).join(' ') };
}

/** Parses saved JSON text and reads it as a scenario. */
export function readScenarioJson(json: string): ReadResult {
  let value: unknown;
  try {
    value = JSON.parse(json);
  } catch (error) {
    return {
      ok: false,
      message: `The saved text is not valid JSON (${error instanceof Error ? error.message : String(error)}).`,
    };
  }
  return readScenario(value);
}
