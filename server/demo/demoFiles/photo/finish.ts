// What turns a clean vector drawing into something that reads as a site photo: a slight lens
// softness, surface texture where the scene's mask asks for it, film-like grain, a little
// vignetting and JPEG compression. Every random number comes from the photo's seed.
import sharp from 'sharp';
import type { Random } from './random';

// Noise of several sizes, from blotches to grit, as one channel centred on 0 (about -1..1). It is
// made at half the photo's size (texture this soft needs no more) and read two pixels to one.
async function surfaceNoise(rng: Random, width: number, height: number): Promise<Float32Array> {
  const octaves = [
    { cell: 48, weight: 0.25 },
    { cell: 12, weight: 0.3 },
    { cell: 3, weight: 0.45 },
  ];
  const sum = new Float32Array(width * height);
  for (const { cell, weight } of octaves) {
    const gw = Math.ceil(width / cell) + 1;
    const gh = Math.ceil(height / cell) + 1;
    const grid = Buffer.alloc(gw * gh);
    for (let i = 0; i < grid.length; i++) grid[i] = Math.floor(rng.next() * 256);
    const up = await sharp(grid, { raw: { width: gw, height: gh, channels: 1 } })
      .resize(gw * cell, gh * cell, { kernel: 'cubic' })
      .extract({ left: 0, top: 0, width, height })
      // Resizing turns one channel into sRGB's three; keep one.
      .extractChannel(0)
      .raw()
      .toBuffer();
    for (let i = 0; i < sum.length; i++) sum[i]! += ((up[i]! - 127.5) / 127.5) * weight;
  }
  return sum;
}

// The picture over a background drawn at a quarter of the size and enlarged, which blurs it the
// way a lens focused on something near would, for a fraction of the cost of a blur filter.
async function overBackdrop(picture: string, backdrop: string, width: number, height: number): Promise<Buffer> {
  const [back, front] = await Promise.all([
    sharp(Buffer.from(backdrop), { density: 18 }).blur(2.2).resize(width, height, { kernel: 'cubic' }).removeAlpha().png({ compressionLevel: 0 }).toBuffer(),
    sharp(Buffer.from(picture)).blur(0.55).png({ compressionLevel: 0 }).toBuffer(),
  ]);
  return sharp(back).composite([{ input: front }]).removeAlpha().raw().toBuffer();
}

export async function finishPhoto(
  rng: Random,
  picture: string,
  mask: string,
  options: { width: number; height: number; textureStrength: number; grain: number; quality: number; backdrop?: string; vignette?: number },
): Promise<Buffer> {
  const { width, height } = options;
  const [base, maskPixels, noise] = await Promise.all([
    options.backdrop ? overBackdrop(picture, options.backdrop, width, height) : sharp(Buffer.from(picture)).blur(0.55).removeAlpha().raw().toBuffer(),
    // The mask is drawn at half size too (36 dpi against the SVG's 72).
    sharp(Buffer.from(mask), { density: 36 }).removeAlpha().extractChannel(0).blur(0.8).raw().toBuffer(),
    surfaceNoise(rng, half(width), half(height)),
  ]);
  // Lens fall-off toward the corners, looked up by squared distance from the centre.
  const vignette = options.vignette ?? 0.22;
  const shadeSteps = 1024;
  const shades = new Float32Array(shadeSteps + 1);
  for (let k = 0; k <= shadeSteps; k++) shades[k] = 1 - vignette * (k / shadeSteps) ** 1.4;
  const cx = width / 2;
  const cy = height / 2;
  const r2max = cx * cx + cy * cy;
  // Grain: one 32-bit draw per pixel (mulberry32 inline, seeded from the photo's generator),
  // two bytes summed for the brightness grain, one byte each for a faint colour grain.
  let state = Math.floor(rng.next() * 4294967296) >>> 0;
  const luma = options.grain / 128;
  const chroma = (options.grain * 0.3) / 128;
  const strength = options.textureStrength / 255;
  const out = Buffer.alloc(width * height * 3);
  const halfWidth = half(width);
  for (let yy = 0, i = 0; yy < height; yy++) {
    const dy2 = (yy - cy) * (yy - cy);
    const row = (yy >> 1) * halfWidth;
    for (let xx = 0; xx < width; xx++, i++) {
      state = (state + 0x6d2b79f5) | 0;
      let t = state;
      t = Math.imul(t ^ (t >>> 15), t | 1);
      t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
      t ^= t >>> 14;
      const shade = shades[Math.floor((((xx - cx) * (xx - cx) + dy2) / r2max) * shadeSteps)]!;
      const h = row + (xx >> 1);
      const common = noise[h]! * maskPixels[h]! * strength + ((t & 0xff) + ((t >>> 8) & 0xff) - 255) * luma;
      const warm = (((t >>> 16) & 0xff) - 127.5) * chroma;
      const cool = (((t >>> 24) & 0xff) - 127.5) * chroma;
      const o = i * 3;
      out[o] = clamp((base[o]! + common + warm) * shade);
      out[o + 1] = clamp((base[o + 1]! + common) * shade);
      out[o + 2] = clamp((base[o + 2]! + common + cool) * shade);
    }
  }
  return sharp(out, { raw: { width, height, channels: 3 } }).jpeg({ quality: options.quality }).toBuffer();
}

const half = (n: number) => Math.ceil(n / 2);
const clamp = (v: number) => (v < 0 ? 0 : v > 255 ? 255 : v);
