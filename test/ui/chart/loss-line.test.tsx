// @vitest-environment jsdom
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { chartFrame } from '../../../src/ui/chart/frame';
import { chartHeightFor } from '../../../src/ui/chart/chart-height';
import { coreTotals, mmText, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

/** The chart's height in this window (jsdom's 768 px tall one), as the page draws it. */
const CHART_HEIGHT = chartHeightFor(window.innerHeight);

// jsdom lays nothing out: the chart keeps its fallback width and the svg sits at y = 0,
// so a pointer's clientY is the chart's own y.
const frame = chartFrame(FOUR_BARS.storm, 880, CHART_HEIGHT, 'si');
const rate = (s: { method: unknown }) => (s.method as { rateMmH: number }).rateMmH;

describe('the loss-rate line', () => {
  it('is a slider named by its parameter, with its value and unit', () => {
    renderWorkbench();
    const line = screen.getByRole('slider', { name: 'Loss rate φ' });
    expect(line).toHaveAttribute('aria-valuenow', '8');
    expect(line).toHaveAttribute('aria-valuetext', '8 mm/h');
    expect(line).toHaveAttribute('aria-valuemin', '0');
    expect(line).toHaveAttribute('aria-valuemax', String(frame.topDisplay));
    expect(line).toHaveAttribute('tabindex', '0');
  });

  it('dragged with the pointer, it follows the pointer and the results follow it live', async () => {
    const { scenario, store } = renderWorkbench();
    const line = screen.getByRole('slider', { name: 'Loss rate φ' });
    fireEvent.pointerDown(line, { pointerId: 1, button: 0, clientY: frame.y(8) });
    fireEvent.pointerMove(line, { pointerId: 1, clientY: frame.y(6) });
    // Before release, the screen already shows the new rate and its results.
    await waitFor(() => expect(rate(scenario())).toBeCloseTo(6, 9));
    expect(screen.getByLabelText('Excess depth')).toHaveTextContent(
      mmText(coreTotals(FOUR_BARS.storm, { kind: 'constant', rateMmH: rate(scenario()) }).totalExcessMm),
    );
    fireEvent.pointerMove(line, { pointerId: 1, clientY: frame.y(3) });
    fireEvent.pointerUp(line, { pointerId: 1, clientY: frame.y(3) });
    const phi = rate(scenario());
    expect(phi).toBeCloseTo(frame.y.invert(frame.y(3)), 9);
    const totals = coreTotals(FOUR_BARS.storm, { kind: 'constant', rateMmH: phi });
    expect(screen.getByLabelText('Excess depth')).toHaveTextContent(mmText(totals.totalExcessMm));
    expect(screen.getByLabelText('Loss depth')).toHaveTextContent(mmText(totals.totalLossMm));
    expect(Number(line.getAttribute('aria-valuenow'))).toBeCloseTo(phi, 9);
    // The whole drag is one undo step.
    expect(store.getState().history.past).toHaveLength(1);
    expect(store.getState().undoLabel).toBe('Drag loss rate φ');
  });

  it('a drag lands on the arrow keys’ step, not on whatever the pixel gives (6.03… mm/h → 6 mm/h)', async () => {
    const { scenario } = renderWorkbench();
    const line = screen.getByRole('slider', { name: 'Loss rate φ' });
    // FOUR_BARS peaks at 20 mm/h: the axis tops out at a round value near 22.4, so the arrow step is 0.1 mm/h.
    const step = 10 ** Math.floor(Math.log10(frame.topDisplay / 100));
    expect(step).toBe(0.1);
    fireEvent.pointerDown(line, { pointerId: 1, button: 0, clientY: frame.y(8) });
    // A third of a pixel under 6.03: unsnapped, the rate would be 6.0 and some hundredths.
    fireEvent.pointerMove(line, { pointerId: 1, clientY: frame.y(6.03) + 0.3 });
    fireEvent.pointerUp(line, { pointerId: 1, clientY: frame.y(6.03) + 0.3 });
    await waitFor(() => expect(rate(scenario())).toBe(6));
  });

  it('a drag past the ends of the axis stops at them', () => {
    const { scenario } = renderWorkbench();
    const line = screen.getByRole('slider', { name: 'Loss rate φ' });
    fireEvent.pointerDown(line, { pointerId: 1, button: 0, clientY: frame.y(8) });
    fireEvent.pointerMove(line, { pointerId: 1, clientY: 5000 });
    fireEvent.pointerUp(line, { pointerId: 1, clientY: 5000 });
    expect(rate(scenario())).toBe(0);
    expect(screen.getByLabelText('Excess depth')).toHaveTextContent(mmText(20));
    fireEvent.pointerDown(line, { pointerId: 2, button: 0, clientY: frame.y(0) });
    fireEvent.pointerMove(line, { pointerId: 2, clientY: -5000 });
    fireEvent.pointerUp(line, { pointerId: 2, clientY: -5000 });
    expect(rate(scenario())).toBe(frame.topMmH);
  });

  it('a cancelled drag puts the line back', () => {
    const { scenario, store } = renderWorkbench();
    const line = screen.getByRole('slider', { name: 'Loss rate φ' });
    fireEvent.pointerDown(line, { pointerId: 1, button: 0, clientY: frame.y(8) });
    fireEvent.pointerMove(line, { pointerId: 1, clientY: frame.y(2) });
    fireEvent.pointerCancel(line, { pointerId: 1 });
    expect(rate(scenario())).toBe(8);
    expect(store.getState().history.past).toHaveLength(0);
  });

  it('Escape during a drag puts the line back', () => {
    const { scenario } = renderWorkbench();
    const line = screen.getByRole('slider', { name: 'Loss rate φ' });
    fireEvent.pointerDown(line, { pointerId: 1, button: 0, clientY: frame.y(8) });
    fireEvent.pointerMove(line, { pointerId: 1, clientY: frame.y(2) });
    fireEvent.keyDown(line, { key: 'Escape' });
    expect(rate(scenario())).toBe(8);
  });

  it('moves with the keys: arrows fine, Page keys coarse, Home and End to the ends', async () => {
    // A fixed clock, so the run of key presses merges into one undo step however slow the machine.
    const { user, scenario, store } = renderWorkbench(FOUR_BARS, { now: () => 0 });
    const line = screen.getByRole('slider', { name: 'Loss rate φ' });
    await user.tab();
    // The slider is reachable from the keyboard alone.
    while (document.activeElement !== line) await user.tab();
    await user.keyboard('{ArrowUp}{ArrowUp}');
    expect(rate(scenario())).toBe(8.2);
    await user.keyboard('{PageDown}');
    expect(rate(scenario())).toBe(7.2);
    await user.keyboard('{ArrowLeft}');
    expect(rate(scenario())).toBe(7.1);
    expect(line).toHaveAttribute('aria-valuetext', '7.1 mm/h');
    expect(screen.getByLabelText('Excess depth')).toHaveTextContent(
      mmText(coreTotals(FOUR_BARS.storm, { kind: 'constant', rateMmH: 7.1 }).totalExcessMm),
    );
    await user.keyboard('{Home}');
    expect(rate(scenario())).toBe(0);
    await user.keyboard('{End}');
    expect(rate(scenario())).toBe(frame.topMmH);
    // A run of key presses is one undo step.
    expect(store.getState().history.past).toHaveLength(1);
  });

  it('for initial–continuing loss the line is the continuing rate, and the initial loss has its own layer', async () => {
    const { user, scenario } = renderWorkbench({
      ...FOUR_BARS,
      method: { kind: 'initial-continuing', initialMm: 5, rateMmH: 2 },
    });
    const line = screen.getByRole('slider', { name: 'Continuing loss rate' });
    expect(line).toHaveAttribute('aria-valuenow', '2');
    expect(screen.getByRole('list', { name: 'Legend' })).toHaveTextContent('Initial loss');
    expect(document.querySelector('[data-layer="loss-part"]')?.getAttribute('d')).toMatch(/^M/);
    line.focus();
    await user.keyboard('{ArrowUp}');
    expect(scenario().method).toEqual({ kind: 'initial-continuing', initialMm: 5, rateMmH: 2.1 });
  });

  it('a method without a rate has no line', () => {
    renderWorkbench({ ...FOUR_BARS, method: { kind: 'proportional', coefficient: 0.5 } });
    expect(screen.queryByRole('slider')).toBeNull();
  });

  it('the rainfall layer’s path is left untouched while the line moves', async () => {
    const { scenario } = renderWorkbench();
    const rain = document.querySelector('[data-layer="rain"]');
    const loss = document.querySelector('[data-layer="loss"]');
    const changed = new Set<Element>();
    const observer = new MutationObserver((records) => records.forEach((r) => changed.add(r.target as Element)));
    observer.observe(document.body, { attributes: true, subtree: true });
    const line = screen.getByRole('slider', { name: 'Loss rate φ' });
    fireEvent.pointerDown(line, { pointerId: 1, button: 0, clientY: frame.y(8) });
    fireEvent.pointerMove(line, { pointerId: 1, clientY: frame.y(5) });
    fireEvent.pointerUp(line, { pointerId: 1 });
    await waitFor(() => expect(rate(scenario())).toBeCloseTo(5, 9));
    await new Promise((r) => setTimeout(r, 0));
    observer.disconnect();
    expect(changed.has(loss as Element)).toBe(true);
    expect(changed.has(rain as Element)).toBe(false);
  });
});
