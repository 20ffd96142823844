/**
 * Turns the live chart's SVG into a file that stands alone: every element's
 * computed style written inline (the page's stylesheet and its colour
 * variables do not travel with a file), interaction attributes dropped, a
 * white background, and below the chart the scenario line and the caution,
 * which every export carries.
 */

const SVG_NS = 'http://www.w3.org/2000/svg';

/** Painting properties copied onto every element. */
const PAINT = [
  'fill',
  'fill-opacity',
  'fill-rule',
  'stroke',
  'stroke-width',
  'stroke-opacity',
  'stroke-dasharray',
  'stroke-linecap',
  'stroke-linejoin',
  'opacity',
  'visibility',
] as const;
/** Text properties, copied onto text and the groups that hold it. */
const TEXT = [
  'font-family',
  'font-size',
  'font-weight',
  'font-style',
  'text-anchor',
  'dominant-baseline',
  'font-variant-numeric',
] as const;
const TEXT_ELEMENTS = new Set(['svg', 'g', 'text', 'tspan']);

/** Attributes that only matter on the page (focus, roles, labels for the live chart, class hooks). */
function isPageOnly(name: string): boolean {
  return (
    name === 'class' ||
    name === 'role' ||
    name === 'tabindex' ||
    name === 'style' ||
    name.startsWith('aria-') ||
    name.startsWith('data-')
  );
}

/**
 * Writes an element's inline style through the CSS object model, not
 * setAttribute('style'): the app's Content-Security-Policy refuses inline
 * style attributes set as markup, while CSSOM writes are the page's own.
 * The file's serialisation writes it out as a style attribute all the same.
 */
function setStyle(target: Element, css: string): void {
  (target as SVGElement).style.cssText = css;
}

function inlineStyle(source: Element, target: Element, view: Window): void {
  const computed = view.getComputedStyle(source);
  const parts: string[] = [];
  const take = (prop: string): void => {
    // Browsers resolve url(#id) to the page's address; a file must point at its own ids.
    const value = computed
      .getPropertyValue(prop)
      .trim()
      .replace(/url\((["']?)[^"')]*?(#[^"')]+)\1\)/g, 'url($2)');
    if (value !== '') parts.push(`${prop}:${value}`);
  };
  PAINT.forEach(take);
  if (TEXT_ELEMENTS.has(source.localName)) TEXT.forEach(take);
  for (const attr of Array.from(target.attributes)) {
    if (isPageOnly(attr.name)) target.removeAttribute(attr.name);
  }
  if (parts.length > 0) setStyle(target, parts.join(';'));
}

/** Walks the live tree and its copy side by side (same shape), styling each copy from its original. */
function inlineTree(source: Element, target: Element, view: Window): void {
  inlineStyle(source, target, view);
  const from = source.children;
  const to = target.children;
  for (let i = 0; i < from.length && i < to.length; i++) inlineTree(from[i] as Element, to[i] as Element, view);
}

/** Splits text into lines of at most `max` characters at spaces. */
export function wrapText(text: string, max: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    if (line !== '' && line.length + 1 + word.length > max) {
      lines.push(line);
      line = word;
    } else line = line === '' ? word : `${line} ${word}`;
  }
  if (line !== '') lines.push(line);
  return lines;
}

/** A legend entry: drawn only when `selector` finds a shape in the live chart, in that shape's colour. */
export interface LegendEntry {
  readonly selector: string;
  readonly label: string;
  /** 'fill': a swatch in the shape's fill; 'line': a stroke in the shape's stroke and dashes. */
  readonly kind: 'fill' | 'line';
}

export interface StandaloneOptions {
  /** First line under the chart (scenario name, method). */
  readonly heading: string;
  /** The caution text; always printed under the chart. */
  readonly caution: string;
  /** What the colours are (the page's legend is HTML beside the chart, so the file needs its own). */
  readonly legend?: readonly LegendEntry[];
}

interface LegendItem {
  readonly label: string;
  readonly kind: 'fill' | 'line';
  readonly paint: string;
  readonly dash: string | null;
}

/** The legend entries whose shapes are in the live chart, with those shapes' computed colours. */
function legendItems(live: SVGSVGElement, entries: readonly LegendEntry[], view: Window): LegendItem[] {
  const items: LegendItem[] = [];
  for (const entry of entries) {
    const shape = live.querySelector(entry.selector);
    if (!shape) continue;
    const style = view.getComputedStyle(shape);
    const paint = style
      .getPropertyValue(entry.kind === 'fill' ? 'fill' : 'stroke')
      .trim()
      .replace(/url\((["']?)[^"')]*?(#[^"')]+)\1\)/g, 'url($2)');
    const dash = style.getPropertyValue('stroke-dasharray').trim();
    items.push({
      label: entry.label,
      kind: entry.kind,
      paint: paint || '#000',
      dash: dash === '' || dash === 'none' ? null : dash,
    });
  }
  return items;
}

