import type { Page } from 'playwright-core';

/**
 * A camera-sized JPEG (1600 × 1200, larger than the field app keeps) drawn by the browser: a
 * coloured shelf with a price tag. `noisy` scatters random pixels so the downscaled photo is
 * large enough to go up in several chunks.
 */
export async function generatedJpeg(page: Page, hue: number, noisy = false): Promise<Buffer> {
  const base64 = await page.evaluate(
    async ({ hue, noisy }) => {
      const canvas = new OffscreenCanvas(1600, 1200);
      const context = canvas.getContext('2d')!;
      context.fillStyle = `hsl(${hue} 60% 45%)`;
      context.fillRect(0, 0, 1600, 1200);
      if (noisy) {
        const pixels = context.getImageData(0, 0, 1600, 1200);
        for (let i = 0; i < pixels.data.length; i += 4) {
          pixels.data[i] = Math.random() * 255;
          pixels.data[i + 1] = Math.random() * 255;
        }
        context.putImageData(pixels, 0, 0);
      }
      context.fillStyle = '#fff';
      context.fillRect(500, 450, 600, 300);
      context.fillStyle = '#222';
      context.font = 'bold 120px sans-serif';
      context.fillText('KES 750', 540, 650);
      const blob = await canvas.convertToBlob({ type: 'image/jpeg', quality: 0.92 });
      const bytes = new Uint8Array(await blob.arrayBuffer());
      let text = '';
      for (const byte of bytes) text += String.fromCharCode(byte);
      return btoa(text);
    },
    { hue, noisy },
  );
  return Buffer.from(base64, 'base64');
}
