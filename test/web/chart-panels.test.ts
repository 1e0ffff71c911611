// @vitest-environment happy-dom
import { afterEach, describe, expect, it } from 'vitest';
import '../../web/components/dg-curves-panel';
import '../../web/components/dg-latitude-panel';
import { escapeXml, svgDocument } from '../../web/charts/svg-document';
import { SERIES, SERIES_KEYS } from '../../web/charts/series';
import type { AnalysisView, LatitudeCounts } from '../../web/protocol';
import { fiveSlices, slice, view } from './chart-fixtures';

const EVIL = '<img src=x onerror=alert(1)>';

function latitude(slices: number): LatitudeCounts {
  return { bandDeg: 90, bands: 2, perSlice: new Uint32Array(slices * 2).fill(1), total: Uint32Array.from([slices, slices]) };
}

function evilView(): AnalysisView {
  const slices = [...fiveSlices().slice(0, 4), slice(EVIL, 10, 0, { occurrences: 3, hullKm2: 7, mstKm: 9, latSpan: 4 })];
  return view(slices, {
    ...latitude(5),
    indicatorsPerSlice: new Uint32Array(5 * 1 * 2).fill(1),
    indicatorsTotal: Uint32Array.from([5, 5]),
  }, {
    indicators: { sliceStart: new Uint32Array(6), lon: new Float32Array(0), lat: new Float32Array(0), kinds: [`${EVIL} & "coal"`], kind: new Uint8Array(0) },
  });
}

async function mount<K extends 'dg-curves-panel' | 'dg-latitude-panel'>(tag: K, v: AnalysisView, slice: number): Promise<HTMLElementTagNameMap[K]> {
  const el = document.createElement(tag);
  el.view = v;
  el.slice = slice;
  document.body.append(el);
  await el.updateComplete;
  return el;
}

afterEach(() => {
  document.body.replaceChildren();
});

