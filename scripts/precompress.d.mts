/** Writes `.br` and `.gz` siblings of the text files under `dir`; returns the bytes before and after (brotli). */
export function precompress(dir: string): Promise<{ raw: number; br: number }>;
