import { designSchema, EXAMPLE_DESIGN } from '@barwright/contracts';
import { afterEach, describe, expect, it } from 'vitest';
import { HttpError } from '../http/http-error';
import { ComputeBusyError, ComputePool } from './compute-pool';
import { HEAVY_DESIGN } from './heavy-design';

describe('compute pool', () => {
  let pool: ComputePool | undefined;
  afterEach(async () => {
    await pool?.close();
    pool = undefined;
  });

  it('exports and draws thumbnails in a worker thread, as the engine does in process', async () => {
    pool = new ComputePool({ threads: 1 });
    const svg = await pool.exportDesign(EXAMPLE_DESIGN, 'svg', 'keeper');
    expect(svg).toMatchObject({ filename: 'keeper.svg', mime: 'image/svg+xml' });
    expect(svg.content).toContain('<svg');
    const pdf = await pool.exportDesign(EXAMPLE_DESIGN, 'pdf', 'keeper');
    expect(Buffer.from(pdf.content as Uint8Array).subarray(0, 5).toString()).toBe('%PDF-');
    expect(await pool.thumbnailSvg(EXAMPLE_DESIGN)).toContain('<svg');
  }, 30_000);

  it('the heavy fixture is a valid design', () => {
    expect(designSchema.safeParse(HEAVY_DESIGN).success).toBe(true);
  });

  it('stops a job over its time budget and answers 422 naming what was too heavy', async () => {
    pool = new ComputePool({ threads: 1, timeoutMs: 400 });
    const error = await pool.exportDesign(HEAVY_DESIGN, 'pdf', 'bar').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(HttpError);
    expect(error).toMatchObject({ status: 422, code: 'too_heavy' });
    expect((error as Error).message).toMatch(/PDF export .* limit of 0.4 s/);
    // The thread was replaced: the pool still works.
    expect((await pool.exportDesign(EXAMPLE_DESIGN, 'csv', 'bar')).content).toContain('x');
  }, 30_000);

  it('stops a job over its heap budget and answers 422', async () => {
    pool = new ComputePool({ threads: 1, maxHeapMb: 48 });
    const error = await pool.exportDesign(HEAVY_DESIGN, 'pdf', 'bar').catch((e: unknown) => e);
    expect(error).toMatchObject({ status: 422, code: 'too_heavy' });
    expect((error as Error).message).toMatch(/more memory than .* 48 MB/);
  }, 60_000);

  it('refuses a job beyond the queue with 503 and a retry delay', async () => {
    pool = new ComputePool({ threads: 1, maxQueue: 1, retryAfterSeconds: 7 });
    const jobs = [0, 1, 2].map(() => pool!.exportDesign(HEAVY_DESIGN, 'svg', 'bar').then(() => 'done', (e: unknown) => e));
    const outcomes = await Promise.all(jobs);
    expect(outcomes.filter((o) => o === 'done')).toHaveLength(2);
    const refused = outcomes.find((o) => o instanceof ComputeBusyError) as ComputeBusyError;
    expect(refused).toMatchObject({ status: 503, code: 'busy', retryAfterSeconds: 7 });
    expect(pool.pending).toBe(0);
  }, 60_000);
});
