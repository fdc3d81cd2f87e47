import * as z from 'zod';
import { EXPORT_FORMATS, type ExportFormat } from '@barwright/engine';
import { HttpError } from '../http/http-error';

/** What a download asks for: the format, and for a PDF whether to add the opposite blank. */
export interface ExportQuery {
  format: ExportFormat;
  opposite: boolean;
}

const FORMATS = EXPORT_FORMATS.join(', ');

/** The query of an export route, as the OpenAPI document lists it (`exportQuery` reads it with its own messages). */
export const EXPORT_QUERY_SCHEMA = z.object({
  format: z.enum(EXPORT_FORMATS),
  opposite: z.enum(['0', '1']).optional(),
  revision: z.string().optional(),
});

/** Reads `?format=…&opposite=1` of an export route; a bad value is a 400 naming the parameter. */
export function exportQuery(query: Record<string, unknown>): ExportQuery {
  const format = String(query.format ?? '') as ExportFormat;
  if (!EXPORT_FORMATS.includes(format)) throw new HttpError(400, 'invalid_input', `format must be one of ${FORMATS}`, { format: `must be one of ${FORMATS}` });
  const raw = query.opposite;
  if (raw !== undefined && raw !== '0' && raw !== '1') throw new HttpError(400, 'invalid_input', 'opposite must be 0 or 1', { opposite: 'must be 0 or 1' });
  if (raw === '1' && format !== 'pdf') throw new HttpError(400, 'invalid_input', 'opposite applies to the PDF only', { opposite: 'applies to format pdf only' });
  return { format, opposite: raw === '1' };
}

/** A file name from a title: lower case, words joined by hyphens, at most 60 characters. */
export const fileSlug = (title: string) => title.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60) || 'bar';
