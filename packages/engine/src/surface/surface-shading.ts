/**
 * Shading of the engraved surface (see height-field.ts) as polished metal, by the Blinn–Phong model:
 * J. F. Blinn, "Models of light reflection for computer synthesized pictures", SIGGRAPH 1977
 * (Computer Graphics 11(2), 192–198). For a unit normal n, a unit vector l towards a distant light,
 * the viewer overhead v = (0, 0, 1) and the half-way vector h = (l + v) / |l + v|:
 *
 *   I = tint · (ka + kd · max(0, n·l) + ks · max(0, n·h)^p)      (the specular term only where n·l > 0)
 *
 * A metal reflects in its own colour, so the tint colours the specular lobe as well as the diffuse
 * part. Intensities are linear; the bytes are sRGB-encoded (IEC 61966-2-1).
 */
import { FACET_BINS, MIXED_PIXEL, type HeightField } from './height-field';

/** A distant light: from `azimuthDeg` (0° from +x, the right of the drawing; 90° from +y, its top) at `elevationDeg` above the plate. */
export interface SurfaceLight {
  azimuthDeg: number;
  elevationDeg: number;
}

export type MetalTint = 'silver' | 'gold' | 'brass';
export const METAL_TINTS: readonly MetalTint[] = ['silver', 'gold', 'brass'];

/** Linear reflectance of each metal at normal incidence, RGB (the usual rendering values; from memory). */
export const METAL_COLOURS: Record<MetalTint, readonly [number, number, number]> = {
  silver: [0.95, 0.93, 0.88],
  gold: [1.0, 0.71, 0.29],
  brass: [0.91, 0.78, 0.42],
};

/** The model's constants: ambient, diffuse, specular weights and the specular exponent. */
export const BLINN_PHONG = { ambient: 0.05, diffuse: 0.28, specular: 0.85, exponent: 20 } as const;

/** Unit vector towards the light. */
export function lightVector(light: SurfaceLight): [number, number, number] {
  const az = (light.azimuthDeg * Math.PI) / 180;
  const el = (light.elevationDeg * Math.PI) / 180;
  return [Math.cos(el) * Math.cos(az), Math.cos(el) * Math.sin(az), Math.sin(el)];
}

/** Blinn–Phong intensity (linear, before the tint) of a surface with unit normal n under `light`, viewer overhead. */
export function blinnPhong(nx: number, ny: number, nz: number, light: SurfaceLight): number {
  const [lx, ly, lz] = lightVector(light);
  const hLen = Math.sqrt(lx * lx + ly * ly + (lz + 1) * (lz + 1));
  const nl = nx * lx + ny * ly + nz * lz;
  const nh = Math.max(0, (nx * lx + ny * ly + nz * (lz + 1)) / hLen);
  const { ambient, diffuse, specular, exponent } = BLINN_PHONG;
  return ambient + diffuse * Math.max(0, nl) + (nl > 0 ? specular * nh ** exponent : 0);
}

/**
 * The field as RGBA bytes (width × height × 4, row 0 at the top). Cheap: the FACET_BINS + 1 normals
 * are shaded once, then each pixel looks its facet up; pixels an edge or ridge runs through average
 * their samples' linear colours before encoding. One pass over the pixels, one 32-bit write each,
 * and nothing allocated per pixel. `into`: an earlier picture of the same size to write over (and
 * return); a new one otherwise.
 */
export function shadeHeightField(field: HeightField, light: SurfaceLight, tint: MetalTint, into?: Uint8ClampedArray | null): Uint8ClampedArray {
  const linear = facetColours(field.wallSlope, light, METAL_COLOURS[tint]);
  const { width, height, supersample: s, pixelFacet, mixed, mixedFacets } = field;
  // Every pixel is written below, so an earlier picture of the same size can be painted over: 3 MB of
  // fresh memory a reshade at 1280 × 620 costs more than the shading on a machine slow to fault pages in.
  const out = into?.length === width * height * 4 && into.byteOffset % 4 === 0 ? into : new Uint8ClampedArray(width * height * 4);
  const words = new Uint32Array(out.buffer, out.byteOffset, out.length >> 2); // `into` may be a view of a larger buffer
  // The facets' colours as packed RGBA words (in the platform's byte order), one lookup a pixel.
  const packed = new Uint32Array(FACET_BINS + 1);
  for (let f = 0; f <= FACET_BINS; f++) packed[f] = packWord(srgbByteByTable(linear[3 * f]), srgbByteByTable(linear[3 * f + 1]), srgbByteByTable(linear[3 * f + 2]));
  const mixedPixel = MIXED_PIXEL; // a local: an imported binding may be read through a getter in the loop
  for (let p = 0; p < pixelFacet.length; p++) {
    const f = pixelFacet[p];
    if (f !== mixedPixel) words[p] = packed[f];
  }
  const n = s * s;
  // Each facet's linear colour pre-scaled by ENCODE_STEPS / n: a mixed pixel's samples then sum straight to a table index.
  const share = ENCODE_STEPS / n;
  const scaled = new Float32Array(linear.length);
  for (let c = 0; c < linear.length; c++) scaled[c] = linear[c] * share;
  const table = SRGB_TABLE;
  for (let m = 0, k = 0; m < mixed.length; m++) {
    let r = 0.5; // Math.round of a non-negative sum, as (v + 0.5) | 0
    let g = 0.5;
    let b = 0.5;
    if (n === 4) {
      // The usual 2 × 2 written out.
      const c0 = 3 * mixedFacets[k];
      const c1 = 3 * mixedFacets[k + 1];
      const c2 = 3 * mixedFacets[k + 2];
      const c3 = 3 * mixedFacets[k + 3];
      k += 4;
      r += scaled[c0] + scaled[c1] + scaled[c2] + scaled[c3];
      g += scaled[c0 + 1] + scaled[c1 + 1] + scaled[c2 + 1] + scaled[c3 + 1];
      b += scaled[c0 + 2] + scaled[c1 + 2] + scaled[c2 + 2] + scaled[c3 + 2];
    } else {
      for (const end = k + n; k < end; k++) {
        const c = 3 * mixedFacets[k];
        r += scaled[c];
        g += scaled[c + 1];
        b += scaled[c + 2];
      }
    }
    words[mixed[m]] = packWord(table[r | 0], table[g | 0], table[b | 0]);
  }
  return out;
}

