// @vitest-environment jsdom
import { screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { scenarioToFileText } from '../../../src/scenario';
import type { Scenario } from '../../../src/scenario/types';
import { answerRead } from '../../../src/store/scenario-read';
import type { ScenarioReadAnswer, ScenarioReadRequest } from '../../../src/store/scenario-read-messages';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';
import { renderTools } from '../../helpers/render-tools';

// A long scenario file (over 1 MiB) is read and checked off the page by the scenario reader (a worker; here its
// work run in this process when the test lets it answer), said while it is read, and opened as one undoable step.

const MESSAGE = 'Scenario tools message';
const LONG = 70_000;

/** LONG bars of 5 min, 0 to 2.9 mm in steps of 0.1 mm (invented). */
function longScenario(): Scenario {
  const durationsH = new Array<number>(LONG).fill(5 / 60);
  const depthsMm = Array.from({ length: LONG }, (_, i) => (i % 30) / 10);
  return { ...FOUR_BARS, name: 'Long storm (invented)', storm: { durationsH, depthsMm } };
}

/** A Blob's text through jsdom's FileReader. */
function textOf(blob: Blob): Promise<string> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(reader.result as string);
    reader.onerror = () => reject(reader.error ?? new Error('unreadable'));
    reader.readAsText(blob);
  });
}

/** A stand-in for a Blob with text() (a worker's Blob has it; jsdom's has not). */
const withText = (text: string): Blob => ({ size: text.length, text: async () => text }) as unknown as Blob;

/** The scenario reader, answering only when the test says so. */
class HeldReader {
  static last: HeldReader | null = null;
  onmessage: ((event: { data: ScenarioReadAnswer }) => void) | null = null;
  onerror: ((event: { preventDefault(): void }) => void) | null = null;
  held: ScenarioReadRequest[] = [];
  constructor() {
    HeldReader.last = this;
  }
  postMessage(request: ScenarioReadRequest): void {
    this.held.push(request);
  }
  /** Reads what it holds, as the worker does; a File's text through FileReader (jsdom's File may lack text()). */
  async answer(): Promise<void> {
    for (const request of this.held.splice(0)) {
      const asked = request.kind === 'file' ? { ...request, file: withText(await textOf(request.file)) } : request;
      const { answer } = await answerRead(asked);
      this.onmessage?.({ data: answer });
    }
  }
  terminate(): void {}
}

beforeEach(() => vi.stubGlobal('Worker', HeldReader));
// The page keeps the reader it started (store/open-scenario.ts) for later files: HeldReader.last stays.
afterEach(() => vi.unstubAllGlobals());

describe('a long scenario file', () => {
  it('is read off the page, said while it is read, and opens as one undoable step', async () => {
    const { user, scenario } = renderTools();
    const long = longScenario();
    const file = new File([scenarioToFileText(long)], 'long.json', { type: 'application/json' });
    await user.upload(screen.getByLabelText('Scenario file to open'), file);
    expect(await screen.findByRole('status', { name: MESSAGE })).toHaveTextContent(
      /Opening long\.json \(1\.\d+ MB\)….*The scenario on screen stays as it is until the file has been read and checked\./,
    );
    await vi.waitFor(() => expect(HeldReader.last?.held.map((r) => r.kind)).toEqual(['file']));
    expect(scenario()).toEqual(FOUR_BARS);
    await HeldReader.last?.answer();
    await vi.waitFor(() =>
      expect(screen.getByRole('status', { name: MESSAGE })).toHaveTextContent(
        'Opened “Long storm (invented)” from long.json.',
      ),
    );
    expect(scenario()).toEqual(long);
    await user.click(screen.getByRole('button', { name: 'Undo' }));
    await vi.waitFor(() => expect(scenario()).toEqual(FOUR_BARS));
  });

  it('that the schema refuses lists its problems, and the scenario on screen is unchanged', async () => {
    const { user, scenario } = renderTools();
    const damaged = longScenario();
    (damaged.storm.depthsMm as number[])[LONG - 1] = -2;
    const file = new File([scenarioToFileText(damaged)], 'damaged.json', { type: 'application/json' });
    await user.upload(screen.getByLabelText('Scenario file to open'), file);
    await vi.waitFor(() => expect(HeldReader.last?.held).toHaveLength(1));
    await HeldReader.last?.answer();
    const alert = await screen.findByRole('alert', { name: MESSAGE });
    expect(alert).toHaveTextContent('damaged.json was not opened; the scenario on screen is unchanged.');
    expect(within(alert).getByRole('list', { name: 'Problems in damaged.json' })).toHaveTextContent(
      `storm.depthsMm[${LONG - 1}] (bar 70000): must be a number ≥ 0 (rain depth, mm) (got -2).`,
    );
    expect(scenario()).toEqual(FOUR_BARS);
    expect(screen.getByRole('button', { name: 'Undo' })).toBeDisabled();
  });
});
