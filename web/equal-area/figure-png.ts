/** The map figure as a PNG (drawFigure on a canvas of its own, at `pixelRatio` pixels per CSS px). */
import { drawFigure, type FigureDrawing } from './draw-figure';
import type { ProjectedView } from './projected-view';

export async function figurePng(projected: ProjectedView, figure: FigureDrawing, pixelRatio: number): Promise<Blob> {
  const width = Math.round(figure.layout.width * pixelRatio), height = Math.round(figure.layout.height * pixelRatio);
  // A canvas meant to be read back: browsers then keep it in memory rather than on the GPU,
  // which makes encoding it far quicker, most of all where the GPU is emulated.
  if (typeof OffscreenCanvas === 'function') {
    const canvas = new OffscreenCanvas(width, height);
    drawFigure(need(canvas.getContext('2d', { willReadFrequently: true })), projected, figure, pixelRatio);
    return canvas.convertToBlob({ type: 'image/png' });
  }
  const canvas = Object.assign(document.createElement('canvas'), { width, height });
  drawFigure(need(canvas.getContext('2d', { willReadFrequently: true })), projected, figure, pixelRatio);
  return new Promise((resolve, reject) => canvas.toBlob((blob) => (blob === null ? reject(new Error('The browser could not encode the PNG figure.')) : resolve(blob)), 'image/png'));
}

function need<T>(context: T | null): T {
  if (context === null) throw new Error('No 2D canvas is available to draw the PNG figure.');
  return context;
}
