import { useEffect, useRef, useState } from 'react';

/** One line on why the camera can't be used, with the way out. */
export function cameraProblem(error: unknown): string {
  const name = error instanceof DOMException || error instanceof Error ? error.name : '';
  if (name === 'NotAllowedError' || name === 'SecurityError') return 'The camera is blocked for this page: allow it in the browser’s settings, or type the code.';
  if (name === 'NotFoundError' || name === 'OverconstrainedError') return 'No camera found on this device: type the code instead.';
  if (name === 'NotReadableError') return 'The camera is in use by another app: close that app, or type the code.';
  return 'The camera could not start: type the code instead.';
}

const FRAME_EVERY_MS = 120;
const MAX_WIDTH = 720;

/**
 * The device camera, with each frame handed to a worker that looks for a QR
 * code. Calls `onCode` once with the first code read.
 */
export function QrScan({ onCode, onClose }: { onCode: (text: string) => void; onClose: () => void }) {
  const video = useRef<HTMLVideoElement>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [running, setRunning] = useState(false);
  const found = useRef(onCode);
  found.current = onCode;

  useEffect(() => {
    if (!navigator.mediaDevices?.getUserMedia) {
      setProblem('This browser gives the page no camera: type the code instead.');
      return;
    }
    let stream: MediaStream | null = null;
    let stopped = false;
    let busy = false;
    const worker = new Worker(new URL('../scan/qr-worker.ts', import.meta.url), { type: 'module' });
    const canvas = document.createElement('canvas');
    const ctx = canvas.getContext('2d', { willReadFrequently: true });
    worker.onmessage = (event: MessageEvent<{ text: string | null }>) => {
      busy = false;
      if (event.data.text && !stopped) {
        stopped = true;
        found.current(event.data.text);
      }
    };
    const timer = setInterval(() => {
      const v = video.current;
      if (busy || stopped || !v || !ctx || v.readyState < 2 || v.videoWidth === 0) return;
      const scale = Math.min(1, MAX_WIDTH / v.videoWidth);
      canvas.width = Math.round(v.videoWidth * scale);
      canvas.height = Math.round(v.videoHeight * scale);
      ctx.drawImage(v, 0, 0, canvas.width, canvas.height);
      const frame = ctx.getImageData(0, 0, canvas.width, canvas.height);
      busy = true;
      worker.postMessage({ pixels: frame.data.buffer, width: frame.width, height: frame.height }, [frame.data.buffer]);
    }, FRAME_EVERY_MS);

    navigator.mediaDevices
      .getUserMedia({ video: { facingMode: 'environment' }, audio: false })
      .then(async (s) => {
        if (stopped) {
          s.getTracks().forEach((t) => t.stop());
          return;
        }
        stream = s;
        if (video.current) {
          video.current.srcObject = s;
          await video.current.play().catch(() => undefined);
          setRunning(true);
        }
      })
      .catch((error: unknown) => setProblem(cameraProblem(error)));

    return () => {
      stopped = true;
      clearInterval(timer);
      worker.terminate();
      stream?.getTracks().forEach((t) => t.stop());
    };
  }, []);

  return (
    <section aria-label="Scan a QR code" className="card flex flex-col gap-3">
      {problem ? (
        <p role="alert" className="notice notice-warn">
          {problem}
        </p>
      ) : (
        <>
          <video ref={video} muted playsInline aria-label="Camera" className="aspect-[4/3] w-full rounded-2xl bg-ink object-cover" />
          <p role="status" className="text-muted">
            {running ? 'Hold the customer’s QR code inside the frame.' : 'Starting the camera…'}
          </p>
        </>
      )}
      <button type="button" className="btn btn-quiet min-h-12" onClick={onClose}>
        {problem ? 'Close' : 'Stop scanning'}
      </button>
    </section>
  );
}
