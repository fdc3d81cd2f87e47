import { EXPLORE_PAGE_SIZE_DEFAULT, exploreQuery, type ExploreSort, type MaterialId, type ScheduleKind, type WaveShape } from '@barwright/contracts';

/** What Explore shows: the server's query plus how it is laid out. Lives in the URL, so it can be shared. */
export interface ExploreState {
  q: string;
  lobes: number | null;
  wave: WaveShape | null;
  material: MaterialId | null;
  /** The latest revision's phase schedule. */
  schedule: ScheduleKind | null;
  /** Cutter (end mill) diameter range, millimetres. */
  cutterMin: number | null;
  cutterMax: number | null;
  tags: string[];
  /** An author's user id. */
  author: string | null;
  /** Null: the server's default (relevance with a search, else newest). */
  sort: ExploreSort | null;
  page: number;
  pageSize: number;
  view: 'grid' | 'table';
}

export const EXPLORE_DEFAULTS: ExploreState = {
  q: '',
  lobes: null,
  wave: null,
  material: null,
  schedule: null,
  cutterMin: null,
  cutterMax: null,
  tags: [],
  author: null,
  sort: null,
  page: 1,
  pageSize: EXPLORE_PAGE_SIZE_DEFAULT,
  view: 'grid',
};

/** Page sizes offered by the paginator (the contract allows up to 60). */
export const PAGE_SIZES = [12, 24, 48] as const;

type Params = Readonly<Record<string, string | readonly string[] | null | undefined>>;

const shape = exploreQuery.shape;
const first = (v: Params[string]) => (Array.isArray(v) ? v[0] : (v as string | null | undefined)) ?? undefined;

/** One URL parameter read with the contract's own field schema; anything it refuses is left at its default. */
function read<T>(schema: { safeParse(v: unknown): { success: true; data: T } | { success: false } }, value: unknown): T | undefined {
  if (value === undefined || value === '') return undefined;
  const parsed = schema.safeParse(value);
  return parsed.success ? parsed.data : undefined;
}

/** The state a URL's query parameters describe; unknown or invalid values fall back to the defaults (pure). */
export function stateFromParams(params: Params): ExploreState {
  const d = EXPLORE_DEFAULTS;
  const q = read(shape.q, first(params['q'])) ?? '';
  const sort = read(shape.sort, first(params['sort'])) ?? null;
  const tagsRaw = params['tags'];
  return {
    q,
    lobes: read(shape.lobes, first(params['lobes'])) ?? null,
    wave: read(shape.wave, first(params['wave'])) ?? null,
    material: read(shape.material, first(params['material'])) ?? null,
    schedule: read(shape.schedule, first(params['schedule'])) ?? null,
    cutterMin: read(shape.cutterMin, first(params['cutterMin'])) ?? null,
    cutterMax: read(shape.cutterMax, first(params['cutterMax'])) ?? null,
    tags: (tagsRaw ? read(shape.tags, tagsRaw) : undefined) ?? [],
    author: read(shape.author, first(params['author'])) ?? null,
    // Relevance ranks search matches; without a search the server would refuse it.
    sort: sort === 'relevance' && !q ? null : sort,
    page: read(shape.page, first(params['page'])) ?? d.page,
    pageSize: read(shape.pageSize, first(params['pageSize'])) ?? d.pageSize,
    view: first(params['view']) === 'table' ? 'table' : 'grid',
  };
}

/** The URL query parameters for a state, leaving out defaults; null removes a parameter (pure). */
export function paramsFromState(s: ExploreState): Record<string, string | null> {
  const d = EXPLORE_DEFAULTS;
  const num = (v: number | null) => (v === null ? null : String(v));
  return {
    q: s.q || null,
    lobes: num(s.lobes),
    wave: s.wave,
    material: s.material,
    schedule: s.schedule,
    cutterMin: num(s.cutterMin),
    cutterMax: num(s.cutterMax),
    tags: s.tags.length ? s.tags.join(',') : null,
    author: s.author,
    sort: s.sort,
    page: s.page === d.page ? null : String(s.page),
    pageSize: s.pageSize === d.pageSize ? null : String(s.pageSize),
    view: s.view === d.view ? null : s.view,
  };
}

/** What `GET /api/entries` is asked: the URL parameters without the layout ones. */
export function apiParamsFromState(s: ExploreState): Record<string, string> {
  const params: Record<string, string> = {};
  for (const [key, value] of Object.entries(paramsFromState(s))) if (value !== null && key !== 'view') params[key] = value;
  return params;
}

/** Changing a filter or the search starts again at page 1; paging and layout keep the rest. */
export function withChange(s: ExploreState, change: Partial<ExploreState>): ExploreState {
  const keepsPage = Object.keys(change).every((k) => k === 'page' || k === 'view');
  const next = { ...s, ...change };
  if (!keepsPage && change.page === undefined) next.page = 1;
  if (next.sort === 'relevance' && !next.q) next.sort = null;
  return next;
}

/** Count of filters set (the search and sort not included), for the "Filters (2)" label. */
export function activeFilterCount(s: ExploreState): number {
  return [s.lobes, s.wave, s.material, s.schedule, s.cutterMin, s.cutterMax, s.author].filter((v) => v !== null).length + (s.tags.length ? 1 : 0);
}
