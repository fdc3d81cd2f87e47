import { describe, expect, it } from 'vitest';
import { readingsProblem } from './readings-problem';

// Paths as the server's validation names them (contracts' formatPath), under the body's `file`.
describe('readingsProblem', () => {
  it('names a reading by its place in the table, counting from 1', () => {
    expect(readingsProblem('file.rosette.layers[0].wave.points[3][0]', 'angles must be strictly increasing', 'mm')).toBe('Reading 4: angles must be strictly increasing');
    expect(readingsProblem('file.rosette.layers[0].wave.points', 'needs at least 8 readings', 'mm')).toBe('The readings: needs at least 8 readings');
  });

  it('asks about the units when the base radius is out of range', () => {
    const text = readingsProblem('file.rosette.baseRadius', 'must be between 0.0394 in and 19.685 in', 'in');
    expect(text).toBe('The base radius (halfway between the smallest and largest reading) must be between 0.0394 in and 19.685 in. Are the radii really in inches?');
  });

  it('says which start value refused the rosette, and keeps other paths readable', () => {
    expect(readingsProblem('file.rubber.radius', "must not be larger than the rosette's base radius (2 mm)", 'mm')).toBe(
      "The rubber the new design starts with must not be larger than the rosette's base radius (2 mm)",
    );
    expect(readingsProblem('file.cutter.diameter', 'must be between 0.1 mm and 50 mm', 'mm')).toBe('Design file cutter.diameter must be between 0.1 mm and 50 mm');
  });
});
