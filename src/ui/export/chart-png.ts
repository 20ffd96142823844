/**
 * Draws a standalone SVG onto a canvas at a scale (2× for sharp print and
 * slides) and returns it as a PNG. Plain 2D canvas, so no GPU is needed.
 */
export async function svgToPng(svgText: string, width: number, height: number, scale = 2): Promise<Blob> {
  const canvas = document.createElement('canvas');
  canvas.width = Math.round(width * scale);
  canvas.height = Math.round(height * scale);
  const context = canvas.getContext('2d');
  if (!context) throw new Error('this browser gives no drawing surface for pictures');

  const url = URL.createObjectURL(new Blob([svgText], { type: 'image/svg+xml' }));
  try {
    const image = new Image();
    image.decoding = 'sync';
    await new Promise<void>((resolve, reject) => {
      image.onload = () => resolve();
      image.onerror = () => reject(new Error('the chart picture could not be drawn'));
      image.src = url;
    });
    context.fillStyle = '#ffffff';
    context.fillRect(0, 0, canvas.width, canvas.height);
    context.setTransform(scale, 0, 0, scale, 0, 0);
    context.drawImage(image, 0, 0, width, height);
  } finally {
    URL.revokeObjectURL(url);
  }
  return new Promise<Blob>((resolve, reject) => {
    canvas.toBlob(
      (blob) => (blob ? resolve(blob) : reject(new Error('the picture could not be encoded as PNG'))),
      'image/png',
    );
  });
}
