/**
 * A field path of the rack or the rack file in words (pure): `rosettes.2.rosette.layers.0.lobes` →
 * "Rosette 3, layer 1, lobes". Paths come dotted (`a.b.0`) or with brackets (`a[0].b`).
 */
export function rackFieldLabel(path: string): string {
  const parts = path.replace(/\[(\d+)\]/g, '.$1').split('.').filter(Boolean);
  const words: string[] = [];
  for (let i = 0; i < parts.length; i++) {
    const part = parts[i];
    const next = parts[i + 1];
    if (next !== undefined && /^\d+$/.test(next) && part in LISTS) {
      words.push(`${LISTS[part]} ${Number(next) + 1}`);
      i++;
    } else if (part === 'rosette' && words.length > 0) {
      continue;
    } else {
      words.push(FIELDS[part] ?? part);
    }
  }
  const text = words.join(', ');
  return text.charAt(0).toUpperCase() + text.slice(1);
}

const LISTS: Record<string, string> = {
  rosettes: 'rosette',
  layers: 'layer',
  points: 'reading',
  terms: 'term',
  rubbers: 'rubber',
  travels: 'travel setting',
  cutters: 'end mill',
  followers: 'follower',
  vCutters: 'V-cutter',
  tags: 'tag',
};
const FIELDS: Record<string, string> = {
  baseRadius: 'base radius',
  travelPerRev: 'travel per revolution',
  leverRatio: 'lever ratio',
  vAngle: 'angle',
  format: 'format',
  shop: 'shop',
  wave: 'wave',
};
