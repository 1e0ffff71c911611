/**
 * Many small squares of one colour, written straight into a pixel buffer and laid over the
 * canvas in one drawImage. Drawing them as a path costs the canvas a rasterised rectangle each;
 * this costs four to sixteen integer writes each plus one image copy, so a slice with hundreds
 * of thousands of places still draws in a frame or two. The squares sit on whole device pixels,
 * where a path of squares would too (see drawPlaces), so both give the same picture.
 */
import type { Canvas2D } from './draw-map';

interface Buffer {
  readonly image: ImageData;
  readonly pixels: Uint32Array;
  /** A canvas of the same size to stage the pixels on (putImageData replaces, drawImage blends). */
  readonly stage: CanvasImageSource;
  readonly stageContext: OffscreenCanvasRenderingContext2D | CanvasRenderingContext2D;
}

function createBuffer(width: number, height: number): Buffer {
  const image = new ImageData(width, height);
  let stage: OffscreenCanvas | HTMLCanvasElement, stageContext: OffscreenCanvasRenderingContext2D | CanvasRenderingContext2D | null;
  if (typeof OffscreenCanvas === 'function') {
    stage = new OffscreenCanvas(width, height);
    stageContext = stage.getContext('2d');
  } else {
    stage = Object.assign(document.createElement('canvas'), { width, height });
    stageContext = stage.getContext('2d');
  }
  if (stageContext === null) throw new Error('No 2D canvas is available to draw the places.');
  return { image, pixels: new Uint32Array(image.data.buffer), stage, stageContext };
}

export class DotRaster {
  #buffer: Buffer | undefined;

  /**
   * Squares `side` device pixels wide with top-left corners at the device positions
   * (round(k·x + tx), round(k·y + ty)) for points from … to − 1 of xy (NaN x: skipped), in
   * colour [r, g, b] (0–255) at `alpha` (0–1). Draws on ctx with ctx's transform set to identity.
   */
  draw(ctx: Canvas2D, xy: Float32Array, from: number, to: number, k: number, tx: number, ty: number, side: number, rgb: readonly number[], alpha: number): void {
    const width = ctx.canvas.width, height = ctx.canvas.height;
    let buffer = this.#buffer;
    if (buffer === undefined || buffer.image.width !== width || buffer.image.height !== height) buffer = this.#buffer = createBuffer(width, height);
    const { pixels } = buffer;
    // ImageData holds unpremultiplied RGBA bytes; read as little-endian 32-bit words: ABGR.
    const colour = ((Math.round(alpha * 255) << 24) | (rgb[2] << 16) | (rgb[1] << 8) | rgb[0]) >>> 0;
    let x0 = width, y0 = height, x1 = 0, y1 = 0;
    for (let i = from; i < to; i++) {
      const fx = xy[2 * i];
      if (fx !== fx) continue;
      const left = Math.max(0, Math.round(k * fx + tx)), top = Math.max(0, Math.round(k * xy[2 * i + 1] + ty));
      const right = Math.min(width, left + side), bottom = Math.min(height, top + side);
      for (let row = top * width, end = bottom * width; row < end; row += width) {
        for (let p = row + left; p < row + right; p++) pixels[p] = colour;
      }
      if (left < x0) x0 = left;
      if (top < y0) y0 = top;
      if (right > x1) x1 = right;
      if (bottom > y1) y1 = bottom;
    }
    if (x1 <= x0 || y1 <= y0) return;
    // Only the rectangle holding dots travels; it is wholly replaced on the stage, then cleared
    // in the buffer for the next draw.
    buffer.stageContext.putImageData(buffer.image, 0, 0, x0, y0, x1 - x0, y1 - y0);
    ctx.drawImage(buffer.stage, x0, y0, x1 - x0, y1 - y0, x0, y0, x1 - x0, y1 - y0);
    for (let y = y0; y < y1; y++) pixels.fill(0, y * width + x0, y * width + x1);
  }
}
