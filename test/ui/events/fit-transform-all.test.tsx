// @vitest-environment jsdom
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { Scenario, SetEvent } from '../../../src/scenario/types';
import { eventWithReservoirRecord } from '../../helpers/hydrographs';
import { lazyPartsLoaded, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

// Invented events on FOUR_BARS's 1 km² catchment, each with its own streamflow
// record: a linear reservoir's (see linearReservoirRecord) on no baseflow, so the
// constant separation from the start of rise leaves it whole.
//
// By hand: "One hour" (30 mm, 10 mm observed): 30 − φ = 10 → φ = 20 mm/h, excess
// 10 mm, recorded with k = 2 h. "Two hours" (10 then 30 mm, 14 mm observed): only
// the 30 mm bar runs off, 30 − φ = 14 → φ = 16 mm/h, excess [0, 14], recorded with
// k = 1 h. Fitting k to each observed peak gives back 2 h and 1 h: median
// (1 + 2)/2 = 1.5 h. "No record" has no record and so no fit.
const AREA = 1e6;
const withRecord = (id: string, name: string, depths: number[], mm: number, start: number, kH: number): SetEvent =>
  eventWithReservoirRecord(id, name, depths, mm, start, kH, AREA);

const SET: Scenario = {
  ...FOUR_BARS,
  hydrograph: {
    ...FOUR_BARS.hydrograph,
    transform: { kind: 'nash', n: 1, kH: 5 },
    fitParameter: 'kH',
    objective: 'peak',
  },
  eventSet: {
    events: [
      withRecord('a', 'One hour (invented)', [30], 10, 0, 2),
      withRecord('b', 'Two hours (invented)', [10, 30], 14, 1, 1),
      {
        id: 'c',
        name: 'No record (invented)',
        storm: { durationsH: [1], depthsMm: [20] },
        observed: { as: 'depth', value: 5 },
        streamflow: null,
      },
    ],
    activeId: null,
    parameter: 'rateMmH',
    designPick: 'median',
  },
};

describe('fitting the unit hydrograph to every event', () => {
  it('adds a column of each event’s fitted k, worked by hand, and says why an event has none', async () => {
    const view = renderWorkbench(SET);
    await view.user.click(screen.getByRole('tab', { name: 'Event set' }));
    await lazyPartsLoaded();
    const table = await screen.findByRole('table', { name: 'Fitted loss rate φ for each event' });
    expect(within(table).getByRole('columnheader', { name: 'Fitted storage constant k' })).toBeInTheDocument();
    const row = (name: string) => within(table).getByRole('row', { name: new RegExp(`^${name}`) });
    expect(row('One hour')).toHaveTextContent('20 mm/h2 h');
    expect(row('Two hours')).toHaveTextContent('16 mm/h1 h');
    expect(row('No record')).toHaveTextContent('No fit: This event has no separated streamflow record');
  });

  it('summarises the fitted k like the loss: 2 fitted, 1 without, median 1.5 h, 1 to 2 h', async () => {
    const view = renderWorkbench(SET);
    await view.user.click(screen.getByRole('tab', { name: 'Event set' }));
    await lazyPartsLoaded();
    const list = await screen.findByLabelText('Spread of the fitted storage constant k');
    const value = (term: string) => within(list).getByText(term, { selector: 'dt' }).nextElementSibling?.textContent;
    expect(value('Events fitted')).toBe('2');
    expect(value('Without a fit')).toBe('1');
    expect(value('Median')).toBe('1.5 h');
    expect(value('Smallest')).toBe('1 h');
    expect(value('Largest')).toBe('2 h');
  });

  it('shows no such column while no unit hydrograph is chosen', async () => {
    const view = renderWorkbench({ ...SET, hydrograph: { ...SET.hydrograph, transform: null } });
    await view.user.click(screen.getByRole('tab', { name: 'Event set' }));
    await lazyPartsLoaded();
    const table = await screen.findByRole('table', { name: 'Fitted loss rate φ for each event' });
    expect(within(table).queryByRole('columnheader', { name: /storage constant/ })).toBeNull();
  });
});
