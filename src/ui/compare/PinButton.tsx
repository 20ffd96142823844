import { useWorkbenchStore } from '../../store';
import { useBarMessage } from '../services/bar-message';
import { usePins, useServices } from '../services/services';
import { MAX_PINS } from '../../store/pin-board';
import './compare.css';

/** "Pin to compare": a copy of the scenario on screen joins the comparison (up to MAX_PINS). */
export function PinButton() {
  const store = useWorkbenchStore();
  const { pins: board } = useServices();
  const { pins } = usePins();
  const show = useBarMessage();
  const pin = async (): Promise<void> => {
    const result = await board.pin(store.getState().scenario);
    if (!result.ok) {
      show({ tone: 'problem', title: result.message });
      return;
    }
    const count = board.getState().pins.length;
    show({
      tone: 'done',
      title: `Pinned “${result.pin.scenario.name}” as ${count} of ${MAX_PINS}.`,
      body: (
        <p>
          The pin is a copy: editing the scenario on screen does not change it. The comparison is below the workbench.
        </p>
      ),
    });
  };
  return (
    <>
      <button type="button" onClick={() => void pin()} aria-describedby={pins.length > 0 ? 'pin-count' : undefined}>
        Pin to compare
      </button>
      {pins.length > 0 ? (
        // "1/4" on screen keeps the scenario tools one row at 1280 px (issue 16); the words are read out and shown on hover.
        <span id="pin-count" className="scenario-bar__count" title={`${pins.length} of ${MAX_PINS} pinned`}>
          <span aria-hidden="true">
            {pins.length}/{MAX_PINS}
          </span>
          <span className="visually-hidden">
            {pins.length} of {MAX_PINS} pinned
          </span>
        </span>
      ) : null}
    </>
  );
}
