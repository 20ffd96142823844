import type { ReactNode } from 'react';
import { useWorkbenchStore } from '../../store';
// Straight from the modules, not the import kit's index, so the import dialogs' code stays out of the first screen.
import { OpenFileButton } from '../import-kit/OpenFileButton';
import { readAsText } from '../import-kit/read-file';
import { ProblemList, useBarMessage } from '../services/bar-message';
import { useServices } from '../services/services';
import { formatValue } from '../format';

const megabytes = (bytes: number): string => `${formatValue(bytes / (1024 * 1024))} MB`;

// The file writer and reader load on the first click: they are not part of the first screen.
const fileCode = () => import('../../scenario/file');
// A long file is read off the page, and a long storm made ready in steps before the edit (issue 11).
const openCode = () => import('../../store/open-scenario');

/**
 * "Save as file" writes the scenario as a readable .json file (with the
 * caution); "Open scenario file…" reads one back. A file that cannot be
 * opened lists each problem with its field path and changes nothing; one
 * that opens replaces the scenario as one undoable step.
 */
export function ScenarioFile() {
  const store = useWorkbenchStore();
  const { saveFile } = useServices();
  const show = useBarMessage();

  const save = async (): Promise<void> => {
    const { scenarioFileName, scenarioToFileText } = await fileCode();
    const scenario = store.getState().scenario;
    const name = scenarioFileName(scenario);
    saveFile(new Blob([scenarioToFileText(scenario)], { type: 'application/json' }), name);
    show({
      tone: 'done',
      title: `Saved as ${name}.`,
      body: <p>Open it again with “Open scenario file…”, here or in any Raincut.</p>,
    });
  };

  const open = async (file: File): Promise<void> => {
    const name = file.name || 'The file';
    const refuse = (body: ReactNode): void =>
      show({ tone: 'problem', title: `${name} was not opened; the scenario on screen is unchanged.`, body });
    const { MAX_FILE_CHARS, scenarioFromFileText } = await fileCode();
    if (file.size > MAX_FILE_CHARS) {
      refuse(
        <p>
          It is {megabytes(file.size)}; a scenario file may be at most {megabytes(MAX_FILE_CHARS)}.
        </p>,
      );
      return;
    }
    const opening = await openCode();
    // A long file takes a second or more to read and check: said, so the wait is not taken for nothing happening.
    if (file.size >= opening.READ_OFF_PAGE_FROM_BYTES) {
      show({
        tone: 'done',
        title: `Opening ${name} (${megabytes(file.size)})…`,
        body: <p>The scenario on screen stays as it is until the file has been read and checked.</p>,
      });
    }
    let read = await opening.readScenarioFileOffPage(file);
    if (read === null) {
      let text: string;
      try {
        text = await readAsText(file);
      } catch (error) {
        refuse(<p>It could not be read ({error instanceof Error ? error.message : String(error)}).</p>);
        return;
      }
      read = scenarioFromFileText(text);
    }
    if (!read.ok) {
      refuse(<ProblemList problems={read.problems} label={`Problems in ${name}`} />);
      return;
    }
    await opening.placeScenario(store, read.scenario, `Open ${name}`);
    show({
      tone: 'done',
      title: `Opened “${read.scenario.name}” from ${name}.`,
      body: <p>Undo brings back the scenario you had before.</p>,
    });
  };

  return (
    <>
      <button type="button" onClick={() => void save()}>
        Save as file
      </button>
      <OpenFileButton inputLabel="Scenario file to open" accept=".json,application/json" onFile={open}>
        Open scenario file…
      </OpenFileButton>
    </>
  );
}
