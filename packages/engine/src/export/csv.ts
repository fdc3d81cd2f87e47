import { MM_PER_INCH, type Units } from '@barwright/contracts';
import type { Profile } from '../types';
import { fixed } from './number-format';

const DECIMALS: Readonly<Record<Units, number>> = { mm: 5, in: 6 };

/**
 * The profile as CSV (RFC 4180: comma-separated, CRLF line ends, one header row), in the
 * design's units: x along the bar, cutter-centre path y, bar edge y, follower y.
 * The three paths share one x grid (see `Profile`).
 */
export function profileCsv(profile: Profile, units: Units): string {
  const scale = units === 'in' ? 1 / MM_PER_INCH : 1;
  const num = (mm: number) => fixed(mm * scale, DECIMALS[units]);
  const rows = [`x_${units},cutter_path_y_${units},bar_edge_y_${units},follower_y_${units}`];
  const count = Math.min(profile.cutterPath.length, profile.barEdge.length, profile.followerPath.length);
  for (let i = 0; i < count; i++) {
    const [x, cutterY] = profile.cutterPath[i];
    rows.push(`${num(x)},${num(cutterY)},${num(profile.barEdge[i][1])},${num(profile.followerPath[i][1])}`);
  }
  return rows.join('\r\n') + '\r\n';
}
