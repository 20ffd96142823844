// @vitest-environment jsdom
import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import {
  BASEFLOW_METHODS,
  calibrate,
  convertDischarge,
  convertVolume,
  recessionDays,
  separateBaseflow,
  type BaseflowMethod,
} from '../../../src/core';
import { previewFlowImport, guessFlowSettings } from '../../../src/io';
import type { Scenario } from '../../../src/scenario/types';
import { withSeparationAsObserved } from '../../../src/store';
import { sharedTimeSpanH } from '../../../src/ui/chart/time-span';
import { formatForField as formatField, formatValue } from '../../../src/ui/format';
import { HYDROGRAPH_HEIGHT } from '../../../src/ui/observed';
import { hydrographFrame } from '../../../src/ui/observed/hydrograph-frame';
import { LAZY_LOAD_MS, lazyPartsLoaded, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';
import { TRIANGLE, TRIANGLE_TEXT, WITH_TRIANGLE } from '../../helpers/flow-fixtures';

const AREA_M2 = FOUR_BARS.catchment.areaM2;
const flowOf = (s: Scenario) => {
  if (!s.streamflow) throw new Error('expected a streamflow record');
  return s.streamflow;
};
const separate = (method: BaseflowMethod, areaM2 = AREA_M2) => separateBaseflow(TRIANGLE, method, { areaM2 });
const m3 = (v: number): string => `${formatValue(v)} m³`;
const mm = (v: number): string => `${formatValue(v)} mm`;

// jsdom lays nothing out: the chart keeps its fallback width and the svg sits at x = 0,
// so a pointer's clientX is the chart's own x. FOUR_BARS rains for 2 h; the record runs 12 h.
const frame = hydrographFrame(
  FOUR_BARS.storm,
  1.75,
  0,
  880,
  HYDROGRAPH_HEIGHT,
  'si',
  sharedTimeSpanH(2, { firstH: 0, lastH: 12 }),
);

/** The workbench on a scenario with a record, once the hydrograph and the separation (loaded with a record) are drawn. */
async function renderRecord(...args: Parameters<typeof renderWorkbench>) {
  const view = renderWorkbench(...args);
  await lazyPartsLoaded();
  return view;
}

async function pasteRecord(user: ReturnType<typeof renderWorkbench>['user'], text: string) {
  await user.click(screen.getByRole('button', { name: 'Paste streamflow…' }));
  // The dialog's code loads when it is first opened.
  const dialog = await screen.findByRole('dialog', { name: 'Paste streamflow' }, { timeout: LAZY_LOAD_MS });
  const box = within(dialog).getByLabelText('Streamflow text');
  await user.click(box);
  await user.paste(text);
  return dialog;
}

const escapeRegExp = (text: string): string => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

describe('bringing a streamflow record in', () => {
  it('paste shows what was understood, and "Use this record" puts it under the hyetograph as one undo step', async () => {
    const { user, scenario, store } = renderWorkbench();
    expect(screen.getByText(/No streamflow record yet/)).toBeInTheDocument();
    const dialog = await pasteRecord(user, TRIANGLE_TEXT);
    const expected = previewFlowImport(TRIANGLE_TEXT, guessFlowSettings(TRIANGLE_TEXT)).summary;
    expect(expected).toMatch(/^13 samples every 1 h/);
    await waitFor(() => expect(within(dialog).getByRole('status')).toHaveTextContent(expected));
    expect(within(dialog).getByRole('table', { name: /Samples read/ })).toBeInTheDocument();
    expect(within(dialog).getByLabelText('Discharge unit')).toHaveValue('m3/s');
    await user.click(within(dialog).getByRole('button', { name: 'Use this record' }));
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(flowOf(scenario()).timesH).toEqual(TRIANGLE.timesH);
    expect(flowOf(scenario()).dischargeM3s).toEqual(TRIANGLE.dischargeM3s);
    expect(store.getState().undoLabel).toBe('Paste streamflow');
    await lazyPartsLoaded();
    expect(screen.getByRole('group', { name: 'Hydrograph' })).toBeInTheDocument();
    expect(screen.getByRole('slider', { name: 'End of direct runoff' })).toBeInTheDocument();
  });

  it('lists every bad cell by line and column, keeps the record unchanged, and keeps the text when cancelled', async () => {
    const { user, scenario } = await renderRecord(WITH_TRIANGLE);
    const bad = 'Time\tQ (m3/s)\n14:00\t0.5\n14:15\tabc\n14:30\t-4\n14:20\t2\n14:45\t1';
    const dialog = await pasteRecord(user, bad);
    await waitFor(() =>
      expect(within(dialog).getByRole('status')).toHaveTextContent(/3 problems to fix before importing\.$/),
    );
    const table = within(dialog).getByRole('table', { name: '3 problems to fix' });
    const rows = within(table)
      .getAllByRole('row')
      .slice(1)
      .map((r) =>
        within(r)
          .getAllByRole('cell')
          .map((c) => c.textContent),
      );
    expect(rows.map((r) => r.slice(0, 4))).toEqual([
      ['3', '2', 'discharge', 'abc'],
      ['4', '2', 'discharge', '-4'],
      ['5', '1', 'time', '14:20'],
    ]);
    expect(rows[0]?.[4]).toBe('Not a number.');
    expect(rows[1]?.[4]).toBe('Discharge cannot be negative.');
    expect(within(dialog).getByRole('button', { name: 'Use this record' })).toBeDisabled();
    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    expect(scenario()).toBe(WITH_TRIANGLE);
    // A cancelled paste leaves nothing behind for the next opening.
    await user.click(screen.getByRole('button', { name: 'Paste streamflow…' }));
    expect(screen.getByLabelText('Streamflow text')).toHaveValue('');
  });

  it('reads the unit a column names and lets a wrong guess be corrected, converting exactly', async () => {
    const { user, scenario } = renderWorkbench();
    const text = 'Minutes,Flow (L/s)\n0,500\n30,1250\n60,2000\n90,800';
    const dialog = await pasteRecord(user, text);
    const unit = within(dialog).getByLabelText('Discharge unit');
    await waitFor(() => expect(unit).toHaveValue('L/s'));
    await user.selectOptions(within(dialog).getByLabelText('Times are'), 'elapsed-min');
    await user.click(within(dialog).getByRole('button', { name: 'Use this record' }));
    expect(flowOf(scenario()).dischargeM3s).toEqual([0.5, 1.25, 2, 0.8]);
    expect(flowOf(scenario()).timesH).toEqual([0, 0.5, 1, 1.5]);
    // The same text read as ft³/s instead.
    const again = await pasteRecord(user, text);
    await user.selectOptions(within(again).getByLabelText('Times are'), 'elapsed-min');
    await user.selectOptions(within(again).getByLabelText('Discharge unit'), 'ft3/s');
    await user.click(within(again).getByRole('button', { name: 'Use this record' }));
    expect(flowOf(scenario()).dischargeM3s).toEqual(
      [500, 1250, 2000, 800].map((q) => convertDischarge(q, 'ft3/s', 'm3/s')),
    );
  });

  it('opens a record from a file into the same preview', async () => {
    const { user, scenario } = renderWorkbench();
    const file = new File([TRIANGLE_TEXT], 'gauge-event.csv', { type: 'text/csv' });
    await user.upload(screen.getByLabelText('Streamflow file to open'), file);
    const dialog = await screen.findByRole('dialog', { name: 'Paste streamflow' }, { timeout: LAZY_LOAD_MS });
    expect(within(dialog).getByText('Read from gauge-event.csv')).toBeInTheDocument();
    await user.click(within(dialog).getByRole('button', { name: 'Use this record' }));
    expect(flowOf(scenario()).dischargeM3s).toEqual(TRIANGLE.dischargeM3s);
  });

  it('says why a file cannot be read and opens nothing', async () => {
    const { user, scenario } = renderWorkbench();
    await user.upload(
      screen.getByLabelText('Streamflow file to open'),
      new File(['\u0000\u0001'], 'logger.txt', { type: 'text/plain' }),
    );
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'logger.txt is not a text file; save the streamflow record as .csv or .txt and open that.',
    );
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(scenario().streamflow).toBeNull();
  });
});

