/**
 * Shading of an engraved surface: V-grooves cut into a flat polished plate, lit by a distant light.
 *
 * The surface is z(x, y) = −depth(x, y). A V-cutter of included angle α running along a line Y(x)
 * cuts depth = d − s / tan(α/2) at a distance s across the line, s = |y − Y(x)| / q with
 * q = √(1 + Y'²) (the walls rise at the cutter's flank angle whatever the depth and the line's slope).
 * Its normal is n ∝ (−∂z/∂x, −∂z/∂y, 1) with, σ = sign(y − Y(x)),
 *   ∂z/∂y = σ / (q·tan(α/2)),  ∂z/∂x = −σ·Y'(x) / (q·tan(α/2)).
 * Brightness is Blinn–Phong (ambient + Lambert diffuse + a tight specular lobe, viewer overhead),
 * the usual model for a polished metal in a quick rendering (common practice in computer graphics).
 */

/** A unit vector pointing towards the light, from its direction in the plane and its height. */
export interface Light {
  x: number;
  y: number;
  z: number;
}

/** Light from `azimuthDeg` (0° from the right, 90° from the top of the drawing) at `elevationDeg` above the plate. */
export function lightFrom(azimuthDeg: number, elevationDeg: number): Light {
  const az = (azimuthDeg * Math.PI) / 180;
  const el = (elevationDeg * Math.PI) / 180;
  return { x: Math.cos(el) * Math.cos(az), y: Math.cos(el) * Math.sin(az), z: Math.sin(el) };
}

/** The azimuth (degrees, 0–360) of a point seen from a centre, in drawing axes (y up). */
export function azimuthOf(dx: number, dyUp: number): number {
  const deg = (Math.atan2(dyUp, dx) * 180) / Math.PI;
  return (deg + 360) % 360;
}

/** Slope of a groove wall, 1 / tan(α/2), for the included angle α in degrees. */
export function wallSlope(vAngleDeg: number): number {
  return 1 / Math.tan((vAngleDeg * Math.PI) / 360);
}

const AMBIENT = 0.12;
const DIFFUSE = 0.7;
const SPECULAR = 0.45;

/**
 * Brightness (0…1) of a surface with gradient (gx, gy) = (∂z/∂x, ∂z/∂y) under `light`, seen from above.
 * The flat plate has gradient (0, 0).
 */
export function shade(gx: number, gy: number, light: Light): number {
  // Math.sqrt rather than Math.hypot: this runs for every groove in every pixel column of the lit view.
  const len = Math.sqrt(gx * gx + gy * gy + 1);
  const nx = -gx / len;
  const ny = -gy / len;
  const nz = 1 / len;
  const diffuse = Math.max(0, nx * light.x + ny * light.y + nz * light.z);
  // Half-way vector between the light and the viewer (0, 0, 1).
  const hz = light.z + 1;
  const hLen = Math.sqrt(light.x * light.x + light.y * light.y + hz * hz);
  const c = Math.max(0, (nx * light.x + ny * light.y + nz * hz) / hLen);
  const c3 = c * c * c;
  const c12 = c3 * c3 * (c3 * c3);
  const spec = c12 * c12; // a shininess of 24, by squaring (Math.pow is slow in this loop)
  return Math.min(1, AMBIENT + DIFFUSE * diffuse + (diffuse > 0 ? SPECULAR * spec : 0));
}

/** The gradient of a groove wall on side σ = sign(y − Y) of its line, where the line has slope Y' and the wall `slope`. */
export function wallGradient(side: 1 | -1, lineSlope: number, slope: number): [gx: number, gy: number] {
  const q = Math.sqrt(1 + lineSlope * lineSlope);
  return [(-side * lineSlope * slope) / q, (side * slope) / q];
}
