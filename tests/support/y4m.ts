import { PNG } from 'pngjs';

/**
 * One frame of YUV4MPEG2 video (4:2:0, full-range "JPEG" levels) showing a
 * PNG on white, for Chromium's fake camera (--use-file-for-fake-video-capture).
 * RGB → Y'CbCr with the JFIF equations (ITU-T T.871):
 *   Y = 0.299 R + 0.587 G + 0.114 B
 *   Cb = 128 − 0.168736 R − 0.331264 G + 0.5 B
 *   Cr = 128 + 0.5 R − 0.418688 G − 0.081312 B
 */
export function pngToY4m(pngBytes: Buffer, width = 640, height = 480, scale = 2): Buffer {
  const png = PNG.sync.read(pngBytes);
  const rgb = (x: number, y: number): [number, number, number] => {
    const sx = Math.floor((x - (width - png.width * scale) / 2) / scale);
    const sy = Math.floor((y - (height - png.height * scale) / 2) / scale);
    if (sx < 0 || sy < 0 || sx >= png.width || sy >= png.height) return [255, 255, 255];
    const i = (sy * png.width + sx) * 4;
    const a = png.data[i + 3]! / 255; // over white
    return [0, 1, 2].map((c) => Math.round(png.data[i + c]! * a + 255 * (1 - a))) as [number, number, number];
  };
  const clamp = (v: number) => Math.max(0, Math.min(255, Math.round(v)));
  const yPlane = Buffer.alloc(width * height);
  const uPlane = Buffer.alloc((width / 2) * (height / 2));
  const vPlane = Buffer.alloc((width / 2) * (height / 2));
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const [r, g, b] = rgb(x, y);
      yPlane[y * width + x] = clamp(0.299 * r + 0.587 * g + 0.114 * b);
      if (x % 2 === 0 && y % 2 === 0) {
        const j = (y / 2) * (width / 2) + x / 2;
        uPlane[j] = clamp(128 - 0.168736 * r - 0.331264 * g + 0.5 * b);
        vPlane[j] = clamp(128 + 0.5 * r - 0.418688 * g - 0.081312 * b);
      }
    }
  }
  return Buffer.concat([Buffer.from(`YUV4MPEG2 W${width} H${height} F10:1 Ip A1:1 C420jpeg\nFRAME\n`), yPlane, uPlane, vPlane]);
}
