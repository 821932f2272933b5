import sharp from 'sharp';

const TINTS = {
  green: { hay: ['#9fae5a', '#b3c06e', '#8c9d4b'], string: '#5d4a2a' },
  gold: { hay: ['#d8b765', '#e4c87a', '#c9a552'], string: '#6b4e22' },
  olive: { hay: ['#b5ad5c', '#c7be70', '#a39a4b'], string: '#5e4a23' },
} as const;

/**
 * Draws a demo photo of a bale stack (the project's own drawing, no downloaded images): a sky, a field
 * and rows of bales in the forage's colour, varied by `seed`. Returns a JPEG, like a camera would.
 */
export async function drawDemoBalePhoto(tint: keyof typeof TINTS, seed: number, round: boolean): Promise<Buffer> {
  const w = 1600;
  const h = 1067;
  const colours = TINTS[tint];
  const rand = mulberry32(seed);
  const shapes: string[] = [];
  const rows = round ? 2 : 4;
  for (let row = 0; row < rows; row++) {
    const size = round ? 260 : 150;
    const y = h * 0.78 - row * (round ? size * 0.85 : size * 0.55) - size;
    const count = round ? 5 : 8 - row;
    for (let i = 0; i < count; i++) {
      const x = 120 + i * (round ? size * 1.02 : size * 1.3) + row * (round ? size * 0.5 : size * 0.35) + rand() * 10;
      const fill = colours.hay[Math.floor(rand() * colours.hay.length)];
      if (round) {
        shapes.push(
          `<ellipse cx="${x + size / 2}" cy="${y + size / 2}" rx="${size / 2}" ry="${size / 2}" fill="${fill}" stroke="#6f5a2c" stroke-width="4"/>`,
          `<ellipse cx="${x + size / 2}" cy="${y + size / 2}" rx="${size / 3}" ry="${size / 3}" fill="none" stroke="#7d6a36" stroke-width="3" opacity="0.6"/>`,
          `<ellipse cx="${x + size / 2}" cy="${y + size / 2}" rx="${size / 6}" ry="${size / 6}" fill="none" stroke="#7d6a36" stroke-width="3" opacity="0.6"/>`,
        );
      } else {
        const bw = size * 1.25;
        const bh = size * 0.55;
        shapes.push(
          `<rect x="${x}" y="${y}" width="${bw}" height="${bh}" rx="6" fill="${fill}" stroke="#6f5a2c" stroke-width="3"/>`,
          `<line x1="${x + bw * 0.3}" y1="${y}" x2="${x + bw * 0.3}" y2="${y + bh}" stroke="${colours.string}" stroke-width="4"/>`,
          `<line x1="${x + bw * 0.7}" y1="${y}" x2="${x + bw * 0.7}" y2="${y + bh}" stroke="${colours.string}" stroke-width="4"/>`,
        );
        for (let s = 0; s < 6; s++) {
          const sx = x + rand() * bw;
          shapes.push(`<line x1="${sx}" y1="${y + 4}" x2="${sx + 8}" y2="${y + bh - 4}" stroke="#6f5a2c" stroke-width="1" opacity="0.35"/>`);
        }
      }
    }
  }
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${h}">
    <defs><linearGradient id="sky" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#a9cbe3"/><stop offset="1" stop-color="#e8efe6"/></linearGradient></defs>
    <rect width="${w}" height="${h}" fill="url(#sky)"/>
    <circle cx="${1250 + rand() * 200}" cy="${150 + rand() * 60}" r="70" fill="#fff4c9" opacity="0.9"/>
    <path d="M0 ${h * 0.62} Q ${w * 0.3} ${h * 0.55} ${w * 0.6} ${h * 0.62} T ${w} ${h * 0.6} V ${h} H 0 Z" fill="#7f9a55"/>
    <rect y="${h * 0.78}" width="${w}" height="${h * 0.22}" fill="#6d8748"/>
    ${shapes.join('\n')}
  </svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 82 }).toBuffer();
}

/** Small deterministic PRNG so the demo is the same on every machine. */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
