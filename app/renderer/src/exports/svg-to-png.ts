/**
 * Rasterises an SVG figure to PNG in the browser: the SVG is loaded as an image from a blob: URL
 * (allowed by the page's CSP, img-src blob:) and drawn on a canvas `scale` times its CSS size,
 * so a 2× PNG is sharp on paper and on high-density screens.
 */
export async function svgToPngBase64(
  svg: string,
  size: { width: number; height: number },
  scale: number,
): Promise<string> {
  const url = URL.createObjectURL(new Blob([svg], { type: 'image/svg+xml' }));
  try {
    const img = new Image();
    img.decoding = 'async';
    const loaded = new Promise<void>((resolve, reject) => {
      img.onload = () => resolve();
      img.onerror = () => reject(new Error('The figure could not be drawn as an image.'));
    });
    img.src = url;
    await loaded;
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(size.width * scale);
    canvas.height = Math.round(size.height * scale);
    const ctx = canvas.getContext('2d');
    if (!ctx) throw new Error('This browser cannot draw images (no 2D canvas).');
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(0, 0, canvas.width, canvas.height);
    ctx.drawImage(img, 0, 0, canvas.width, canvas.height);
    return canvas.toDataURL('image/png').split(',')[1];
  } finally {
    URL.revokeObjectURL(url);
  }
}
