// Reads a scenario off the page's thread (./open-scenario.ts, the work in ./scenario-read.ts): a 10⁶-bar scenario
// file's JSON.parse and schema check held the page 0.9 to 1.6 s in one task, the large store's record 0.5 to 1.4 s
// (measured, bench:ui open1e6, list1e6 and restore1e6).
import { answerRead } from './scenario-read';
import type { ScenarioReadAnswer, ScenarioReadRequest } from './scenario-read-messages';

// The worker's global, typed by hand: the project's types are the page's (DOM), not the worker's.
interface WorkerScope {
  onmessage: ((event: MessageEvent<ScenarioReadRequest>) => void) | null;
  postMessage(message: ScenarioReadAnswer, transfer: Transferable[]): void;
}
const scope = self as unknown as WorkerScope;

scope.onmessage = (event: MessageEvent<ScenarioReadRequest>) => {
  void answerRead(event.data).then(({ answer, transfer }) => scope.postMessage(answer, transfer));
};
