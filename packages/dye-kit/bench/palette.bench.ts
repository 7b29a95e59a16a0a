// Palette extraction on a generated 1-megapixel image: prints the median and p95 time.
// Target (issue 4): median under 150 ms in Node on the 2-core development machine.
import { performance } from 'node:perf_hooks';
import { extractPalette } from '../src/palette.ts';
import { mulberry32 } from '../src/random.ts';

const WIDTH = 1000;
const HEIGHT = 1000;
const WARM_UP_RUNS = 3;
const TIMED_RUNS = 15;
const TARGET_MEDIAN_MS = 150;

/** Rock-pool-like picture: sea and sky bands, sand and weed patches, with pixel noise. */
function generateImage(): Uint8ClampedArray {
  const random = mulberry32(42);
  const data = new Uint8ClampedArray(WIDTH * HEIGHT * 4);
  for (let y = 0; y < HEIGHT; y++) {
    for (let x = 0; x < WIDTH; x++) {
      const i = (y * WIDTH + x) * 4;
      const pool = Math.sin(x / 90) * Math.cos(y / 70) > 0.3;
      const weed = Math.sin((x + y) / 37) > 0.85;
      const noise = (random() - 0.5) * 30;
      const [r, g, b] = weed
        ? [60, 110, 50]
        : pool
          ? [30, 110 + (y / HEIGHT) * 60, 140 + (x / WIDTH) * 60]
          : [190 + (x / WIDTH) * 30, 170, 130];
      data[i] = r + noise;
      data[i + 1] = g + noise;
      data[i + 2] = b + noise;
      data[i + 3] = 255;
    }
  }
  return data;
}

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] ?? NaN;
}

const image = generateImage();
for (let i = 0; i < WARM_UP_RUNS; i++) extractPalette(image, { count: 6 });
const times: number[] = [];
let palette = extractPalette(image, { count: 6 });
for (let i = 0; i < TIMED_RUNS; i++) {
  const start = performance.now();
  palette = extractPalette(image, { count: 6 });
  times.push(performance.now() - start);
}
times.sort((a, b) => a - b);
const median = percentile(times, 50);
console.log(palette.map((s) => `${s.hex} ${(s.share * 100).toFixed(1)} % ${s.name}`).join('\n'));
console.log(
  `extractPalette 1 MP, count 6, ${TIMED_RUNS} runs: median ${median.toFixed(1)} ms, ` +
    `p95 ${percentile(times, 95).toFixed(1)} ms (target median < ${TARGET_MEDIAN_MS} ms)`,
);
if (median >= TARGET_MEDIAN_MS) process.exitCode = 1;