describe('separating baseflow', () => {
  it('shows the core’s volume, depth, baseflow index, peak and time of peak', async () => {
    await renderRecord(WITH_TRIANGLE);
    const r = separate({ kind: 'straight-line', endTimeH: 7 });
    expect(screen.getByLabelText('Direct runoff volume')).toHaveTextContent(m3(r.directVolumeM3));
    expect(screen.getByLabelText('Direct runoff depth')).toHaveTextContent(mm(r.directDepthMm as number));
    expect(screen.getByLabelText('Baseflow index')).toHaveTextContent(formatValue(r.baseflowIndex));
    expect(screen.getByLabelText('Peak discharge')).toHaveTextContent('1.75 m³/s');
    expect(screen.getByLabelText('Time of peak')).toHaveTextContent('3 h');
    expect(r.directVolumeM3).toBeCloseTo(13_500, 6);
  });

  it('the method picker and its fields come from the method table, and each method keeps its values', async () => {
    const { user, scenario } = await renderRecord(WITH_TRIANGLE);
    const picker = screen.getByLabelText('Baseflow method');
    expect(
      within(picker)
        .getAllByRole('option')
        .map((o) => o.textContent),
    ).toEqual(Object.values(BASEFLOW_METHODS).map((m) => m.label));
    await user.selectOptions(picker, 'lyne-hollick');
    for (const p of BASEFLOW_METHODS['lyne-hollick'].params)
      expect(screen.getByLabelText(new RegExp(`^${escapeRegExp(p.label)}`))).toBeInTheDocument();
    expect(screen.getByLabelText(/^Filter parameter α/)).toHaveValue('0.925');
    expect(screen.getByLabelText(/^Passes/)).toHaveValue('3');
    expect(screen.getByLabelText(/^Time step of α/)).toHaveValue('24');
    expect(screen.queryByRole('slider', { name: 'End of direct runoff' })).not.toBeInTheDocument();
    const filtered = separate({ kind: 'lyne-hollick', alpha: 0.925, passes: 3, stepH: 24 });
    expect(screen.getByLabelText('Direct runoff volume')).toHaveTextContent(m3(filtered.directVolumeM3));
    await user.clear(screen.getByLabelText(/^Passes/));
    await user.type(screen.getByLabelText(/^Passes/), '1');
    expect(screen.getByLabelText('Direct runoff volume')).toHaveTextContent(
      m3(separate({ kind: 'lyne-hollick', alpha: 0.925, passes: 1, stepH: 24 }).directVolumeM3),
    );
    await user.selectOptions(picker, 'straight-line');
    expect(flowOf(scenario()).baseflow).toEqual({ kind: 'straight-line', endTimeH: 7 });
    await user.selectOptions(picker, 'lyne-hollick');
    expect(flowOf(scenario()).baseflow).toEqual({ kind: 'lyne-hollick', alpha: 0.925, passes: 1, stepH: 24 });
  });

  it('a bad parameter keeps what was typed, says why, and changes nothing', async () => {
    const { user, scenario } = await renderRecord(WITH_TRIANGLE);
    const end = screen.getByRole('textbox', { name: /^End of direct runoff/ });
    expect(end).toHaveValue('7');
    await user.clear(end);
    await user.type(end, '7x');
    expect(end).toHaveValue('7x');
    expect(end).toHaveAccessibleDescription(
      expect.stringContaining('“7x” is not a plain number; leave out any unit or word. Not applied; still 7 h.'),
    );
    await user.clear(end);
    await user.type(end, '20');
    expect(end).toHaveAccessibleDescription(
      expect.stringContaining('The end point (20 h) is after the last sample of the record (12 h).'),
    );
    // Not applied: the end stays where it was before the typing (7 h), never the "2" typed on the way to "20".
    expect(flowOf(scenario()).baseflow).toEqual({ kind: 'straight-line', endTimeH: 7 });
    const rise = screen.getByLabelText(/^Start of rise/);
    await user.type(rise, '0');
    expect(rise).toHaveAccessibleDescription(
      expect.stringContaining('Start of rise must be a whole sample number, 1 or more (got 0).'),
    );
  });

  it('counts the start of rise from 1, as the paste does', async () => {
    const { user, scenario } = await renderRecord(WITH_TRIANGLE);
    const rise = screen.getByLabelText(/^Start of rise/);
    await user.type(rise, '3');
    expect(flowOf(scenario()).baseflow).toEqual({ kind: 'straight-line', endTimeH: 7, riseIndex: 2 });
    expect(rise).toHaveAccessibleDescription(
      expect.stringContaining('Sample 3 is at 2 h after the first sample, 1.125 m³/s.'),
    );
    expect(screen.getByLabelText('Direct runoff volume')).toHaveTextContent(
      m3(separate({ kind: 'straight-line', endTimeH: 7, riseIndex: 2 }).directVolumeM3),
    );
  });
});

