import { MM_PER_INCH, type Units } from '@barwright/contracts';
import { profileSamples } from '../profile';
import type { Profile } from '../types';
import { keptRows } from './csv-rows';
import { fixed } from './number-format';

const DECIMALS: Readonly<Record<Units, number>> = { mm: 5, in: 6 };

/**
 * The profile as CSV (RFC 4180: comma-separated, CRLF line ends, one header row), in the
 * design's units: x along the bar, cutter-centre path y, bar edge y, follower y.
 * The three paths share one x grid (see `Profile`). Rows are thinned to the cut plan's resolution:
 * straight lines between the rows kept follow every column to within `tolerance` mm (the chord
 * tolerance the G-code follows the path to), so the file holds what a machine can use and no more.
 */
export function profileCsv(profile: Profile, units: Units, tolerance: number): string {
  const scale = units === 'in' ? 1 / MM_PER_INCH : 1;
  const num = (mm: number) => fixed(mm * scale, DECIMALS[units]);
  const { x, columns } = profileColumns(profile);
  const rows = [`x_${units},cutter_path_y_${units},bar_edge_y_${units},follower_y_${units}`];
  for (const i of keptRows(x, columns, tolerance)) rows.push(`${num(x[i])},${num(columns[0][i])},${num(columns[1][i])},${num(columns[2][i])}`);
  return rows.join('\r\n') + '\r\n';
}

/** x and the three paths as typed arrays: the profile's own when it carries them, else read from its points. */
function profileColumns(profile: Profile): { x: Float64Array; columns: Float64Array[] } {
  const typed = profileSamples(profile);
  if (typed) return { x: typed.x, columns: [typed.cutter, typed.bar, typed.follower] };
  const count = Math.min(profile.cutterPath.length, profile.barEdge.length, profile.followerPath.length);
  const x = new Float64Array(count);
  const columns = [new Float64Array(count), new Float64Array(count), new Float64Array(count)];
  for (let i = 0; i < count; i++) {
    x[i] = profile.cutterPath[i][0];
    columns[0][i] = profile.cutterPath[i][1];
    columns[1][i] = profile.barEdge[i][1];
    columns[2][i] = profile.followerPath[i][1];
  }
  return { x, columns };
}
