/**
 * A PNG of an SVG document: the SVG is loaded as an image from a blob: URL (allowed by the
 * page's img-src) and drawn onto a canvas `scale` times its size. The SVG must be standalone
 * (no external references), or the canvas would refuse to export.
 */
export async function svgToPngBlob(svgText: string, width: number, height: number, scale = 2): Promise<Blob> {
  const url = URL.createObjectURL(new Blob([svgText], { type: 'image/svg+xml' }));
  try {
    const image = new Image(width, height);
    image.src = url;
    await image.decode();
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(width * scale);
    canvas.height = Math.round(height * scale);
    const context = canvas.getContext('2d');
    if (context === null) throw new Error('could not draw the figure: no 2D canvas context');
    context.drawImage(image, 0, 0, canvas.width, canvas.height);
    return await new Promise<Blob>((resolve, reject) => {
      canvas.toBlob((blob) => (blob === null ? reject(new Error('could not encode the figure as PNG')) : resolve(blob)), 'image/png');
    });
  } finally {
    URL.revokeObjectURL(url);
  }
}
