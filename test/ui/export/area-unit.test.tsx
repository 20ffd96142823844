// @vitest-environment jsdom
import { act, cleanup, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { STORAGE_KEY, AREA_UNITS_KEY } from '../../../src/store';
import { loadReport } from '../../../src/ui/export';
import { FOUR_BARS, memoryStorage } from '../../helpers/scenario-fixtures';
import { renderTools, savedText } from '../../helpers/render-tools';

const catchmentNote = (csv: string): string | undefined =>
  csv.split('\r\n').find((l) => l.replace(/^\ufeff/, '').startsWith('#,"Catchment:'));

async function exportCsv(view: ReturnType<typeof renderTools>): Promise<string> {
  const before = view.saved.length;
  await view.user.click(screen.getByRole('button', { name: 'Export CSV' }));
  await waitFor(() => expect(view.saved.length).toBe(before + 1));
  return savedText(view.saved);
}

function reportInputs(): HTMLElement {
  act(() => {
    window.dispatchEvent(new Event('beforeprint'));
  });
  const report = screen.getByRole('article', { name: 'Printable report' });
  return within(report).getByRole('region', { name: 'Inputs' });
}

describe('the catchment area in the unit chosen on screen', () => {
  it('the CSV export and the report write the area in the chosen unit, and the choice outlives a reload (not in the scenario)', async () => {
    const storage = memoryStorage();
    const first = renderTools({ storage, fallback: FOUR_BARS });
    // FOUR_BARS has 1 km² = 10⁶ m² = 100 ha (1 ha = 10⁴ m²): shown in hectares until another unit is chosen.
    expect(catchmentNote(await exportCsv(first))).toBe('#,"Catchment: Test catchment; 100 ha"');

    await first.user.selectOptions(screen.getByRole('combobox', { name: 'Area unit' }), 'km2');
    expect(screen.getByRole('textbox', { name: /^Catchment area/ })).toHaveValue('1');
    // 10⁶ m² / 10⁶ m² per km² = 1 km².
    expect(catchmentNote(await exportCsv(first))).toBe('#,"Catchment: Test catchment; 1 km²"');
    await act(() => loadReport());
    expect(reportInputs()).toHaveTextContent('Test catchment, 1 km²');
    act(() => {
      window.dispatchEvent(new Event('afterprint'));
    });

    // The choice is kept as a preference of this browser; the scenario document does not carry it.
    expect(JSON.parse(storage.data.get(AREA_UNITS_KEY) ?? 'null')).toEqual({ si: 'km2', us: 'acre' });
    act(() => first.actions.setNotes('Saved after choosing another area unit.'));
    await waitFor(() => expect(storage.data.get(STORAGE_KEY)).toBeDefined());
    const saved = storage.data.get(STORAGE_KEY) ?? '';
    expect(saved).not.toMatch(/km2|areaUnit/);
    expect(JSON.parse(saved)).toMatchObject({ version: 5, catchment: { areaM2: 1e6 } });

    // Reload: a new page on the same storage.
    first.unmount();
    cleanup();
    const second = renderTools({ storage, fallback: FOUR_BARS });
    expect(screen.getByRole('combobox', { name: 'Area unit' })).toHaveValue('km2');
    expect(screen.getByRole('textbox', { name: /^Catchment area/ })).toHaveValue('1');
    expect(catchmentNote(await exportCsv(second))).toBe('#,"Catchment: Test catchment; 1 km²"');
    expect(reportInputs()).toHaveTextContent('Test catchment, 1 km²');
  });

  it('each unit system keeps its own choice: square miles under US units, back to km² under SI', async () => {
    const storage = memoryStorage();
    const view = renderTools({ storage, fallback: FOUR_BARS });
    await view.user.selectOptions(screen.getByRole('combobox', { name: 'Area unit' }), 'km2');
    act(() => view.actions.setUnits('us'));
    expect(screen.getByRole('combobox', { name: 'Area unit' })).toHaveValue('acre');
    await view.user.selectOptions(screen.getByRole('combobox', { name: 'Area unit' }), 'mi2');
    // 10⁶ m² / 2,589,988.110336 m² per mi² (1 mi = 1609.344 m, squared) = 0.386102… mi², four figures in notes.
    expect(catchmentNote(await exportCsv(view))).toBe('#,"Catchment: Test catchment; 0.3861 mi²"');
    act(() => view.actions.setUnits('si'));
    expect(screen.getByRole('combobox', { name: 'Area unit' })).toHaveValue('km2');
    expect(JSON.parse(storage.data.get(AREA_UNITS_KEY) ?? 'null')).toEqual({ si: 'km2', us: 'mi2' });
  });
});