describe('svgDocument', () => {
  it('escapes the five XML special characters', () => {
    expect(escapeXml(`<a href="x">Tom & 'Jerry'</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;Tom &amp; &apos;Jerry&apos;&lt;/a&gt;');
  });

  it('writes text marks, title and description as text, never markup', () => {
    const text = svgDocument({ width: 10, height: 10, title: EVIL, description: EVIL, marks: [{ kind: 'text', x: 0, y: 0, text: EVIL, anchor: 'start', size: 10 }] });
    expect(text).not.toContain('<img');
    expect(text.split('&lt;img src=x onerror=alert(1)&gt;').length).toBe(4);
    const parsed = new DOMParser().parseFromString(text, 'image/svg+xml');
    expect(parsed.querySelector('img')).toBeNull();
    expect(parsed.querySelector('text')?.textContent).toBe(EVIL);
  });
});

describe('dg-curves-panel', () => {
  it('renders one labelled checkbox per series and a normalise toggle', async () => {
    const el = await mount('dg-curves-panel', view(fiveSlices(), latitude(5)), 0);
    const boxes = Array.from(el.shadowRoot!.querySelectorAll<HTMLInputElement>('input[type="checkbox"][data-key]'));
    expect(boxes.map((b) => b.dataset.key)).toEqual(SERIES_KEYS);
    expect(boxes.map((b) => b.closest('label')?.textContent?.trim())).toEqual(SERIES.map((s) => s.label));
    expect(boxes.every((b) => b.checked)).toBe(true);
    expect(el.shadowRoot!.querySelector('label.normalise input[type="checkbox"]')).not.toBeNull();
  });

  it('names the collections series "distinct places" when the table has no collection ids', async () => {
    const el = await mount('dg-curves-panel', view(fiveSlices(), latitude(5), { collectionsArePositions: true }), 0);
    expect(el.shadowRoot!.querySelector('input[data-key="collections"]')!.closest('label')!.textContent!.trim()).toBe('distinct places');
  });

  it('shows a hostile slice name as text in the readout, the slice marks and the exported SVG', async () => {
    const el = await mount('dg-curves-panel', evilView(), 4);
    const root = el.shadowRoot!;
    expect(root.querySelector('img')).toBeNull();
    expect(root.querySelector('.readout')?.textContent).toContain(EVIL);
    expect(root.querySelector('rect[data-slice="4"]')?.getAttribute('aria-label')).toContain(EVIL);
    const svg = el.toSvg();
    expect(svg).not.toContain('<img');
    expect(svg).toContain('&lt;img src=x onerror=alert(1)&gt;');
  });

  it('announces series and normalise changes, keeping only the ticked series', async () => {
    const el = await mount('dg-curves-panel', view(fiveSlices(), latitude(5)), 0);
    const seen: unknown[] = [];
    el.addEventListener('curves-change', (e) => seen.push((e as CustomEvent).detail));
    el.shadowRoot!.querySelector<HTMLInputElement>('input[data-key="taxa"]')!.click();
    await el.updateComplete;
    el.shadowRoot!.querySelector<HTMLInputElement>('label.normalise input')!.click();
    expect(seen).toEqual([
      { series: SERIES_KEYS.filter((k) => k !== 'taxa'), normalise: false },
      { series: SERIES_KEYS.filter((k) => k !== 'taxa'), normalise: true },
    ]);
    expect(el.normalise).toBe(true);
  });

  it('selects a slice on click and on Enter, with a bubbling, composed slice-select', async () => {
    const el = await mount('dg-curves-panel', view(fiveSlices(), latitude(5)), 0);
    const seen: unknown[] = [];
    document.body.addEventListener('slice-select', (e) => seen.push((e as CustomEvent).detail));
    el.shadowRoot!.querySelector<SVGRectElement>('rect[data-slice="2"]')!.dispatchEvent(new MouseEvent('click', { bubbles: true }));
    el.shadowRoot!.querySelector<SVGRectElement>('rect[data-slice="3"]')!.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true }));
    expect(seen).toEqual([{ slice: 2 }, { slice: 3 }]);
  });

  it('makes the current slice the tab stop and marks it selected', async () => {
    const el = await mount('dg-curves-panel', view(fiveSlices(), latitude(5)), 1);
    const rects = Array.from(el.shadowRoot!.querySelectorAll('rect[role="option"]'));
    expect(rects.map((r) => r.getAttribute('tabindex'))).toEqual(['-1', '0', '-1', '-1', '-1']);
    expect(rects.map((r) => r.getAttribute('aria-selected'))).toEqual(['false', 'true', 'false', 'false', 'false']);
  });

  it('moves only the highlight when the slice changes: the drawn paths stay the same nodes', async () => {
    const el = await mount('dg-curves-panel', view(fiveSlices(), latitude(5)), 0);
    const root = el.shadowRoot!;
    const paths = Array.from(root.querySelectorAll('svg.drawing path'));
    const ds = paths.map((p) => p.getAttribute('d'));
    const before = root.querySelector('rect.highlight')!.getAttribute('x');
    el.slice = 3;
    await el.updateComplete;
    const after = Array.from(root.querySelectorAll('svg.drawing path'));
    expect(after.length).toBe(paths.length);
    expect(after.every((p, i) => p === paths[i] && p.getAttribute('d') === ds[i])).toBe(true);
    expect(root.querySelector('rect.highlight')!.getAttribute('x')).not.toBe(before);
  });
});

describe('dg-latitude-panel', () => {
  it('shows a hostile slice name and indicator kind as text on screen and in the exported SVG', async () => {
    const el = await mount('dg-latitude-panel', evilView(), 4);
    const root = el.shadowRoot!;
    expect(root.querySelector('img')).toBeNull();
    const texts = Array.from(root.querySelectorAll('svg.drawing text'), (t) => t.textContent);
    expect(texts).toContain(`${EVIL} (n = 2)`);
    expect(texts).toContain(`${EVIL} & "coal"`);
    expect(root.querySelector('.readout')?.textContent).toContain(EVIL);
    const svg = el.toSvg();
    expect(svg).not.toContain('<img');
    expect(svg).toContain('&lt;img src=x onerror=alert(1)&gt; &amp; &quot;coal&quot;');
  });

  it('labels the chart with a summary and each band with its counts', async () => {
    const el = await mount('dg-latitude-panel', view(fiveSlices(), latitude(5)), 0);
    const root = el.shadowRoot!;
    expect(root.querySelector('svg.drawing')?.getAttribute('role')).toBe('img');
    expect(root.querySelector('svg.drawing')?.getAttribute('aria-label')).toMatch(/^Share of occurrences per 90° palaeolatitude band/);
    expect(Array.from(root.querySelectorAll('rect[role="listitem"]'), (r) => r.getAttribute('aria-label'))).toEqual([
      '90°S–0°: E1 1 of 2 (50.0%); all slices 5 of 10 (50.0%)',
      '0°–90°N: E1 1 of 2 (50.0%); all slices 5 of 10 (50.0%)',
    ]);
  });
});
