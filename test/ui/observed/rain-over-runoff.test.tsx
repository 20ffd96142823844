// @vitest-environment jsdom
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { Scenario } from '../../../src/scenario/types';
import { lazyPartsLoaded, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

const WITH_UH: Scenario = {
  ...FOUR_BARS,
  hydrograph: { ...FOUR_BARS.hydrograph, transform: { kind: 'triangular', lagH: 1 } },
};

async function openView(scenario: Scenario) {
  const view = renderWorkbench(scenario);
  await view.user.click(screen.getByRole('tab', { name: 'Rain over runoff' }));
  await lazyPartsLoaded();
  return within(await screen.findByRole('region', { name: 'Rain over runoff' }));
}

describe('rain over runoff', () => {
  it('hangs the workbench’s storm from the top, its losses and excess worked by hand', async () => {
    const region = await openView(WITH_UH);
    // FOUR_BARS: bars of 30 min with 2, 6, 10, 2 mm under φ = 8 mm/h (4 mm a bar): losses 2, 4, 4, 2 = 12 mm,
    // excess 0, 2, 6, 0 = 8 mm of 20 mm.
    const hanging = region.getByRole('img', { name: /^Hanging hyetograph/ });
    expect(hanging).toHaveAccessibleName('Hanging hyetograph: 20 mm of rain, 8 mm of it excess.');
    // The bars are the workbench chart's layers, mirrored about the plot's middle (18 px top margin).
    const mirrored = hanging.querySelector('g[transform*="scale(1,-1)"]');
    expect(mirrored?.querySelector('[data-layer="rain"]')).not.toBeNull();
    expect(mirrored?.querySelector('[data-layer="loss"]')).not.toBeNull();
    expect(region.getByText(/^Rain \(mm\/h\)$/)).toBeInTheDocument();
  });

  it('draws the computed hydrograph under it on the same time axis', async () => {
    const region = await openView(WITH_UH);
    const hanging = region.getByRole('img', { name: /^Hanging hyetograph/ });
    const plot = document.querySelector('.rain-over-runoff__figure svg[aria-labelledby="rain-over-runoff-title"]');
    expect(plot?.querySelector('[data-layer="computed-direct"]')).not.toBeNull();
    // One time scale: the hanging chart's ticks stand where the hydrograph's time labels are.
    const tickX = [...hanging.querySelectorAll('line.axes__tick')].map((l) => l.getAttribute('x1'));
    const labelX = [...(plot?.querySelectorAll('line.axes__tick') ?? [])].map(
      (l) => /translate\(([\d.]+),/.exec(l.parentElement?.getAttribute('transform') ?? '')?.[1],
    );
    expect(tickX.length).toBeGreaterThan(1);
    expect(tickX.map(Number)).toEqual(labelX.map(Number));
  });

  it('cuts the computed line’s near-zero tail at the plot’s right edge (it ran past the axis and off the chart)', async () => {
    // Nash's cascade has a long recession: the axis ends once 99.9 % of the unit hydrograph's volume is in.
    await openView({ ...FOUR_BARS, hydrograph: { ...FOUR_BARS.hydrograph, transform: { kind: 'nash', n: 3, kH: 1 } } });
    const plot = document.querySelector('.rain-over-runoff__figure svg[aria-labelledby="rain-over-runoff-title"]');
    const line = plot?.querySelector('[data-layer="computed-direct"]');
    const xs = [...(line?.getAttribute('d') ?? '').matchAll(/[ML]([\d.]+),/g)].map((m) => Number(m[1]));
    const clipped = line?.closest('g[clip-path]');
    const id = /^url\(#([\w-]+)\)$/.exec(clipped?.getAttribute('clip-path') ?? '')?.[1];
    const rect = id ? plot?.querySelector(`clipPath#${id} rect`) : null;
    expect(rect).toBeTruthy();
    const right = Number(rect?.getAttribute('x')) + Number(rect?.getAttribute('width'));
    // The series runs on past the axis (its last samples carry the last of the volume), so the clip is what stops it.
    expect(Math.max(...xs)).toBeGreaterThan(right); // spread-ok: one path's points, a few hundred at most
    const ticks = [...(plot?.querySelectorAll('line.axes__tick') ?? [])].map((l) =>
      Number(/translate\(([\d.]+),/.exec(l.parentElement?.getAttribute('transform') ?? '')?.[1]),
    );
    expect(right).toBeGreaterThanOrEqual(Math.max(...ticks)); // spread-ok: the axis's ticks, a dozen or so
  });

  it('says what to do when there is neither a unit hydrograph nor a record', async () => {
    const region = await openView(FOUR_BARS);
    expect(region.getByText(/No hydrograph to hang the storm over yet/)).toBeInTheDocument();
    expect(region.getByRole('img', { name: /^Hanging hyetograph/ })).toBeInTheDocument();
  });
});
