import { AUDIT_ACTIONS, AUDIT_TARGET_KINDS, type AuditAction, type AuditTargetKind } from '@barwright/contracts';

/** The audit log's filters as the page holds them (and the URL carries them). */
export interface AuditFilters {
  action: AuditAction | '';
  actor: string;
  kind: AuditTargetKind | '';
  item: string;
  /** Days, YYYY-MM-DD, inclusive. */
  from: string;
  to: string;
  page: number;
}

export const NO_FILTERS: AuditFilters = { action: '', actor: '', kind: '', item: '', from: '', to: '', page: 1 };
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const DAY = /^\d{4}-\d{2}-\d{2}$/;

/** Filters from the URL's query parameters; anything unknown or malformed is left out. */
export function filtersFromParams(params: Readonly<Record<string, string | undefined>>): AuditFilters {
  const pick = <T extends string>(value: string | undefined, allowed: readonly T[]): T | '' => (allowed.includes(value as T) ? (value as T) : '');
  const page = Number(params['page']);
  return {
    action: pick(params['action'], AUDIT_ACTIONS),
    actor: UUID.test(params['actor'] ?? '') ? params['actor']! : '',
    kind: pick(params['kind'], AUDIT_TARGET_KINDS),
    item: UUID.test(params['item'] ?? '') ? params['item']! : '',
    from: DAY.test(params['from'] ?? '') ? params['from']! : '',
    to: DAY.test(params['to'] ?? '') ? params['to']! : '',
    page: Number.isInteger(page) && page > 1 ? page : 1,
  };
}

/**
 * The filters as query parameters, for the URL and for the API (only those set). Days are sent
 * as the local day's bounds, so "to 14 March" means the end of 14 March where the moderator is.
 */
export function filtersToParams(f: AuditFilters, forApi = false, pageSize?: number): Record<string, string> {
  const params: Record<string, string> = {};
  if (f.action) params['action'] = f.action;
  if (f.actor) params['actor'] = f.actor;
  if (f.kind) params['kind'] = f.kind;
  if (f.item) params['item'] = f.item;
  if (f.from) params['from'] = forApi ? localDayStart(f.from).toISOString() : f.from;
  if (f.to) params['to'] = forApi ? new Date(localDayStart(f.to).getTime() + 86_400_000 - 1).toISOString() : f.to;
  if (f.page > 1) params['page'] = String(f.page);
  if (forApi && pageSize) params['pageSize'] = String(pageSize);
  return params;
}

/** Midnight at the start of a YYYY-MM-DD day in the browser's time zone. */
export function localDayStart(day: string): Date {
  const [y, m, d] = day.split('-').map(Number);
  return new Date(y, m - 1, d);
}

export const hasFilters = (f: AuditFilters) => Boolean(f.action || f.actor || f.kind || f.item || f.from || f.to);
