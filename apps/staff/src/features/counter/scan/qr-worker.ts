import jsQR from 'jsqr';

// Decodes camera frames off the page's main thread, so scrolling and taps
// stay quick while the camera runs.

interface Frame {
  pixels: ArrayBuffer;
  width: number;
  height: number;
}

const scope = self as unknown as { onmessage: ((e: MessageEvent<Frame>) => void) | null; postMessage(message: unknown): void };

scope.onmessage = (event) => {
  const { pixels, width, height } = event.data;
  const found = jsQR(new Uint8ClampedArray(pixels), width, height, { inversionAttempts: 'attemptBoth' });
  scope.postMessage({ text: found?.data ?? null });
};
