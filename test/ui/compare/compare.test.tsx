// @vitest-environment jsdom
import { act, cleanup, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { computeLosses, runoffVolumeM3 } from '../../../src/core';
import type { Scenario } from '../../../src/scenario/types';
import { PINS_KEY } from '../../../src/store/pins';
import { formatPercent, formatValue } from '../../../src/ui/format';
import { FOUR_BARS, memoryStorage } from '../../helpers/scenario-fixtures';
import { LAZY_LOAD_MS, lazyPartsLoaded } from '../../helpers/render';
import { SHARED, renderTools } from '../../helpers/render-tools';

const MESSAGE = 'Scenario tools message';

function table() {
  return screen.getByRole('table', { name: /^Totals of the pinned scenarios/ });
}
/** The cells of a row of the totals table, by its heading. */
function row(name: string): HTMLElement[] {
  const tr = within(table()).getByRole('rowheader', { name }).closest('tr') as HTMLElement;
  return within(tr).getAllByRole('cell');
}
const text = (el: HTMLElement | undefined): string => el?.textContent ?? '';
const mm = (v: number): string => `${formatValue(v)} mm`;

async function pin(user: ReturnType<typeof renderTools>['user']) {
  await user.click(screen.getByRole('button', { name: 'Pin to compare' }));
  // The comparison's code loads once something is pinned.
  await lazyPartsLoaded();
}

describe('comparing pinned scenarios', () => {
  it('shows each pin’s totals from the core, with the difference from the first in words and signs', async () => {
    const { user, actions } = renderTools({ fallback: FOUR_BARS });
    expect(screen.queryByRole('region', { name: 'Compare pinned scenarios' })).toBeNull();
    await pin(user);
    act(() => actions.setParam('rateMmH', 5));
    await pin(user);
    expect(screen.getByRole('status', { name: MESSAGE })).toHaveTextContent('Pinned “Four bars” as 2 of 4.');

    const a = computeLosses(FOUR_BARS.storm, { kind: 'constant', rateMmH: 8 });
    const b = computeLosses(FOUR_BARS.storm, { kind: 'constant', rateMmH: 5 });
    expect(text(row('Rainfall depth')[0])).toBe(mm(a.rainMm));
    expect(text(row('Rainfall depth')[1])).toBe(`${mm(b.rainMm)}= same as 1`);
    expect(text(row('Loss depth')[0])).toBe(mm(a.totalLossMm));
    const lossDrop = a.totalLossMm - b.totalLossMm;
    expect(text(row('Loss depth')[1])).toBe(
      `${mm(b.totalLossMm)}▼ −${formatValue(lossDrop)} mm (−${formatValue((lossDrop / a.totalLossMm) * 100)} %)`,
    );
    const excessRise = b.totalExcessMm - a.totalExcessMm;
    expect(text(row('Excess depth')[1])).toBe(
      `${mm(b.totalExcessMm)}▲ +${formatValue(excessRise)} mm (+${formatValue((excessRise / a.totalExcessMm) * 100)} %)`,
    );
    expect(text(row('Runoff volume')[0])).toBe(`${formatValue(runoffVolumeM3(a.totalExcessMm, 1e6))} m³`);
    expect(text(row('Runoff fraction')[1])).toBe(
      `${formatPercent(b.runoffFraction)}▲ +${formatValue((b.runoffFraction - a.runoffFraction) * 100)} percentage points`,
    );
    expect(text(row('Fitted parameter')[0])).toBe('— (no observed runoff to fit)');
    // Up and down are marked for styling as well as in words.
    expect(row('Excess depth')[1]).toHaveClass('compare__cell--up');
    expect(row('Loss depth')[1]).toHaveClass('compare__cell--down');
    expect(row('Rainfall depth')[1]).toHaveClass('compare__cell--same');
  });

  it('pins are copies: editing the scenario on screen afterwards changes no pin', async () => {
    const { user, actions } = renderTools({ fallback: FOUR_BARS });
    await pin(user);
    act(() => {
      actions.setBarDepth(2, 30);
      actions.setName('Changed after pinning');
    });
    expect(text(row('Rainfall depth')[0])).toBe(mm(20));
    expect(
      within(table()).getByRole('columnheader', { name: '1 Four bars Constant loss rate (φ-index)' }),
    ).toBeInTheDocument();
  });

  it('draws the small charts on one scale: the same time and intensity axes for every pin', async () => {
    const { user, actions } = renderTools({ fallback: FOUR_BARS });
    await pin(user);
    // A longer, more intense storm: its axes decide both charts'.
    act(() => actions.setStorm({ durationsH: [1, 1, 1, 1, 1], depthsMm: [5, 40, 10, 2, 1] }, 'Replace storm'));
    await pin(user);
    const charts = within(screen.getByRole('list', { name: 'Pinned scenario charts' })).getAllByRole('img');
    expect(charts).toHaveLength(2);
    const labels = (svg: HTMLElement) => Array.from(svg.querySelectorAll('.axes__label')).map((t) => t.textContent);
    expect(labels(charts[0] as HTMLElement)).toEqual(labels(charts[1] as HTMLElement));
    expect(labels(charts[0] as HTMLElement)).toContain('40');
    // The 5-hour storm sets the shared time axis, in hours and minutes: on a chart ~490 px wide (jsdom's 1000 px
    // fallback shared by two pins) at most 4 ticks fit, so every 2 h: 0:00, 2:00, 4:00.
    expect(labels(charts[0] as HTMLElement)).toEqual(expect.arrayContaining(['0:00', '2:00', '4:00']));
  });

  it('a fitted value is compared only with the same parameter of the first pin', async () => {
    // Kept matched, so each pin's fitted value is the one in use.
    const observed = { as: 'depth' as const, value: 6, parameter: 'rateMmH', locked: true };
    const { user, actions } = renderTools({ fallback: { ...FOUR_BARS, observed } });
    await pin(user);
    act(() => actions.setObserved({ value: 8 }));
    await pin(user);
    expect(text(row('Fitted parameter')[1])).toMatch(/^Loss rate φ [\d.]+ mm\/h▼ −[\d.]+ mm\/h \(−[\d.]+ %\)$/);
    act(() => actions.setMethodKind('proportional'));
    act(() => actions.setObserved({ parameter: 'coefficient' }));
    await pin(user);
    expect(text(row('Fitted parameter')[2])).toMatch(/^Runoff coefficient [\d.]+another parameter than pin 1$/);
  });

  it('calls a value fitted only when it is in use: an answer not applied reads "Fit would set", then "Fitted" after Fit', async () => {
    // Observed 6 mm, not kept matched, φ still 8 mm/h. Bars of 0.5 h at 4, 12, 20, 4 mm/h: with the bars above φ
    // in (4, 12) the excess is (12 − φ)·0.5 + (20 − φ)·0.5 = 16 − φ, so 6 mm needs φ = 10 mm/h.
    const observed = { as: 'depth' as const, value: 6, parameter: 'rateMmH', locked: false };
    const { user, actions } = renderTools({ fallback: { ...FOUR_BARS, observed } });
    await pin(user);
    expect(text(row('Fitted parameter')[0])).toBe('— (not in use; Fit would set loss rate φ to 10 mm/h)');
    act(() => {
      actions.fitObserved();
    });
    await pin(user);
    expect(text(row('Fitted parameter')[1])).toMatch(/^Loss rate φ 10 mm\/h/);
    expect(text(row('Fitted parameter')[0])).toBe('— (not in use; Fit would set loss rate φ to 10 mm/h)');
  });

  it('up to four: a fifth pin is refused with a message; Unpin frees a place', async () => {
    const { user } = renderTools({ fallback: FOUR_BARS });
    for (let i = 0; i < 4; i++) await pin(user);
    expect(screen.getByText('4 of 4 pinned')).toBeInTheDocument();
    await pin(user);
    expect(screen.getByRole('alert', { name: MESSAGE })).toHaveTextContent(
      '4 scenarios are pinned already; unpin one to pin another.',
    );
    const unpins = screen.getAllByRole('button', { name: 'Unpin Four bars' });
    await user.click(unpins[0] as HTMLElement);
    expect(screen.getByText('3 of 4 pinned')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Unpin all' }));
    expect(screen.queryByRole('region', { name: 'Compare pinned scenarios' })).toBeNull();
  });

  it('pins are kept in the browser and come back on the next visit, in their own units shown in the screen’s', async () => {
    const storage = memoryStorage();
    const first = renderTools({ storage, fallback: SHARED });
    await pin(first.user);
    cleanup();
    const again = renderTools({ storage, fallback: { ...FOUR_BARS, units: 'si' } as Scenario });
    // The pin board is read just after the first frame (src/store/pin-board.ts).
    await screen.findByRole('table', { name: /^Totals of the pinned scenarios/ }, { timeout: LAZY_LOAD_MS });
    await lazyPartsLoaded();
    expect(
      within(table()).getByRole('columnheader', { name: `1 ${SHARED.name} Horton infiltration` }),
    ).toBeInTheDocument();
    // The pin was made in US units; it is shown in the screen's SI units.
    expect(text(row('Rainfall depth')[0])).toBe(mm(30.8));
    void again;
  });

  it('damaged pins in the browser are set aside and reported, and pinning still works', async () => {
    const storage = memoryStorage({
      [PINS_KEY]: '{"$format":"raincut-pins","version":1,"pins":[{"id":"p1","pinnedAt":"x","scenario":{"version":2}}]}',
    });
    const { user } = renderTools({ storage });
    const alert = await screen.findByRole('alert', {}, { timeout: LAZY_LOAD_MS });
    expect(alert).toHaveTextContent(
      /Part of the pinned scenarios was damaged and left out; the list as it was is kept under browser storage key "raincut\.pins\.damaged\./,
    );
    expect(alert).toHaveTextContent('pins[0]: the pinned scenario was left out');
    const aside = [...storage.data.keys()].find((k) => k.startsWith(`${PINS_KEY}.damaged.`));
    expect(aside).toBeDefined();
    await pin(user);
    expect(JSON.parse(storage.data.get(PINS_KEY) as string).pins).toHaveLength(1);
  });
});
