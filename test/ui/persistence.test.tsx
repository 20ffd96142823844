// @vitest-environment jsdom
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../src/scenario/demo';
import { SET_ASIDE_PREFIX, STORAGE_KEY, loadScenario } from '../../src/store';
import { CAUTION_TEXT } from '../../src/scenario';
import { renderWorkbench } from '../helpers/render';
import { FOUR_BARS, memoryStorage } from '../helpers/scenario-fixtures';

const NOW = '2026-03-01T10:00:00.000Z';

describe('opening the workbench from saved data', () => {
  it('a damaged saved scenario is reported with where it was kept, over a working screen', async () => {
    const storage = memoryStorage({ [STORAGE_KEY]: '{"version":1,"name":"half a file' });
    const loaded = loadScenario(storage, DEMO_SCENARIO, NOW);
    const { user } = renderWorkbench(loaded.scenario, { notice: loaded.notice });
    const alert = screen.getByRole('alert');
    expect(alert).toHaveTextContent('Saved scenario set aside.');
    expect(alert).toHaveTextContent(`${SET_ASIDE_PREFIX}${NOW}`);
    expect(storage.data.get(`${SET_ASIDE_PREFIX}${NOW}`)).toBe('{"version":1,"name":"half a file');
    // The rest of the screen works: the demo is open.
    expect(screen.getByRole('textbox', { name: 'Scenario name' })).toHaveValue(DEMO_SCENARIO.name);
    expect(screen.getByLabelText('Rainfall depth')).toHaveTextContent('41.6 mm');
    await user.click(screen.getByRole('button', { name: 'Dismiss' }));
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('a saved scenario opens as it was', () => {
    const storage = memoryStorage({ [STORAGE_KEY]: JSON.stringify({ ...FOUR_BARS, name: 'Saved one', units: 'us' }) });
    const loaded = loadScenario(storage, DEMO_SCENARIO, NOW);
    renderWorkbench(loaded.scenario, { notice: loaded.notice });
    expect(screen.getByRole('textbox', { name: 'Scenario name' })).toHaveValue('Saved one');
    expect(screen.getByRole('radio', { name: 'US customary' })).toBeChecked();
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('the caution is always on screen', () => {
    renderWorkbench();
    expect(screen.getByRole('complementary', { name: 'Caution' })).toHaveTextContent(CAUTION_TEXT);
    expect(CAUTION_TEXT).toMatch(/screening/);
    expect(CAUTION_TEXT).toMatch(/local drainage criteria/);
    expect(CAUTION_TEXT).toMatch(/licensed professional/);
  });
});