describe('the end point', () => {
  it('is a slider with its value, unit and place on the recession', async () => {
    await renderRecord(WITH_TRIANGLE);
    const handle = screen.getByRole('slider', { name: 'End of direct runoff' });
    expect(handle).toHaveAttribute('aria-valuenow', '7');
    expect(handle).toHaveAttribute('aria-valuemin', '3');
    expect(handle).toHaveAttribute('aria-valuemax', '12');
    expect(handle).toHaveAttribute('aria-valuetext', '7 h after the first sample, 0.5 m³/s on the recession');
    expect(handle).toHaveAttribute('tabindex', '0');
  });

  it('moved with the keys, it changes the volume and, used as observed runoff, the matched loss rate', async () => {
    const linked = withSeparationAsObserved(WITH_TRIANGLE, true, 0);
    const { user, scenario } = await renderRecord(linked);
    const before = fittedRate(7);
    expect(screen.getByRole('textbox', { name: /^Loss rate φ/ })).toHaveValue(formatField(before));
    const handle = screen.getByRole('slider', { name: 'End of direct runoff' });
    handle.focus();
    await user.keyboard('{ArrowLeft}{ArrowLeft}');
    expect(flowOf(scenario()).baseflow).toEqual({ kind: 'straight-line', endTimeH: 6.8 });
    const r = separate({ kind: 'straight-line', endTimeH: 6.8 });
    expect(handle).toHaveAttribute('aria-valuenow', '6.8');
    expect(screen.getByLabelText('Direct runoff volume')).toHaveTextContent(m3(r.directVolumeM3));
    const after = fittedRate(6.8);
    expect(after).not.toBe(before);
    expect(screen.getByRole('textbox', { name: /^Loss rate φ/ })).toHaveValue(formatField(after));
    expect(screen.getByLabelText(/^Observed runoff/)).toHaveValue(formatField(r.directDepthMm as number));
    await user.keyboard('{Home}');
    expect(handle).toHaveAttribute('aria-valuenow', '3');
    await user.keyboard('{End}');
    expect(handle).toHaveAttribute('aria-valuenow', '12');
  });

  it('dragged with the pointer, it follows the pointer live and the whole drag is one undo step', async () => {
    const { scenario, store } = await renderRecord(withSeparationAsObserved(WITH_TRIANGLE, true, 0));
    const handle = screen.getByRole('slider', { name: 'End of direct runoff' });
    fireEvent.pointerDown(handle, { pointerId: 1, button: 0, clientX: frame.x(7) });
    fireEvent.pointerMove(handle, { pointerId: 1, clientX: frame.x(5.5) });
    await waitFor(() => expect(flowOf(scenario()).baseflow).toEqual({ kind: 'straight-line', endTimeH: 5.5 }));
    fireEvent.pointerMove(handle, { pointerId: 1, clientX: frame.x(4.25) });
    fireEvent.pointerUp(handle, { pointerId: 1, clientX: frame.x(4.25) });
    expect(flowOf(scenario()).baseflow).toEqual({ kind: 'straight-line', endTimeH: 4.25 });
    const r = separate({ kind: 'straight-line', endTimeH: 4.25 });
    expect(screen.getByLabelText('Direct runoff volume')).toHaveTextContent(m3(r.directVolumeM3));
    expect(screen.getByRole('textbox', { name: /^Loss rate φ/ })).toHaveValue(formatField(fittedRate(4.25)));
    expect(store.getState().undoLabel).toBe('Drag end of direct runoff');
    expect(store.getState().history.past).toHaveLength(1);
    // Past the peak's side, the drag stops on the recession's start.
    fireEvent.pointerDown(handle, { pointerId: 2, button: 0, clientX: frame.x(4.25) });
    fireEvent.pointerMove(handle, { pointerId: 2, clientX: -500 });
    fireEvent.pointerUp(handle, { pointerId: 2, clientX: -500 });
    expect(flowOf(scenario()).baseflow).toEqual({ kind: 'straight-line', endTimeH: 3 });
  });

  it('a cancelled drag, or Escape, puts it back', async () => {
    const { scenario } = await renderRecord(WITH_TRIANGLE);
    const handle = screen.getByRole('slider', { name: 'End of direct runoff' });
    fireEvent.pointerDown(handle, { pointerId: 1, button: 0, clientX: frame.x(7) });
    fireEvent.pointerMove(handle, { pointerId: 1, clientX: frame.x(5) });
    fireEvent.keyDown(handle, { key: 'Escape' });
    expect(scenario()).toBe(WITH_TRIANGLE);
    fireEvent.pointerDown(handle, { pointerId: 2, button: 0, clientX: frame.x(7) });
    fireEvent.pointerMove(handle, { pointerId: 2, clientX: frame.x(5) });
    fireEvent.pointerCancel(handle, { pointerId: 2 });
    expect(scenario()).toBe(WITH_TRIANGLE);
  });

  it('"End at N = A^0.2 days after the peak" uses the area, and when that falls past the record ends at the last sample and says so', async () => {
    const { user, scenario, actions } = await renderRecord(WITH_TRIANGLE);
    const button = screen.getByRole('button', { name: 'End at N = A^0.2 days after the peak' });
    const days = recessionDays(AREA_M2);
    expect(button).toHaveAccessibleDescription(expect.stringContaining(`N = ${formatValue(days)} days`));
    await user.click(button);
    expect(flowOf(scenario()).baseflow).toEqual({ kind: 'straight-line' });
    expect(button).toHaveAttribute('aria-pressed', 'true');
    // For 1 km² N is 0.83 days, past the end of a 12-hour record: the line ends at
    // the last sample, the screen says so, and the handle is there to drag instead.
    expect(
      screen.getByText(
        /^N = A\^0\.2 = 0\.827 days puts the end 22\.84 h after the first sample, past the record's last sample \(12 h\)/,
      ),
    ).toHaveAttribute('role', 'status');
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
    const fallback = separate({ kind: 'straight-line' });
    expect(fallback.endTimeH).toBe(12);
    expect(screen.getByLabelText('Direct runoff volume')).toHaveTextContent(m3(fallback.directVolumeM3));
    const handle = screen.getByRole('slider', { name: 'End of direct runoff' });
    expect(handle).toHaveAttribute('aria-valuenow', '12');
    // A small enough catchment brings the end inside the record.
    act(() => actions.setAreaM2(1000));
    const small = separate({ kind: 'straight-line' }, 1000);
    expect(small.endTimeH).toBeCloseTo(3 + 24 * recessionDays(1000), 12);
    expect(handle).toHaveAttribute('aria-valuenow', String(small.endTimeH));
    expect(screen.getByLabelText('Direct runoff volume')).toHaveTextContent(m3(small.directVolumeM3));
  });
});