export interface StandaloneSvg {
  readonly text: string;
  readonly width: number;
  readonly height: number;
}

const FOOT_FONT_PX = 11;
const FOOT_LINE_PX = 15;

/** The standalone SVG text of a live chart element. Needs the element to be in a document (for computed styles). */
export function standaloneSvg(live: SVGSVGElement, options: StandaloneOptions): StandaloneSvg {
  const doc = live.ownerDocument;
  const view = doc.defaultView;
  if (!view) throw new Error('The chart is not on a page, so its styles cannot be read.');
  const box = live.getBoundingClientRect();
  const width = Math.round(Number(live.getAttribute('width')) || box.width || 800);
  const chartHeight = Math.round(Number(live.getAttribute('height')) || box.height || 360);

  const copy = live.cloneNode(true) as SVGSVGElement;
  inlineTree(live, copy, view);

  const font = view.getComputedStyle(live).getPropertyValue('font-family').trim() || 'sans-serif';
  const perLine = Math.max(40, Math.floor((width - 24) / (FOOT_FONT_PX * 0.56)));
  const headLines = wrapText(options.heading, perLine);
  const cautionLines = wrapText(`Caution: ${options.caution}`, perLine);
  const legend = legendItems(live, options.legend ?? [], view);
  const footHeight = 12 + (headLines.length + cautionLines.length + (legend.length > 0 ? 1 : 0)) * FOOT_LINE_PX;
  const height = chartHeight + footHeight;

  const root = doc.createElementNS(SVG_NS, 'svg');
  root.setAttribute('width', String(width));
  root.setAttribute('height', String(height));
  root.setAttribute('viewBox', `0 0 ${width} ${height}`);
  root.setAttribute('font-family', font);

  const title = doc.createElementNS(SVG_NS, 'title');
  title.textContent = options.heading;
  root.appendChild(title);
  const desc = doc.createElementNS(SVG_NS, 'desc');
  desc.textContent = `Caution: ${options.caution}`;
  root.appendChild(desc);

  const background = doc.createElementNS(SVG_NS, 'rect');
  background.setAttribute('width', String(width));
  background.setAttribute('height', String(height));
  background.setAttribute('fill', '#ffffff');
  root.appendChild(background);

  const chart = doc.createElementNS(SVG_NS, 'g');
  const copyStyle = copy.getAttribute('style');
  if (copyStyle) setStyle(chart, copyStyle);
  while (copy.firstChild) chart.appendChild(copy.firstChild);
  root.appendChild(chart);

  const foot = doc.createElementNS(SVG_NS, 'g');
  foot.setAttribute('font-size', String(FOOT_FONT_PX));
  foot.setAttribute('fill', '#1d232a');
  let y = chartHeight + 4;
  const line = (text: string, weight: string): void => {
    y += FOOT_LINE_PX;
    const t = doc.createElementNS(SVG_NS, 'text');
    t.setAttribute('x', '12');
    t.setAttribute('y', String(y));
    t.setAttribute('font-weight', weight);
    t.textContent = text;
    foot.appendChild(t);
  };
  if (legend.length > 0) {
    y += FOOT_LINE_PX;
    let x = 12;
    for (const item of legend) {
      const mark = doc.createElementNS(SVG_NS, item.kind === 'fill' ? 'rect' : 'line');
      if (item.kind === 'fill') {
        mark.setAttribute('x', String(x));
        mark.setAttribute('y', String(y - 9));
        mark.setAttribute('width', '14');
        mark.setAttribute('height', '10');
        setStyle(mark, `fill:${item.paint}`);
      } else {
        mark.setAttribute('x1', String(x));
        mark.setAttribute('x2', String(x + 18));
        mark.setAttribute('y1', String(y - 4));
        mark.setAttribute('y2', String(y - 4));
        setStyle(mark, `stroke:${item.paint};stroke-width:2.5${item.dash ? `;stroke-dasharray:${item.dash}` : ''}`);
      }
      foot.appendChild(mark);
      const gap = item.kind === 'fill' ? 19 : 24;
      const t = doc.createElementNS(SVG_NS, 'text');
      t.setAttribute('x', String(x + gap));
      t.setAttribute('y', String(y));
      t.textContent = item.label;
      foot.appendChild(t);
      x += gap + item.label.length * FOOT_FONT_PX * 0.56 + 18;
    }
  }
  headLines.forEach((l) => line(l, '600'));
  cautionLines.forEach((l) => line(l, '400'));
  root.appendChild(foot);

  // The serialiser writes the namespace of an element made in it; say it in any case, once.
  let xml = new view.XMLSerializer().serializeToString(root);
  if (!/^<svg[^>]*\sxmlns="/.test(xml)) xml = xml.replace(/^<svg/, `<svg xmlns="${SVG_NS}"`);
  const text = `<?xml version="1.0" encoding="UTF-8"?>\n${xml}\n`;
  return { text, width, height };
}
