// @vitest-environment jsdom
import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { Scenario } from '../../../src/scenario/types';
import { chartFrame } from '../../../src/ui/chart/frame';
import { chartHeightFor } from '../../../src/ui/chart/chart-height';
import { expectAllClose } from '../../helpers/tolerance';
import { lazyPartsLoaded, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

/** The chart's height in this window (jsdom's 768 px tall one), as the page draws it. */
const CHART_HEIGHT = chartHeightFor(window.innerHeight);

// jsdom lays nothing out: the chart keeps its fallback width (880 px) and sits at
// the top left, so a pointer's clientX/clientY are the chart's own x and y.
const frame = chartFrame(FOUR_BARS.storm, 880, CHART_HEIGHT, 'si');
const centre = (k: number) => ((frame.edgesPx[k] as number) + (frame.edgesPx[k + 1] as number)) / 2;

async function startDrawing(user: ReturnType<typeof renderWorkbench>['user']) {
  await user.click(screen.getByRole('button', { name: 'Draw bars' }));
  // The drawing settings' code loads when drawing first starts.
  await lazyPartsLoaded();
  return screen.getByRole('application', { name: /^Drawing area/ });
}

describe('drawing bars on the chart', () => {
  it('is a mode switched by a pressed button, with its own panel', async () => {
    const { user } = renderWorkbench();
    const button = screen.getByRole('button', { name: 'Draw bars' });
    expect(button).toHaveAttribute('aria-pressed', 'false');
    expect(screen.queryByRole('application')).toBeNull();
    await startDrawing(user);
    expect(button).toHaveAttribute('aria-pressed', 'true');
    const panel = screen.getByRole('region', { name: 'Drawing bars' });
    expect(panel).toHaveTextContent('Heights snap to 0.1 mm/h');
    await user.click(within(panel).getByRole('button', { name: 'Stop drawing' }));
    expect(screen.queryByRole('application')).toBeNull();
    expect(button).toHaveAttribute('aria-pressed', 'false');
  });

  it('a stroke sets every bar it crosses to the rate under the pointer, as one undo step', async () => {
    const { user, scenario, store } = renderWorkbench();
    const area = await startDrawing(user);
    fireEvent.pointerDown(area, { pointerId: 1, button: 0, clientX: centre(0), clientY: frame.y(6) });
    fireEvent.pointerMove(area, { pointerId: 1, clientX: centre(1), clientY: frame.y(6) });
    // Nothing is stored until the stroke ends; the stroke is shown over the chart as it goes.
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    expect(document.querySelector('[data-layer="drawn"]')?.getAttribute('d')).toMatch(/^M/);
    fireEvent.pointerMove(area, { pointerId: 1, clientX: centre(2), clientY: frame.y(16) });
    fireEvent.pointerUp(area, { pointerId: 1, clientX: centre(2), clientY: frame.y(16) });
    // Bars of 0.5 h: depth = rate × 0.5 h; bar 4 was not touched.
    expectAllClose(scenario().storm.depthsMm, [3, 3, 8, 2], 1e-12);
    expect(store.getState().history.past).toHaveLength(1);
    expect(store.getState().undoLabel).toBe('Draw bars');
    expect(document.querySelector('[data-layer="drawn"]')).toBeNull();
    await user.click(screen.getByRole('button', { name: 'Undo' }));
    expect(scenario().storm).toBe(FOUR_BARS.storm);
  });

  it('on an empty storm the axis follows the pointer: one stroke above the chart draws a tall bar', async () => {
    const dry = { ...FOUR_BARS, storm: { durationsH: [0.5, 0.5, 0.5, 0.5], depthsMm: [0, 0, 0, 0] } };
    const { user, scenario } = renderWorkbench(dry);
    const area = await startDrawing(user);
    const empty = chartFrame(dry.storm, 880, CHART_HEIGHT, 'si');
    expect(empty.topMmH).toBe(10);
    const x = ((empty.edgesPx[0] as number) + (empty.edgesPx[1] as number)) / 2;
    fireEvent.pointerDown(area, { pointerId: 1, button: 0, clientX: x, clientY: empty.y(2) });
    // The pointer (captured) goes one plot height above the plot's top: on the stroke's own scale that is 20 mm/h,
    // twice the axis. Before, a stroke stopped near the axis top (about 10.6 mm/h) and the axis grew 12 % a stroke.
    const plotPx = empty.plot.bottom - empty.plot.top;
    fireEvent.pointerMove(area, { pointerId: 1, clientX: x, clientY: empty.plot.top - plotPx });
    fireEvent.pointerUp(area, { pointerId: 1, clientX: x, clientY: empty.plot.top - plotPx });
    // 20 mm/h over a 0.5 h bar = 10 mm.
    expect(scenario().storm.depthsMm[0]).toBeCloseTo(10, 9);
  });

  it('a fast sweep fills the bars between two pointer events along a straight line', async () => {
    const flat: Scenario = { ...FOUR_BARS, storm: { durationsH: [0.5, 0.5, 0.5, 0.5], depthsMm: [5, 5, 5, 5] } };
    const f = chartFrame(flat.storm, 880, CHART_HEIGHT, 'si');
    const mid = (k: number) => ((f.edgesPx[k] as number) + (f.edgesPx[k + 1] as number)) / 2;
    const { user, scenario } = renderWorkbench(flat);
    const area = await startDrawing(user);
    fireEvent.pointerDown(area, { pointerId: 1, button: 0, clientX: mid(0), clientY: f.y(2) });
    fireEvent.pointerMove(area, { pointerId: 1, clientX: mid(3), clientY: f.y(8) });
    fireEvent.pointerUp(area, { pointerId: 1, clientX: mid(3), clientY: f.y(8) });
    expectAllClose(scenario().storm.depthsMm, [1, 2, 3, 4], 1e-12);
  });

  it('never draws a negative bar: below the axis is zero', async () => {
    const { user, scenario } = renderWorkbench();
    const area = await startDrawing(user);
    fireEvent.pointerDown(area, { pointerId: 1, button: 0, clientX: centre(2), clientY: frame.plot.bottom + 60 });
    fireEvent.pointerUp(area, { pointerId: 1, clientX: centre(2), clientY: frame.plot.bottom + 60 });
    expect(scenario().storm.depthsMm).toEqual([2, 6, 0, 2]);
  });

  it('respects US customary units: heights snap to a grid in inches per hour', async () => {
    const us: Scenario = { ...FOUR_BARS, units: 'us' };
    const f = chartFrame(us.storm, 880, CHART_HEIGHT, 'us');
    const { user, scenario } = renderWorkbench(us);
    const area = await startDrawing(user);
    expect(screen.getByRole('region', { name: 'Drawing bars' })).toHaveTextContent('Heights snap to 0.01 in/h');
    // 0.333 in/h on the axis snaps to 0.33 in/h; the bar holds 0.33 in/h × 0.5 h, stored in mm.
    fireEvent.pointerDown(area, { pointerId: 1, button: 0, clientX: centre(0), clientY: f.y(0.333 * 25.4) });
    fireEvent.pointerUp(area, { pointerId: 1, clientX: centre(0), clientY: f.y(0.333 * 25.4) });
    expectAllClose([scenario().storm.depthsMm[0] as number], [0.33 * 25.4 * 0.5], 1e-12);
  });

  it('a cancelled pointer or Escape drops the stroke and changes nothing', async () => {
    const { user, scenario, store } = renderWorkbench();
    const area = await startDrawing(user);
    fireEvent.pointerDown(area, { pointerId: 1, button: 0, clientX: centre(0), clientY: frame.y(15) });
    fireEvent.pointerMove(area, { pointerId: 1, clientX: centre(3), clientY: frame.y(15) });
    fireEvent.pointerCancel(area, { pointerId: 1 });
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    fireEvent.pointerDown(area, { pointerId: 2, button: 0, clientX: centre(0), clientY: frame.y(15) });
    fireEvent.keyDown(window, { key: 'Escape' });
    fireEvent.pointerUp(area, { pointerId: 2, clientX: centre(1), clientY: frame.y(15) });
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    expect(store.getState().history.past).toHaveLength(0);
  });

  it('starts a new empty storm of the chosen bar duration and number of bars, undoably', async () => {
    const { user, scenario, store } = renderWorkbench();
    await startDrawing(user);
    const panel = screen.getByRole('region', { name: 'Drawing bars' });
    const step = within(panel).getByRole('textbox', { name: 'Bar duration (min)' });
    const count = within(panel).getByRole('textbox', { name: 'Number of bars' });
    expect(step).toHaveValue('30');
    expect(count).toHaveValue('4');
    await user.clear(step);
    await user.type(step, '15');
    await user.clear(count);
    await user.type(count, '2.5');
    await user.click(within(panel).getByRole('button', { name: 'Start a new empty storm' }));
    expect(within(panel).getByText('The number of bars must be a whole number, 1 or more.')).toBeInTheDocument();
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    await user.clear(count);
    await user.type(count, '8{Enter}');
    expect(scenario().storm).toEqual({ durationsH: Array(8).fill(0.25), depthsMm: Array(8).fill(0) });
    expect(store.getState().undoLabel).toBe('New empty storm');
    // And it can be drawn on straight away.
    const empty = chartFrame(scenario().storm, 880, CHART_HEIGHT, 'si');
    const area = screen.getByRole('application', { name: /^Drawing area/ });
    fireEvent.pointerDown(area, {
      pointerId: 1,
      button: 0,
      clientX: (empty.edgesPx[0] as number) + 5,
      clientY: empty.y(4),
    });
    fireEvent.pointerUp(area, { pointerId: 1, clientX: (empty.edgesPx[0] as number) + 5, clientY: empty.y(4) });
    expect(scenario().storm.depthsMm[0]).toBe(1);
  });
});