describe('use as observed runoff', () => {
  it('sends the depth to Matching, keeps the loss matched, and follows the area', async () => {
    const { user, scenario, actions } = await renderRecord(WITH_TRIANGLE);
    const use = screen.getByRole('button', { name: 'Use as observed runoff' });
    expect(use).toHaveAttribute('aria-pressed', 'false');
    await user.click(use);
    expect(use).toHaveAttribute('aria-pressed', 'true');
    expect(flowOf(scenario()).useAsObserved).toBe(true);
    expect(scenario().observed).toMatchObject({ as: 'depth', parameter: 'rateMmH', locked: true });
    const r = separate({ kind: 'straight-line', endTimeH: 7 });
    expect(screen.getByLabelText(/^Observed runoff/)).toHaveValue(formatField(r.directDepthMm as number));
    expect(screen.getByRole('switch', { name: 'Keep matched' })).toBeChecked();
    expect(screen.getByRole('textbox', { name: /^Loss rate φ/ })).toHaveValue(formatField(fittedRate(7)));
    act(() => actions.setAreaM2(2e6));
    const half = (r.directDepthMm as number) / 2;
    expect(screen.getByLabelText(/^Observed runoff/)).toHaveValue(formatField(half));
    const fit = calibrate(FOUR_BARS.storm, FOUR_BARS.method, 'rateMmH', half);
    expect(fit.ok).toBe(true);
    expect(screen.getByRole('textbox', { name: /^Loss rate φ/ })).toHaveValue(
      formatField(fit.ok ? (fit.method as { rateMmH: number }).rateMmH : NaN),
    );
  });

  it('typing an observed runoff takes Matching back; pressing again keeps the depth shown', async () => {
    const { user, scenario } = await renderRecord(withSeparationAsObserved(WITH_TRIANGLE, true, 0));
    const field = screen.getByLabelText(/^Observed runoff/);
    await user.clear(field);
    await user.type(field, '9');
    expect(flowOf(scenario()).useAsObserved).toBe(false);
    expect(scenario().observed?.value).toBe(9);
    expect(screen.getByRole('button', { name: 'Use as observed runoff' })).toHaveAttribute('aria-pressed', 'false');
    await user.click(screen.getByRole('button', { name: 'Use as observed runoff' }));
    await user.click(screen.getByRole('button', { name: 'Use as observed runoff' }));
    expect(scenario().observed?.value).toBe(separate({ kind: 'straight-line', endTimeH: 7 }).directDepthMm);
  });

  it('cannot be used without a catchment area, and says so', async () => {
    await renderRecord({ ...WITH_TRIANGLE, catchment: { ...WITH_TRIANGLE.catchment, areaM2: 0 } });
    expect(screen.getByRole('button', { name: 'Use as observed runoff' })).toBeDisabled();
    expect(screen.getByText('Needs a direct-runoff depth: the separation and the catchment area.')).toBeInTheDocument();
    expect(screen.getByLabelText('Direct runoff depth')).toHaveTextContent('— (needs the catchment area)');
    // The end-point rule needs the area too, and names the panel that holds it by its heading.
    expect(screen.getByRole('button', { name: 'End at N = A^0.2 days after the peak' })).toHaveAccessibleDescription(
      expect.stringContaining('Needs the catchment area (under Catchment and notes).'),
    );
    expect(screen.getByRole('heading', { name: 'Catchment and notes' })).toBeInTheDocument();
  });

  it('"Remove record" keeps the last depth in Matching, and Undo brings the record back', async () => {
    const { user, scenario, actions } = await renderRecord(withSeparationAsObserved(WITH_TRIANGLE, true, 0));
    await user.click(screen.getByRole('button', { name: 'Remove record' }));
    expect(scenario().streamflow).toBeNull();
    expect(scenario().observed?.value).toBe(separate({ kind: 'straight-line', endTimeH: 7 }).directDepthMm);
    expect(screen.queryByRole('heading', { name: 'Baseflow separation' })).not.toBeInTheDocument();
    act(() => actions.undo());
    expect(flowOf(scenario()).useAsObserved).toBe(true);
  });
});

