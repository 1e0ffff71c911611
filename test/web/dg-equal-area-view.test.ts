// @vitest-environment happy-dom
// The element's accessible description, notice and legend, and its SVG export, in a DOM
// without canvas drawing (happy-dom): the drawing itself is checked in a real browser.
import { describe, expect, it } from 'vitest';
import { countScale } from '../../web/colour/measure-scale';
import '../../web/components/dg-equal-area-view';
import { MEASURE_UNITS, measureMax } from '../../web/state/view-options';
import { smallView } from './small-analysis-view';

// happy-dom has no Path2D; the element builds paths in idle time even where nothing is drawn,
// so a stand-in that keeps nothing takes its place.
class InertPath2D {
  moveTo(): void {}
  lineTo(): void {}
  closePath(): void {}
  arc(): void {}
  addPath(): void {}
}
if (!('Path2D' in globalThis)) Object.assign(globalThis, { Path2D: InertPath2D });

async function mounted() {
  const element = document.createElement('dg-equal-area-view');
  document.body.append(element);
  element.view = smallView();
  element.slice = 2;
  element.measure = 'taxa';
  await element.updateComplete;
  return element;
}

describe('dg-equal-area-view', () => {
  it('labels its canvas as an image stating slice, projection, measure and counts', async () => {
    const element = await mounted();
    element.projection = 'polar-south';
    await element.updateComplete;
    const canvas = element.shadowRoot!.querySelector('canvas')!;
    const s = element.view!.slices[2];
    expect(canvas.getAttribute('role')).toBe('img');
    const label = canvas.getAttribute('aria-label')!;
    for (const part of ['south polar equal-area', 'Slice three, 90–80 Ma', `${s.cells} occupied cells`, MEASURE_UNITS.taxa, `${s.positions} distinct places`]) {
      expect(label).toContain(part);
    }
    expect(element.shadowRoot!.textContent).toContain('southern hemisphere only');
    element.remove();
  });

  it('shows the notice above the map only when it has one', async () => {
    const element = await mounted();
    expect(element.shadowRoot!.querySelector('.notice')).toBeNull();
    element.notice = 'No WebGL here: drawn on a canvas.';
    await element.updateComplete;
    expect(element.shadowRoot!.querySelector('.notice')!.textContent).toBe('No WebGL here: drawn on a canvas.');
    element.remove();
  });

  it('labels the legend with the unit and the scale\'s ticks', async () => {
    const element = await mounted();
    const ticks = [...element.shadowRoot!.querySelectorAll('.tick')].map((t) => t.textContent);
    expect(ticks).toEqual(countScale(measureMax(element.view!, 'taxa')).ticks.map(String));
    expect(element.shadowRoot!.querySelector('.legend')!.textContent).toContain(MEASURE_UNITS.taxa);
    element.remove();
  });

  it('exports the shown slice as SVG at the default figure width before it is laid out', async () => {
    const element = await mounted();
    const svg = element.toSvg();
    expect(svg).toContain('<title>Slice three, 90–80 Ma</title>');
    expect(svg).toMatch(/^<\?xml[^]*<svg [^>]*width="960"/);
    const cells = element.view!.cells.sliceStart[3] - element.view!.cells.sliceStart[2];
    expect(svg.match(/data-cell=/g)?.length).toBe(cells);
    element.remove();
  });
});
