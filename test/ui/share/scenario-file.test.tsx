// @vitest-environment jsdom
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { CAUTION_TEXT, scenarioFromFileText, scenarioToFileText } from '../../../src/scenario';
import { STORAGE_KEY } from '../../../src/store';
import { FOUR_BARS, memoryStorage } from '../../helpers/scenario-fixtures';
import { SHARED, renderTools, savedText } from '../../helpers/render-tools';

const MESSAGE = 'Scenario tools message';
const jsonFile = (text: string, name = 'colleague.json') => new File([text], name, { type: 'application/json' });

describe('scenario files', () => {
  it('Save as file writes a readable file with the caution that opens back to the same scenario', async () => {
    const { user, saved } = renderTools({ fallback: SHARED });
    await user.click(screen.getByRole('button', { name: 'Save as file' }));
    expect(saved).toHaveLength(1);
    expect(saved[0]?.name).toBe('shared-larkspur-lane-culvert-12-feb-storm-invented.json');
    const text = await savedText(saved);
    expect(text).toContain(CAUTION_TEXT);
    const back = scenarioFromFileText(text);
    expect(back.ok && back.scenario).toEqual(SHARED);
    expect(screen.getByRole('status', { name: MESSAGE })).toHaveTextContent(
      'Saved as shared-larkspur-lane-culvert-12-feb-storm-invented.json.',
    );
  });

  it('a good file opens as one undoable step', async () => {
    const { user, scenario } = renderTools();
    await user.upload(screen.getByLabelText('Scenario file to open'), jsonFile(scenarioToFileText(SHARED)));
    expect(await screen.findByRole('status', { name: MESSAGE })).toHaveTextContent(
      `Opened “${SHARED.name}” from colleague.json.`,
    );
    expect(scenario()).toEqual(SHARED);
    await user.click(screen.getByRole('button', { name: 'Undo' }));
    expect(scenario()).toEqual(FOUR_BARS);
  });

  it('a file with bad fields lists every problem with its field path, and the scenario on screen and in the browser is unchanged', async () => {
    const storage = memoryStorage({ [STORAGE_KEY]: JSON.stringify(FOUR_BARS) });
    const { user, scenario } = renderTools({ storage });
    const doc = JSON.parse(scenarioToFileText(SHARED));
    doc.storm.depthsMm[3] = -2;
    doc.method.kPerH = 0;
    doc.colour = 'blue';
    await user.upload(
      screen.getByLabelText('Scenario file to open'),
      jsonFile(JSON.stringify(doc, null, 2), 'edited by hand.json'),
    );
    const alert = await screen.findByRole('alert', { name: MESSAGE });
    expect(alert).toHaveTextContent('edited by hand.json was not opened; the scenario on screen is unchanged.');
    const list = within(alert).getByRole('list', { name: 'Problems in edited by hand.json' });
    const items = within(list)
      .getAllByRole('listitem')
      .map((li) => li.getAttribute('data-path'));
    expect(items).toEqual(expect.arrayContaining(['storm.depthsMm[3]', 'method.kPerH', 'colour']));
    expect(list).toHaveTextContent('storm.depthsMm[3] (bar 4): must be a number ≥ 0');
    expect(scenario()).toEqual(FOUR_BARS);
    expect(JSON.parse(storage.data.get(STORAGE_KEY) as string)).toEqual(FOUR_BARS);
    expect(screen.getByRole('button', { name: 'Undo' })).toBeDisabled();
  });

  it('a file that is not JSON says where its text breaks', async () => {
    const { user, scenario } = renderTools();
    const text = scenarioToFileText(SHARED).replace('"units": "us",', '"units": "us"');
    await user.upload(screen.getByLabelText('Scenario file to open'), jsonFile(text, 'cut.json'));
    const alert = await screen.findByRole('alert', { name: MESSAGE });
    expect(alert).toHaveTextContent(/The file is not valid JSON: .*line \d+, column \d+/);
    expect(scenario()).toEqual(FOUR_BARS);
  });

  it('a JSON file of something else says it is not a scenario file', async () => {
    const { user, scenario } = renderTools();
    await user.upload(screen.getByLabelText('Scenario file to open'), jsonFile('{"rows": [1, 2, 3]}', 'other.json'));
    expect(await screen.findByRole('alert', { name: MESSAGE })).toHaveTextContent(
      '$format: is missing, so this JSON file is not a Raincut scenario',
    );
    expect(scenario()).toEqual(FOUR_BARS);
  });
});
