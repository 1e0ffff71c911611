// @vitest-environment happy-dom
import { describe, expect, it, vi } from 'vitest';
import { fiveSlices, view } from './chart-fixtures';

// Count the curves geometry computations: the panel must reuse them when only the slice changes.
const counted = vi.hoisted(() => ({ calls: 0 }));
vi.mock('../../web/charts/curves-layout', async (importOriginal) => {
  const original = await importOriginal<typeof import('../../web/charts/curves-layout')>();
  return {
    ...original,
    curvesLayout: (...args: Parameters<typeof original.curvesLayout>) => {
      counted.calls++;
      return original.curvesLayout(...args);
    },
  };
});

await import('../../web/components/dg-curves-panel');

describe('dg-curves-panel geometry', () => {
  it('is computed once per view, series, normalise and width, not again when the slice changes', async () => {
    const el = document.createElement('dg-curves-panel');
    el.view = view(fiveSlices(), { bandDeg: 90, bands: 2, perSlice: new Uint32Array(10), total: new Uint32Array(2) });
    document.body.append(el);
    await el.updateComplete;
    expect(counted.calls).toBe(1);
    const highlight = el.shadowRoot!.querySelector('rect.highlight')!;
    for (const s of [1, 2, 3, 4]) {
      el.slice = s;
      await el.updateComplete;
    }
    expect(counted.calls).toBe(1);
    expect(highlight.getAttribute('x')).toBe(el.shadowRoot!.querySelector('rect[data-slice="4"]')!.getAttribute('x'));
    el.normalise = true;
    await el.updateComplete;
    expect(counted.calls).toBe(2);
    el.series = ['taxa'];
    await el.updateComplete;
    expect(counted.calls).toBe(3);
  });
});
