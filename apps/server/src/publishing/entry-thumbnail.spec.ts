import { EXAMPLE_DESIGN } from '@barwright/contracts';
import { computeHeightField, computeLineStudy, shadeHeightField } from '@barwright/engine';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { entryThumbnailSvg, THUMBNAIL_HEIGHT_PX, THUMBNAIL_LIGHT, THUMBNAIL_WIDTH_PX } from './entry-thumbnail';

describe('the card thumbnail', () => {
  it('is the engine’s lit surface of the study, as a PNG inside an SVG whose viewBox is the window in mm', async () => {
    const svg = await entryThumbnailSvg(EXAMPLE_DESIGN);
    expect(svg).toMatch(/^<\?xml[^>]*>\n<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg" width="480" height="360" viewBox="0 0 [\d.]+ [\d.]+">/);
    expect(svg).not.toMatch(/<script|on\w+=/i);
    const [, w, h] = svg.match(/viewBox="0 0 ([\d.]+) ([\d.]+)"/)!.map(Number);
    expect(w / h).toBeCloseTo(4 / 3, 3);
    const png = Buffer.from(svg.match(/href="data:image\/png;base64,([^"]+)"/)![1], 'base64');
    const { data, info } = await sharp(png).ensureAlpha().raw().toBuffer({ resolveWithObject: true });
    expect([info.width, info.height]).toEqual([THUMBNAIL_WIDTH_PX, THUMBNAIL_HEIGHT_PX]);
    expect(png.length).toBeLessThan(80_000);

    // The same surface drawn directly with the engine (as the web draws it): equal but for the palette's rounding.
    const study = computeLineStudy(EXAMPLE_DESIGN);
    const period = EXAMPLE_DESIGN.motion.travelPerRev / EXAMPLE_DESIGN.rosette.layers[0].lobes;
    const reach = EXAMPLE_DESIGN.study.depth * Math.tan((EXAMPLE_DESIGN.study.vAngle * Math.PI) / 360);
    let low = Infinity;
    for (const line of study.lines) for (const [, y] of line.points) low = Math.min(low, y);
    const window = { x0: period, x1: period + w, y0: low - 2 * reach, y1: low - 2 * reach + h };
    const field = computeHeightField({ lines: study.lines, depth: EXAMPLE_DESIGN.study.depth, vAngle: EXAMPLE_DESIGN.study.vAngle, window, width: 480, height: 360, supersample: 3 });
    const direct = shadeHeightField(field, THUMBNAIL_LIGHT, 'silver');
    let total = 0;
    for (let i = 0; i < direct.length; i += 4) total += Math.abs(direct[i] - data[i]);
    expect(total / (480 * 360)).toBeLessThan(3);
  });
});
