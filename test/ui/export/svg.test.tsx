// @vitest-environment jsdom
import { act, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { CAUTION_TEXT } from '../../../src/scenario';
import type { Scenario } from '../../../src/scenario/types';
import { wrapText } from '../../../src/ui/export';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';
import { LAZY_LOAD_MS } from '../../helpers/render';
import { SHARED, renderTools, savedText } from '../../helpers/render-tools';

const MESSAGE = 'Scenario tools message';
const SVG_NS = 'http://www.w3.org/2000/svg';

// jsdom computes next to no styles from style sheets, so the copying of the
// page's colours into the file is checked in chromium (test/browser/share.spec.mjs).
async function exportedSvg(scenario: Scenario) {
  const view = renderTools({ fallback: scenario });
  await view.user.click(screen.getByRole('button', { name: 'Export SVG' }));
  const text = await savedText(view.saved);
  const doc = new DOMParser().parseFromString(text, 'image/svg+xml');
  return { ...view, text, doc };
}

describe('chart SVG', () => {
  it('is well-formed XML with an <svg> root that stands alone: every shape, no page hooks, and the caution', async () => {
    const { doc, text, saved } = await exportedSvg(FOUR_BARS);
    expect(saved[0]?.name).toBe('four-bars-chart.svg');
    expect(doc.getElementsByTagName('parsererror')).toHaveLength(0);
    const root = doc.documentElement;
    expect(root.localName).toBe('svg');
    expect(root.namespaceURI).toBe(SVG_NS);
    expect(Number(root.getAttribute('width'))).toBeGreaterThan(0);
    expect(root.getAttribute('viewBox')).toBe(`0 0 ${root.getAttribute('width')} ${root.getAttribute('height')}`);
    expect(text.startsWith('<?xml version="1.0" encoding="UTF-8"?>')).toBe(true);

    // The page's class, role and focus hooks are gone; the chart's shapes are all there.
    for (const el of Array.from(root.querySelectorAll('*'))) {
      for (const attr of ['class', 'role', 'tabindex', 'aria-label', 'aria-hidden', 'data-layer'])
        expect(el.hasAttribute(attr)).toBe(false);
    }
    const live = document.querySelector('svg.chart__svg');
    expect(root.querySelectorAll('path')).toHaveLength(live?.querySelectorAll('path').length ?? -1);
    expect(root.querySelectorAll('path').length).toBeGreaterThanOrEqual(2);

    // Under the chart: the scenario and method, then the caution, wrapped into lines.
    const words = (root.textContent ?? '').replace(/\s+/g, ' ');
    expect(words).toContain('Four bars — Constant loss rate (φ-index); Loss rate φ = 8 mm/h');
    const footer = Array.from(root.querySelectorAll('text'))
      .map((t) => t.textContent ?? '')
      .join(' ');
    expect(footer).toContain(`Caution: ${CAUTION_TEXT}`);
    expect(root.querySelector('desc')?.textContent).toBe(`Caution: ${CAUTION_TEXT}`);
    expect(screen.getByRole('status', { name: MESSAGE })).toHaveTextContent('Exported four-bars-chart.svg.');
  });

  it('keeps the chart’s own pattern for the initial-loss part, and the loss-rate line', async () => {
    const ic = renderTools({ fallback: SHARED });
    act(() => ic.actions.setMethodKind('initial-continuing'));
    await ic.user.click(screen.getByRole('button', { name: 'Export SVG' }));
    const doc = new DOMParser().parseFromString(await savedText(ic.saved), 'image/svg+xml');
    expect(doc.getElementsByTagName('parsererror')).toHaveLength(0);
    expect(doc.getElementById('part-hatch')?.localName).toBe('pattern');
    expect(doc.querySelectorAll('pattern line')).toHaveLength(1);
    // The file has its own legend, in the method's words.
    const texts = Array.from(doc.querySelectorAll('text')).map((t) => t.textContent);
    for (const label of ['Rainfall excess', 'Loss', 'Initial loss', 'Continuing loss rate'])
      expect(texts).toContain(label);
    // The live chart's line group (three lines and its tag) is copied as drawn.
    expect(doc.querySelectorAll('line').length).toBeGreaterThan(3);
  });

  it('with no chart on screen, says so and saves nothing', async () => {
    const view = renderTools({ fallback: FOUR_BARS });
    document.querySelector('svg.chart__svg')?.classList.remove('chart__svg');
    await view.user.click(screen.getByRole('button', { name: 'Export SVG' }));
    expect(await screen.findByRole('alert', { name: MESSAGE }, { timeout: LAZY_LOAD_MS })).toHaveTextContent(
      'The chart was not exported: the chart is not on screen.',
    );
    expect(view.saved).toEqual([]);
  });

  it('the live chart’s text is escaped, so odd names cannot break the file', async () => {
    const { doc } = await exportedSvg({ ...FOUR_BARS, name: 'Culvert <B> & "C" ]]>' });
    expect(doc.getElementsByTagName('parsererror')).toHaveLength(0);
    expect(doc.querySelector('title')?.textContent).toMatch(/^Culvert <B> & "C" \]\]> — /);
  });

  it('wraps the caution at word boundaries', () => {
    expect(wrapText('aa bb cc dd', 5)).toEqual(['aa bb', 'cc dd']);
    expect(wrapText('averyveryverylongword x', 5)).toEqual(['averyveryverylongword', 'x']);
    expect(wrapText('   ', 5)).toEqual([]);
  });
});
