// @vitest-environment jsdom
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { convertArea, convertDepth, convertRate, convertVolume, runoffVolumeM3 } from '../../src/core';
import { formatValue } from '../../src/ui/format';
import { coreTotals, renderWorkbench } from '../helpers/render';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

describe('the unit switch', () => {
  it('shows every result in US customary units, converted by the core’s exact factors', async () => {
    const { user } = renderWorkbench();
    await user.click(screen.getByRole('radio', { name: 'US customary' }));
    const t = coreTotals(FOUR_BARS.storm, FOUR_BARS.method);
    expect(screen.getByLabelText('Rainfall depth')).toHaveTextContent(
      `${formatValue(convertDepth(t.rainMm, 'mm', 'in'))} in`,
    );
    expect(screen.getByLabelText('Excess depth')).toHaveTextContent(
      `${formatValue(convertDepth(t.totalExcessMm, 'mm', 'in'))} in`,
    );
    expect(screen.getByLabelText('Peak excess intensity')).toHaveTextContent(
      `${formatValue(convertRate(t.peakExcessMmH, 'mm/h', 'in/h'))} in/h`,
    );
    expect(screen.getByLabelText('Runoff volume')).toHaveTextContent(
      `${formatValue(convertVolume(runoffVolumeM3(t.totalExcessMm, 1e6), 'm3', 'acre-ft'))} acre-ft`,
    );
    expect(screen.getByRole('textbox', { name: 'Loss rate φ (in/h)' })).toHaveValue(
      String(Number((8 / 25.4).toPrecision(6))),
    );
    expect(screen.getByRole('textbox', { name: 'Catchment area' })).toHaveValue(
      String(Number(convertArea(1e6, 'm2', 'acre').toPrecision(6))),
    );
    expect(screen.getByRole('slider', { name: 'Loss rate φ' })).toHaveAttribute(
      'aria-valuetext',
      `${formatValue(8 / 25.4)} in/h`,
    );
  });

  it('switching back and forth changes no stored value', async () => {
    const { user, scenario } = renderWorkbench();
    await user.click(screen.getByRole('radio', { name: 'US customary' }));
    await user.click(screen.getByRole('radio', { name: 'SI' }));
    expect({ ...scenario(), units: 'si' }).toEqual(FOUR_BARS);
    expect(screen.getByRole('textbox', { name: 'Loss rate φ (mm/h)' })).toHaveValue('8');
  });

  it('values typed in US units are stored exactly in SI', async () => {
    const { user, scenario } = renderWorkbench();
    await user.click(screen.getByRole('radio', { name: 'US customary' }));
    const area = screen.getByRole('textbox', { name: 'Catchment area' });
    await user.clear(area);
    await user.type(area, '1');
    // The core's acre factor (43,560 ft² of 0.3048 m), used as is: no factor of the UI's own.
    expect(scenario().catchment.areaM2).toBe(convertArea(1, 'acre', 'm2'));
    expect(scenario().catchment.areaM2).toBeCloseTo(4046.8564224, 9);
    const rate = screen.getByRole('textbox', { name: 'Loss rate φ (in/h)' });
    await user.clear(rate);
    await user.type(rate, '0.5');
    expect((scenario().method as { rateMmH: number }).rateMmH).toBe(12.7);
    await user.type(screen.getByRole('textbox', { name: 'Observed runoff (in)' }), '0.1');
    expect(scenario().observed?.value).toBe(2.54);
    await user.click(screen.getByRole('radio', { name: 'SI' }));
    expect(screen.getByRole('textbox', { name: 'Loss rate φ (mm/h)' })).toHaveValue('12.7');
  });

  it('the chart’s rate axis is labelled in the units on screen', async () => {
    const { user } = renderWorkbench();
    expect(document.querySelector('.axes')).toHaveTextContent('Rainfall intensity (mm/h)');
    await user.click(screen.getByRole('radio', { name: 'US customary' }));
    expect(document.querySelector('.axes')).toHaveTextContent('Rainfall intensity (in/h)');
  });
});