/** True when the platform stores the low byte of a word first (as every current browser and Node do). */
const LITTLE_ENDIAN = new Uint8Array(new Uint32Array([1]).buffer)[0] === 1;

/** Opaque RGBA bytes as one word for a Uint32Array over the bytes. */
function packWord(r: number, g: number, b: number): number {
  return LITTLE_ENDIAN ? (0xff000000 | (b << 16) | (g << 8) | r) >>> 0 : ((r << 24) | (g << 16) | (b << 8) | 0xff) >>> 0;
}

/**
 * Linear RGB of facet 0 (the uncut plate, normal straight up) and of each wall direction: a wall rising
 * towards direction φ with slope k has the gradient k·(cos φ, sin φ) and the normal (−∇z, 1)/√(1 + k²).
 * The light and half-way vectors are worked out once, not per facet; the result is blinnPhong's.
 */
function facetColours(slope: number, light: SurfaceLight, tint: readonly [number, number, number]): Float32Array {
  const bins = FACET_BINS;
  const out = new Float32Array(3 * (bins + 1));
  const [lx, ly, lz] = lightVector(light);
  const hLen = Math.sqrt(lx * lx + ly * ly + (lz + 1) * (lz + 1));
  const { ambient, diffuse, specular, exponent } = BLINN_PHONG;
  const intensity = (nx: number, ny: number, nz: number) => {
    const nl = nx * lx + ny * ly + nz * lz;
    const nh = Math.max(0, (nx * lx + ny * ly + nz * (lz + 1)) / hLen);
    return ambient + diffuse * Math.max(0, nl) + (nl > 0 ? specular * nh ** exponent : 0);
  };
  // Clipped at white here, as the display would: averaged edge pixels then stay within 0…1.
  const put = (f: number, v: number) => {
    out[3 * f] = Math.min(1, v * tint[0]);
    out[3 * f + 1] = Math.min(1, v * tint[1]);
    out[3 * f + 2] = Math.min(1, v * tint[2]);
  };
  put(0, intensity(0, 0, 1));
  const norm = 1 / Math.sqrt(1 + slope * slope);
  for (let b = 0; b < bins; b++) {
    const phi = (2 * Math.PI * b) / bins;
    put(b + 1, intensity(-slope * Math.cos(phi) * norm, -slope * Math.sin(phi) * norm, norm));
  }
  return out;
}

/** Linear steps of the encoding table for averaged (edge) pixels: within a byte of srgbByte. */
const ENCODE_STEPS = 8191;
const SRGB_TABLE = Uint8ClampedArray.from({ length: ENCODE_STEPS + 1 }, (_, i) => srgbByte(i / ENCODE_STEPS));

/** The linear value at which srgbByte steps from i to i + 1 (i = 0…254): the sRGB decoding of (i + ½)/255 (IEC 61966-2-1). */
const SRGB_STEPS = Float64Array.from({ length: 255 }, (_, i) => {
  const v = (i + 0.5) / 255;
  return v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4;
});

/**
 * srgbByte without its power: the table's byte, moved to the step the value lies past. The facets'
 * 3 × 4097 encodings were a quarter of a reshade; this gives the same bytes (spec: a million values).
 */
export function srgbByteByTable(linear: number): number {
  if (!(linear > 0)) return 0;
  if (linear >= 1) return 255;
  let b = SRGB_TABLE[(linear * ENCODE_STEPS + 0.5) | 0];
  while (b < 255 && linear >= SRGB_STEPS[b]) b++;
  while (b > 0 && linear < SRGB_STEPS[b - 1]) b--;
  return b;
}

/** sRGB encoding of a linear value (IEC 61966-2-1), clipped to 0…1, as a byte. */
export function srgbByte(linear: number): number {
  const c = linear <= 0 ? 0 : linear >= 1 ? 1 : linear;
  const v = c <= 0.0031308 ? 12.92 * c : 1.055 * c ** (1 / 2.4) - 0.055;
  return Math.round(255 * v);
}
