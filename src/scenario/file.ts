import { CAUTION_TEXT } from './caution';
import { prettyJson } from './pretty-json';
import { describeValue, failure, problem, problemAt, type Problem, type ScenarioResult } from './problems';
import { parseScenario } from './schema';
import type { Scenario } from './types';

/**
 * A scenario file is the scenario document with two more fields in front:
 * "$format" says what the file is, and "caution" carries the caution text
 * with the numbers. All other fields are the document's own, at the top
 * level, so a problem's path is the same in the file as in the document.
 */
export const FILE_FORMAT_TAG = 'raincut-scenario';

/** Longest file text read (64 Mi characters; a million bars take about 25 M). */
export const MAX_FILE_CHARS = 64 * 1024 * 1024;

export function scenarioToFileText(scenario: Scenario): string {
  return `${prettyJson({ $format: FILE_FORMAT_TAG, caution: CAUTION_TEXT, ...scenario })}\n`;
}

/** A file name for saving: the scenario name made safe for file systems. */
export function scenarioFileName(scenario: Pick<Scenario, 'name'>): string {
  const base = scenario.name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/[^A-Za-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
    .toLowerCase();
  return `${base || 'scenario'}.json`;
}

/** Line and column (from 1) of a character offset, for JSON syntax errors. */
function lineAndColumn(text: string, offset: number): string {
  let line = 1;
  let start = 0;
  for (let i = 0; i < offset && i < text.length; i++) {
    if (text.charCodeAt(i) === 10) {
      line++;
      start = i + 1;
    }
  }
  return `line ${line}, column ${offset - start + 1}`;
}

function syntaxProblem(text: string, error: unknown): Problem {
  const why = error instanceof Error ? error.message : String(error);
  const position = /position (\d+)/.exec(why);
  const where = position && !/line \d+/.test(why) ? ` (${lineAndColumn(text, Number(position[1]))})` : '';
  return problem(`The file is not valid JSON: ${why}${where}.`);
}

function read(raw: string): ScenarioResult {
  if (raw.length > MAX_FILE_CHARS) {
    return failure([
      problem(`The file is ${raw.length} characters long; a scenario file may have at most ${MAX_FILE_CHARS}.`),
    ]);
  }
  // Editors on some systems put a byte-order mark in front.
  const text = raw.charCodeAt(0) === 0xfeff ? raw.slice(1) : raw;
  if (text.trim() === '') return failure([problem('The file is empty.')]);
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    return failure([syntaxProblem(text, error)]);
  }
  if (json === null || typeof json !== 'object' || Array.isArray(json)) {
    return failure([
      problem(`The file does not hold a Raincut scenario: its JSON is ${describeValue(json)}, not an object.`),
    ]);
  }
  const { $format: tag, caution, ...doc } = json as Record<string, unknown>;
  if (tag !== FILE_FORMAT_TAG) {
    return failure([
      problemAt(
        ['$format'],
        tag === undefined
          ? `is missing, so this JSON file is not a Raincut scenario (a scenario file has "$format": "${FILE_FORMAT_TAG}").`
          : `is ${describeValue(tag)}; a Raincut scenario file has "${FILE_FORMAT_TAG}".`,
      ),
    ]);
  }
  const problems: Problem[] = [];
  // The caution is for people reading the file; any text is accepted back.
  if (caution !== undefined && typeof caution !== 'string') {
    problems.push(problemAt(['caution'], `must be text (got ${describeValue(caution)}).`));
  }
  const result = parseScenario(doc);
  if (!result.ok) for (const p of result.problems) problems.push(p);
  return problems.length === 0 && result.ok ? result : failure(problems);
}

/**
 * Reads a scenario file's text. Never throws: problems come back with the
 * field path ('' for the file as a whole) and, for JSON syntax, the line
 * and column.
 */
export function scenarioFromFileText(text: string): ScenarioResult {
  if (typeof text !== 'string') return failure([problem('The file could not be read: it is not text.')]);
  try {
    return read(text);
  } catch (error) {
    // A safety net only; the fuzz tests check it is never reached.
    const why = error instanceof Error ? error.message : String(error);
    return failure([problem(`The file could not be read (unexpected error: ${why}).`)]);
  }
}
