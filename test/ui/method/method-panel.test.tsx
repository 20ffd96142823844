// @vitest-environment jsdom
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import {
  METHOD_KINDS,
  METHODS,
  defaultMethod,
  greenAmptForTexture,
  paramApplies,
  type MethodSpec,
} from '../../../src/core';
import { coreTotals, mmText, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

describe('the loss-method panel', () => {
  it('offers every method in the core’s table', () => {
    renderWorkbench();
    const picker = screen.getByRole('combobox', { name: 'Loss method' });
    const options = within(picker)
      .getAllByRole('option')
      .map((o) => o.textContent);
    expect(options).toEqual(METHOD_KINDS.map((k) => METHODS[k].label));
  });

  it('shows each parameter of the chosen method with its unit', async () => {
    const { user } = renderWorkbench();
    await user.selectOptions(screen.getByRole('combobox', { name: 'Loss method' }), 'initial-continuing');
    expect(screen.getByRole('textbox', { name: 'Initial loss (mm)' })).toHaveValue('10');
    expect(screen.getByRole('textbox', { name: 'Continuing loss rate (mm/h)' })).toHaveValue('2.5');
  });

  it('every method the core lists renders the parameters and choices that take part, and says what happens in dry bars', async () => {
    const { user } = renderWorkbench();
    for (const kind of METHOD_KINDS) {
      await user.selectOptions(screen.getByRole('combobox', { name: 'Loss method' }), kind);
      const spec = METHODS[kind] as MethodSpec;
      const defaults = defaultMethod(kind);
      for (const p of spec.params) {
        const field = screen.queryByRole('textbox', { name: new RegExp(`^${p.label.replace(/[()]/g, '\\$&')}`) });
        if (paramApplies(p, defaults)) expect(field, p.label).toBeInTheDocument();
        else expect(field, p.label).not.toBeInTheDocument();
      }
      for (const c of spec.choices ?? []) {
        if (!paramApplies(c, defaults)) {
          expect(screen.queryByRole('group', { name: c.label })).not.toBeInTheDocument();
        } else if (c.display === 'switch') {
          expect(screen.getByRole('checkbox', { name: c.label })).not.toBeChecked();
        } else {
          const group = screen.getByRole('group', { name: c.label });
          for (const option of c.choices)
            expect(within(group).getByRole('radio', { name: option.label })).toBeInTheDocument();
        }
      }
      expect(document.getElementById('method-dry-bars')).toHaveTextContent(spec.dryBars(defaults as never));
    }
  }, 20_000); // six method panels rendered and read in turn

  it('Horton’s “Capacity recovers in dry spells” is off by default; on, it shows the recovery rate and changes the losses and the dry-bar help', async () => {
    const storm = { durationsH: [0.5, 2, 0.5], depthsMm: [40, 0, 40] };
    const { user, scenario } = renderWorkbench({
      ...FOUR_BARS,
      storm,
      method: { kind: 'horton', f0MmH: 60, fcMmH: 8, kPerH: 3, ponding: false, recovers: false, recoveryPerH: 0.5 },
      observed: null,
    });
    const toggle = screen.getByRole('checkbox', { name: 'Capacity recovers in dry spells' });
    expect(toggle).not.toBeChecked();
    expect(screen.queryByRole('textbox', { name: /^Recovery rate k_r/ })).not.toBeInTheDocument();
    expect(document.getElementById('method-dry-bars')).toHaveTextContent(/clock runs on through dry bars/);
    await user.click(toggle);
    expect(scenario().method).toMatchObject({ recovers: true, recoveryPerH: 0.5 });
    expect(screen.getByRole('textbox', { name: /^Recovery rate k_r/ })).toHaveValue('0.5');
    // ln 2 / 0.5 = 1.386 h: "half of what was lost in 1.4 h".
    expect(document.getElementById('method-dry-bars')).toHaveTextContent(
      /grow back towards f₀ \(half of what was lost in 1\.4 h\)/,
    );
    // The screen shows the core's losses with recovery: 8·0.5 + (52/3)·D₂·(1 − e^(−1.5)) in bar 3 (see the core tests).
    expect(screen.getByLabelText('Loss depth')).toHaveTextContent(
      mmText(coreTotals(storm, scenario().method).totalLossMm),
    );
    await user.click(toggle);
    expect(scenario().method).toMatchObject({ recovers: false });
    expect(screen.queryByRole('textbox', { name: /^Recovery rate k_r/ })).not.toBeInTheDocument();
  });

  it('Green–Ampt’s “Capacity recovers in dry spells” shows the soil values Sᵢ and λ (no rate), changes the losses and says what dry bars do', async () => {
    const storm = { durationsH: [1, 6, 0.5], depthsMm: [30, 0, 20] };
    const { user, scenario } = renderWorkbench({
      ...FOUR_BARS,
      storm,
      method: {
        kind: 'green-ampt',
        ksMmH: 3.4,
        suctionMm: 88.9,
        moistureDeficit: 0.3038,
        recovers: false,
        initialSaturation: 0.3,
        poreSizeIndex: 0.22,
      },
      observed: null,
    });
    const toggle = screen.getByRole('checkbox', { name: 'Capacity recovers in dry spells' });
    expect(toggle).toHaveAccessibleDescription(/Ogden & Saghafian 1997/);
    expect(toggle).toHaveAccessibleDescription(/there is no rate to set/);
    expect(screen.queryByRole('textbox', { name: /^Initial saturation Sᵢ/ })).not.toBeInTheDocument();
    expect(document.getElementById('method-dry-bars')).toHaveTextContent(/leaves the infiltrated depth/);
    const before = scenario().method;
    await user.click(toggle);
    expect(scenario().method).toMatchObject({ recovers: true, initialSaturation: 0.3, poreSizeIndex: 0.22 });
    expect(screen.getByRole('textbox', { name: /^Initial saturation Sᵢ/ })).toHaveValue('0.3');
    expect(screen.getByRole('textbox', { name: /^Pore-size distribution index λ/ })).toHaveValue('0.22');
    expect(screen.queryByRole('textbox', { name: /^Recovery rate/ })).not.toBeInTheDocument();
    expect(document.getElementById('method-dry-bars')).toHaveTextContent(/starts a new wetting front/);
    // The screen shows the core's losses with recovery, more than without (a 6-hour spell).
    const on = coreTotals(storm, scenario().method).totalLossMm;
    expect(on).toBeGreaterThan(coreTotals(storm, before).totalLossMm);
    expect(screen.getByLabelText('Loss depth')).toHaveTextContent(mmText(on));
    // Soil texture values keep the switch and set Sᵢ and λ with K, ψ and Δθ.
    await user.selectOptions(screen.getByRole('combobox', { name: 'Soil texture' }), 'clay');
    await user.click(screen.getByRole('button', { name: 'Use soil values' }));
    expect(scenario().method).toEqual({ ...greenAmptForTexture('clay', 0.3), recovers: true });
    expect(screen.getByRole('textbox', { name: /^Pore-size distribution index λ/ })).toHaveValue('0.131');
  });

  it('the curve number offers the S conversion only on the 0.05 basis, with the power relation chosen by default', async () => {
    const { user, scenario } = renderWorkbench({
      ...FOUR_BARS,
      method: { kind: 'curve-number', cn: 70, iaRatio: 0.2, conversion: 'power' },
      observed: null,
    });
    expect(screen.queryByRole('group', { name: 'S for Iₐ = 0.05 S' })).not.toBeInTheDocument();
    await user.click(
      within(screen.getByRole('group', { name: 'Initial abstraction' })).getByRole('radio', { name: 'Iₐ = 0.05 S' }),
    );
    const group = screen.getByRole('group', { name: 'S for Iₐ = 0.05 S' });
    expect(within(group).getByRole('radio', { name: /^S₀\.₀₅ = 1\.33 S₀\.₂\^1\.15/ })).toBeChecked();
    await user.click(within(group).getByRole('radio', { name: 'S₀.₀₅ = 1.42 S₀.₂' }));
    expect(scenario().method).toEqual({ kind: 'curve-number', cn: 70, iaRatio: 0.05, conversion: 'ratio' });
  });

  it('switching method keeps the storm and brings back each method’s last parameters', async () => {
    const { user, scenario } = renderWorkbench();
    const picker = screen.getByRole('combobox', { name: 'Loss method' });
    const rate = screen.getByRole('textbox', { name: 'Loss rate φ (mm/h)' });
    await user.clear(rate);
    await user.type(rate, '6.5');
    await user.selectOptions(picker, 'proportional');
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    expect(screen.getByRole('textbox', { name: 'Runoff coefficient' })).toHaveValue(
      String(defaultMethod('proportional').coefficient),
    );
    expect(screen.getByLabelText('Excess depth')).toHaveTextContent(
      mmText(coreTotals(FOUR_BARS.storm, defaultMethod('proportional')).totalExcessMm),
    );
    await user.selectOptions(picker, 'constant');
    expect(screen.getByRole('textbox', { name: 'Loss rate φ (mm/h)' })).toHaveValue('6.5');
    expect(screen.getByRole('slider', { name: 'Loss rate φ' })).toHaveAttribute('aria-valuenow', '6.5');
  });

  it('typed values go live as they are typed', async () => {
    const { user } = renderWorkbench();
    const rate = screen.getByRole('textbox', { name: 'Loss rate φ (mm/h)' });
    await user.clear(rate);
    await user.type(rate, '4');
    expect(screen.getByLabelText('Excess depth')).toHaveTextContent(
      mmText(coreTotals(FOUR_BARS.storm, { kind: 'constant', rateMmH: 4 }).totalExcessMm),
    );
  });

  it('an out-of-range value shows the core’s message beside the field and keeps the typed text', async () => {
    const { user, scenario } = renderWorkbench({ ...FOUR_BARS, method: { kind: 'proportional', coefficient: 0.5 } });
    const c = screen.getByRole('textbox', { name: 'Runoff coefficient' });
    await user.clear(c);
    await user.type(c, '1.5');
    expect(c).toHaveValue('1.5');
    expect(c).toHaveAttribute('aria-invalid', 'true');
    expect(c).toHaveAccessibleDescription(/Runoff coefficient must be between 0 and 1 \(got 1\.5\)/);
    // The store keeps the value from before the typing (never the "1" typed on the way), and leaving the field keeps the text.
    expect(scenario().method).toEqual({ kind: 'proportional', coefficient: 0.5 });
    expect(c).toHaveAccessibleDescription(/Not applied; still 0\.5\.$/);
    await user.tab();
    expect(c).toHaveValue('1.5');
    await user.clear(c);
    await user.type(c, '0.3');
    expect(c).not.toHaveAttribute('aria-invalid');
    expect(scenario().method).toEqual({ kind: 'proportional', coefficient: 0.3 });
  });

  it('text that is not a number is named in the message and never stored', async () => {
    const { user, scenario } = renderWorkbench();
    const rate = screen.getByRole('textbox', { name: 'Loss rate φ (mm/h)' });
    await user.clear(rate);
    await user.type(rate, '5x');
    expect(rate).toHaveAccessibleDescription(
      /“5x” is not a plain number; leave out any unit or word\. Not applied; still 8 mm\/h\./,
    );
    expect(scenario().method).toEqual({ kind: 'constant', rateMmH: 8 });
  });

  it('Escape puts back the stored value', async () => {
    const { user } = renderWorkbench();
    const rate = screen.getByRole('textbox', { name: 'Loss rate φ (mm/h)' });
    await user.clear(rate);
    await user.type(rate, 'abc{Escape}');
    expect(rate).toHaveValue('8');
  });

  it('"Use default values" restores the method’s defaults as one undoable edit', async () => {
    const { user, scenario } = renderWorkbench();
    await user.click(screen.getByRole('button', { name: 'Use default values' }));
    expect(scenario().method).toEqual(defaultMethod('constant'));
    await user.click(screen.getByRole('button', { name: 'Undo' }));
    expect(scenario().method).toEqual(FOUR_BARS.method);
  });
});

describe('infiltration methods', () => {
  it('Horton’s choice of what capacity follows is a labelled radio group that sets the method', async () => {
    const { user, scenario } = renderWorkbench({
      ...FOUR_BARS,
      method: { kind: 'horton', f0MmH: 15, fcMmH: 3, kPerH: 1.5, ponding: true },
    });
    const group = screen.getByRole('group', { name: 'Capacity follows' });
    await user.click(within(group).getByRole('radio', { name: 'time since the rain began' }));
    expect(scenario().method).toEqual({ kind: 'horton', f0MmH: 15, fcMmH: 3, kPerH: 1.5, ponding: false });
    // Capacity over clock time is drawn through the storm.
    expect(document.querySelector('[data-layer="capacity"]')?.getAttribute('d')).toMatch(/^M/);
    expect(screen.getByRole('list', { name: 'Legend' })).toHaveTextContent('Infiltration capacity');
  });

  it('Horton’s cross-parameter check is shown beside the field', async () => {
    const { user } = renderWorkbench({
      ...FOUR_BARS,
      method: { kind: 'horton', f0MmH: 15, fcMmH: 3, kPerH: 1.5, ponding: true },
    });
    const f0 = screen.getByRole('textbox', { name: /^Initial capacity f₀/ });
    await user.clear(f0);
    await user.type(f0, '2');
    expect(f0).toHaveAccessibleDescription(/must be at least the final capacity/);
    expect(f0).toHaveValue('2');
  });

  it('Green–Ampt soil texture values set K, ψ and Δθ from the core’s table in one undoable edit', async () => {
    const { user, scenario } = renderWorkbench({
      ...FOUR_BARS,
      method: { kind: 'green-ampt', ksMmH: 3.4, suctionMm: 88.9, moistureDeficit: 0.3 },
    });
    await user.selectOptions(screen.getByRole('combobox', { name: 'Soil texture' }), 'sandy loam');
    const se = screen.getByRole('textbox', { name: 'Initial effective saturation' });
    await user.clear(se);
    await user.type(se, '0.5');
    await user.click(screen.getByRole('button', { name: 'Use soil values' }));
    expect(scenario().method).toEqual(greenAmptForTexture('sandy loam', 0.5));
    expect(screen.getByRole('textbox', { name: 'Hydraulic conductivity K (mm/h)' })).toHaveValue('10.9');
    await user.click(screen.getByRole('button', { name: 'Undo' }));
    expect(scenario().method).toEqual({ kind: 'green-ampt', ksMmH: 3.4, suctionMm: 88.9, moistureDeficit: 0.3 });
    expect(document.querySelector('[data-layer="capacity"]')?.getAttribute('d')).toMatch(/^M/);
  });

  it('a saturation outside 0 to 1 is refused beside the field', async () => {
    const { user } = renderWorkbench({
      ...FOUR_BARS,
      method: { kind: 'green-ampt', ksMmH: 3.4, suctionMm: 88.9, moistureDeficit: 0.3 },
    });
    const se = screen.getByRole('textbox', { name: 'Initial effective saturation' });
    await user.clear(se);
    await user.type(se, '1.2');
    expect(se).toHaveAccessibleDescription(/between 0 \(dry\) and 1 \(saturated\)/);
  });
});
