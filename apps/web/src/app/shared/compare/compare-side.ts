import type { Design } from '@barwright/contracts';

/** One design in a comparison: what it is called there and its design file (possibly not valid, e.g. an old version). */
export interface CompareSide {
  /** Column heading: "Then", "Now", a bar's title. */
  label: string;
  /** A second line: who, which revision, when. */
  note?: string;
  /** Where the design lives (router link), if anywhere. */
  link?: readonly string[];
  design: unknown;
  /** Notes kept with the design, when the comparison covers them (versions do). */
  notes?: string;
}

/** The light every plate of a comparison is shaded under. */
export interface CompareLight {
  azimuth: number;
  elevation: number;
  tint: 'silver' | 'gold' | 'brass';
}

export type ValidSide = CompareSide & { design: Design };