describe('units and lining up', () => {
  it('shows volume, depth and discharge in US customary units after the switch', async () => {
    const { user } = await renderRecord(WITH_TRIANGLE);
    await user.click(screen.getByRole('radio', { name: 'US customary' }));
    const r = separate({ kind: 'straight-line', endTimeH: 7 });
    expect(screen.getByLabelText('Direct runoff volume')).toHaveTextContent(
      `${formatValue(convertVolume(r.directVolumeM3, 'm3', 'acre-ft'))} acre-ft`,
    );
    expect(screen.getByLabelText('Direct runoff depth')).toHaveTextContent(
      `${formatValue((r.directDepthMm as number) / 25.4)} in`,
    );
    expect(screen.getByLabelText('Peak discharge')).toHaveTextContent(
      `${formatValue(convertDischarge(1.75, 'm3/s', 'ft3/s'))} ft³/s`,
    );
    expect(screen.getByRole('group', { name: 'Hydrograph' })).toHaveTextContent('Discharge (ft³/s)');
  });

  it('without clock times on both, the record is lined up by an offset in hours or minutes', async () => {
    const { user, scenario } = await renderRecord(WITH_TRIANGLE);
    const offset = screen.getByLabelText(/^Record start after storm start/);
    await user.clear(offset);
    await user.type(offset, '-1.5');
    expect(flowOf(scenario()).offsetH).toBe(-1.5);
    await user.selectOptions(screen.getByLabelText('Offset unit'), 'min');
    expect(screen.getByLabelText(/^Record start after storm start/)).toHaveValue('-90');
    expect(screen.getByLabelText(/^Record start after storm start/)).toHaveAccessibleDescription(
      expect.stringContaining('1 h 30 min before the storm start'),
    );
    await user.clear(screen.getByLabelText(/^Record start after storm start/));
    await user.type(screen.getByLabelText(/^Record start after storm start/), '45');
    expect(flowOf(scenario()).offsetH).toBe(0.75);
  });

  it('with clock times on both, the clocks line them up and no offset is asked for', async () => {
    const clocked: Scenario = {
      ...WITH_TRIANGLE,
      storm: { ...WITH_TRIANGLE.storm, startIso: '2026-07-14T15:00' },
      streamflow: { ...flowOf(WITH_TRIANGLE), startIso: '2026-07-14T14:00:00' },
    };
    await renderRecord(clocked);
    expect(screen.queryByLabelText(/^Record start after storm start/)).not.toBeInTheDocument();
    expect(
      screen.getByText(/Lined up by clock time: the record’s first sample is 1 h before the storm start\./),
    ).toBeInTheDocument();
    expect(screen.getByLabelText('Time of peak')).toHaveTextContent('17:00 (14 Jul 2026, 3 h after the first sample)');
    expect(screen.getByRole('slider', { name: 'End of direct runoff' })).toHaveAttribute(
      'aria-valuetext',
      '14 Jul 2026 21:00 (7 h after the first sample), 0.5 m³/s on the recession',
    );
  });
});

/** The core's fitted loss rate for the observed runoff of the straight line ending at `endTimeH`. */
function fittedRate(endTimeH: number): number {
  const depth = separate({ kind: 'straight-line', endTimeH }).directDepthMm as number;
  const fit = calibrate(FOUR_BARS.storm, FOUR_BARS.method, 'rateMmH', depth);
  if (!fit.ok) throw new Error(`no fit for ${depth} mm`);
  return (fit.method as { rateMmH: number }).rateMmH;
}
