// @vitest-environment happy-dom
import { afterEach, describe, expect, it } from 'vitest';
import type { SliceMetrics } from '../../src/analysis';
import '../../web/components/dg-slice-summary';
import '../../web/components/dg-time-strip';
import type { DgTimeStrip } from '../../web/components/dg-time-strip';
import { shownSlices } from '../../web/state/slice-range';

const slice = (name: string, baseMa: number, topMa: number, occurrences: number) => ({ name, baseMa, topMa, occurrences }) as SliceMetrics;
const SLICES = [slice('a', 120, 110, 0), slice('b', 110, 100, 5), slice('c', 100, 95, 9), slice('d', 95, 90, 2), slice('e', 90, 80, 0)];

afterEach(() => document.body.replaceChildren());

async function strip(current: number): Promise<{ element: DgTimeStrip; selected: number[] }> {
  const element = document.createElement('dg-time-strip');
  element.slices = SLICES;
  element.periods = SLICES.map(() => 'Cretaceous');
  element.slice = current;
  element.range = shownSlices(SLICES, false);
  document.body.append(element);
  await element.updateComplete;
  const selected: number[] = [];
  element.addEventListener('slice-select', (e) => selected.push((e as CustomEvent<{ slice: number }>).detail.slice));
  return { element, selected };
}

function press(element: DgTimeStrip, key: string): void {
  element.shadowRoot?.querySelector('[role="slider"]')?.dispatchEvent(new KeyboardEvent('keydown', { key, bubbles: true, composed: true }));
}

describe('shownSlices', () => {
  it('runs from the oldest to the youngest slice holding occurrences', () => {
    expect(shownSlices(SLICES, false)).toEqual({ from: 1, to: 3 });
    expect(shownSlices(SLICES, true)).toEqual({ from: 0, to: 4 });
    expect(shownSlices([slice('x', 1, 0, 0)], false)).toEqual({ from: 0, to: 0 });
  });
});

describe('the time strip', () => {
  it('is a slider whose value is the current slice within the shown range', async () => {
    const { element } = await strip(2);
    const slider = element.shadowRoot?.querySelector('[role="slider"]');
    expect(slider?.getAttribute('aria-valuemin')).toBe('2');
    expect(slider?.getAttribute('aria-valuemax')).toBe('4');
    expect(slider?.getAttribute('aria-valuenow')).toBe('3');
    expect(slider?.getAttribute('aria-valuetext')).toBe('c, 100–95 Ma, slice 2 of 3 shown (3 of 5 in the scale)');
    expect(element.shadowRoot?.querySelectorAll('svg rect').length).toBe(3 + 1); // three slices and the marker
  });

  it('steps with the arrow keys and jumps with Home/End, never past the shown range', async () => {
    const { element, selected } = await strip(2);
    press(element, 'ArrowRight');
    press(element, 'ArrowLeft');
    press(element, 'Home');
    press(element, 'End');
    press(element, 'PageUp');
    expect(selected).toEqual([3, 1, 1, 3, 3]);
  });

  it('asks for nothing when the key would stay on the current slice', async () => {
    const { element, selected } = await strip(3);
    press(element, 'ArrowRight');
    press(element, 'End');
    expect(selected).toEqual([]);
  });
});
