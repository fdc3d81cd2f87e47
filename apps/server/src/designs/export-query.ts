import * as z from 'zod';
import { EXPORT_FORMATS, type ExportFormat } from '@barwright/engine';
import { HttpError } from '../http/http-error';

/** What a download asks for. */
export interface ExportQuery {
  format: ExportFormat;
}

const FORMATS = EXPORT_FORMATS.join(', ');

/** The query of an export route, as the OpenAPI document lists it (`exportQuery` reads it with its own messages). */
export const EXPORT_QUERY_SCHEMA = z.object({
  format: z.enum(EXPORT_FORMATS),
  revision: z.string().optional(),
});

/** Reads `?format=…` of an export route; a bad value is a 400 naming the parameter. */
export function exportQuery(query: Record<string, unknown>): ExportQuery {
  const format = String(query.format ?? '') as ExportFormat;
  if (!EXPORT_FORMATS.includes(format)) throw new HttpError(400, 'invalid_input', `format must be one of ${FORMATS}`, { format: `must be one of ${FORMATS}` });
  return { format };
}

/** A file name from a title: lower case, words joined by hyphens, at most 60 characters. */
export const fileSlug = (title: string) => title.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60) || 'bar';
