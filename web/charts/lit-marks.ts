/** Marks as Lit SVG templates: text goes through Lit bindings, so it is always text, never markup. */
import { nothing, svg, type SVGTemplateResult } from 'lit';
import type { Mark } from './marks';

export function renderMark(mark: Mark): SVGTemplateResult {
  switch (mark.kind) {
    case 'path':
      return svg`<path d=${mark.d} fill=${mark.fill ?? 'none'} stroke=${mark.stroke} stroke-width=${mark.strokeWidth} stroke-dasharray=${mark.dash === undefined || mark.dash === '' ? nothing : mark.dash}></path>`;
    case 'rect':
      return svg`<rect x=${mark.x} y=${mark.y} width=${mark.width} height=${mark.height} fill=${mark.fill} stroke=${mark.stroke ?? nothing}></rect>`;
    case 'text':
      return svg`<text x=${mark.x} y=${mark.y} text-anchor=${mark.anchor} font-size=${mark.size} fill=${mark.fill ?? nothing} font-weight=${mark.bold === true ? 'bold' : nothing}>${mark.text}</text>`;
  }
}

export function renderMarks(marks: readonly Mark[]): SVGTemplateResult[] {
  return marks.map(renderMark);
}
