/** A standalone SVG document from marks, with every piece of text escaped. */
import { escapeXml } from '../equal-area/escape-xml';
import type { Mark } from './marks';

/** Font for every chart, on screen and in files (no web fonts: the page fetches nothing). */
export const CHART_FONT = 'system-ui, -apple-system, "Segoe UI", Roboto, sans-serif';

export { escapeXml };

function attr(name: string, value: string | number | undefined): string {
  return value === undefined || value === '' ? '' : ` ${name}="${escapeXml(String(value))}"`;
}

/** One mark as an SVG element. */
export function markToSvg(mark: Mark): string {
  switch (mark.kind) {
    case 'path':
      return `<path${attr('d', mark.d)}${attr('fill', mark.fill ?? 'none')}${attr('stroke', mark.stroke)}${attr('stroke-width', mark.strokeWidth)}${attr('stroke-dasharray', mark.dash)}/>`;
    case 'rect':
      return `<rect${attr('x', mark.x)}${attr('y', mark.y)}${attr('width', mark.width)}${attr('height', mark.height)}${attr('fill', mark.fill)}${attr('stroke', mark.stroke)}/>`;
    case 'text':
      return `<text${attr('x', mark.x)}${attr('y', mark.y)}${attr('text-anchor', mark.anchor)}${attr('font-size', mark.size)}${attr('fill', mark.fill)}${attr('font-weight', mark.bold === true ? 'bold' : undefined)}>${escapeXml(mark.text)}</text>`;
  }
}

export interface SvgDocumentParts {
  readonly width: number;
  readonly height: number;
  /** Document title (also what a viewer shows as its name). */
  readonly title: string;
  /** A sentence saying what is drawn (the same as the live chart's aria-label). */
  readonly description: string;
  readonly marks: readonly Mark[];
}

/** An SVG file's text: white background, title, description and the marks in order. */
export function svgDocument(parts: SvgDocumentParts): string {
  const { width, height } = parts;
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" role="img" font-family="${escapeXml(CHART_FONT)}">`,
    `<title>${escapeXml(parts.title)}</title>`,
    `<desc>${escapeXml(parts.description)}</desc>`,
    `<rect x="0" y="0" width="${width}" height="${height}" fill="white"/>`,
    ...parts.marks.map(markToSvg),
    '</svg>',
    '',
  ].join('\n');
}
