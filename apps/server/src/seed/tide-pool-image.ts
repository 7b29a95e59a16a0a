import sharp from 'sharp';

// The demo's inspiration image, drawn in code: rock pools at low tide (teal and green water,
// ochre and rust rocks, pink coralline, sand). Seeded, so every seed draws the same picture.

const WIDTH = 1200;
const HEIGHT = 800;

/** mulberry32: a tiny seeded generator, enough for scattering shapes. */
function seeded(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A closed, lumpy outline around a center: rocks and pools are never circles. */
function blob(rand: () => number, cx: number, cy: number, rx: number, ry: number, points = 11) {
  const coords = Array.from({ length: points }, (_, i) => {
    const angle = (i / points) * Math.PI * 2;
    const wobble = 0.75 + rand() * 0.5;
    return [cx + Math.cos(angle) * rx * wobble, cy + Math.sin(angle) * ry * wobble] as const;
  });
  const mid = (a: readonly number[], b: readonly number[]) =>
    `${((a[0]! + b[0]!) / 2).toFixed(1)},${((a[1]! + b[1]!) / 2).toFixed(1)}`;
  let d = `M${mid(coords[points - 1]!, coords[0]!)}`;
  coords.forEach((p, i) => {
    const next = coords[(i + 1) % points]!;
    d += ` Q${p[0].toFixed(1)},${p[1].toFixed(1)} ${mid(p, next)}`;
  });
  return `${d} Z`;
}

export function tidePoolSvg(seed = 2611): string {
  const rand = seeded(seed);
  const shapes: string[] = [];
  const rocks = [
    { cx: 230, cy: 250, rx: 260, ry: 190, fill: 'url(#ochre)' },
    { cx: 900, cy: 180, rx: 300, ry: 170, fill: 'url(#rust)' },
    { cx: 620, cy: 600, rx: 380, ry: 200, fill: 'url(#ochre)' },
    { cx: 1080, cy: 620, rx: 200, ry: 170, fill: 'url(#rust)' },
    { cx: 120, cy: 660, rx: 170, ry: 140, fill: 'url(#rust)' },
  ];
  for (const r of rocks)
    shapes.push(`<path d="${blob(rand, r.cx, r.cy, r.rx, r.ry)}" fill="${r.fill}"/>`);
  const pools = [
    { cx: 260, cy: 260, rx: 150, ry: 100 },
    { cx: 880, cy: 190, rx: 170, ry: 90 },
    { cx: 640, cy: 590, rx: 240, ry: 120 },
    { cx: 1070, cy: 620, rx: 100, ry: 80 },
  ];
  for (const p of pools) {
    const outline = blob(rand, p.cx, p.cy, p.rx, p.ry, 9);
    // Coralline crusts the rim of each pool.
    for (let i = 0; i < 14; i++) {
      const angle = rand() * Math.PI * 2;
      const x = p.cx + Math.cos(angle) * p.rx * (0.95 + rand() * 0.15);
      const y = p.cy + Math.sin(angle) * p.ry * (0.95 + rand() * 0.15);
      shapes.push(
        `<ellipse cx="${x.toFixed(1)}" cy="${y.toFixed(1)}" rx="${(10 + rand() * 16).toFixed(1)}" ry="${(6 + rand() * 10).toFixed(1)}" fill="#e07a93"/>`,
      );
    }
    shapes.push(`<path d="${outline}" fill="url(#water)"/>`);
    // Kelp strands under the surface.
    for (let i = 0; i < 4; i++) {
      const x = p.cx - p.rx * 0.6 + rand() * p.rx * 1.2;
      const y = p.cy - p.ry * 0.4 + rand() * p.ry * 0.8;
      shapes.push(
        `<path d="M${x.toFixed(1)},${y.toFixed(1)} q${(20 + rand() * 30).toFixed(1)},-${(25 + rand() * 20).toFixed(1)} ${(50 + rand() * 40).toFixed(1)},${(rand() * 10).toFixed(1)}" stroke="#3f7a4a" stroke-width="${(7 + rand() * 6).toFixed(1)}" fill="none" stroke-linecap="round" opacity="0.9"/>`,
      );
    }
    // A glint of sky on the water.
    shapes.push(
      `<ellipse cx="${(p.cx - p.rx * 0.3).toFixed(1)}" cy="${(p.cy - p.ry * 0.35).toFixed(1)}" rx="${(p.rx * 0.25).toFixed(1)}" ry="${(p.ry * 0.08).toFixed(1)}" fill="#ffffff" opacity="0.35"/>`,
    );
  }
  // Pebbles on the sand.
  for (let i = 0; i < 40; i++) {
    shapes.push(
      `<circle cx="${(rand() * WIDTH).toFixed(1)}" cy="${(rand() * HEIGHT).toFixed(1)}" r="${(2 + rand() * 5).toFixed(1)}" fill="${rand() > 0.5 ? '#b8a27a' : '#9a4a2c'}" opacity="0.7"/>`,
    );
  }
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH}" height="${HEIGHT}" viewBox="0 0 ${WIDTH} ${HEIGHT}">
  <defs>
    <linearGradient id="sand" x1="0" y1="0" x2="1" y2="1">
      <stop offset="0" stop-color="#eadcb8"/><stop offset="1" stop-color="#d8c49a"/>
    </linearGradient>
    <radialGradient id="water" cx="0.5" cy="0.5" r="0.6">
      <stop offset="0" stop-color="#137a84"/><stop offset="0.7" stop-color="#1b7f86"/><stop offset="1" stop-color="#2f6f55"/>
    </radialGradient>
    <linearGradient id="ochre" x1="0" y1="0" x2="0" y2="1">
      <stop offset="0" stop-color="#d39b33"/><stop offset="1" stop-color="#a87824"/>
    </linearGradient>
    <linearGradient id="rust" x1="0" y1="0" x2="1" y2="1">
      <stop offset="0" stop-color="#a4502e"/><stop offset="1" stop-color="#7e3a22"/>
    </linearGradient>
  </defs>
  <rect width="${WIDTH}" height="${HEIGHT}" fill="url(#sand)"/>
  ${shapes.join('\n  ')}
</svg>`;
}

/** The picture as a PNG, ready for the upload pipeline like any photo a host uploads. */
export function tidePoolPng(seed?: number): Promise<Buffer> {
  return sharp(Buffer.from(tidePoolSvg(seed)))
    .png()
    .toBuffer();
}
