/** The JavaScript files (relative to dist) the first page loads, and their gzip size together. */
export function firstPageScripts(dist: string): { files: string[]; gzipBytes: number };
export function todayLargestPaint(base: string, email: string, password: string): Promise<number | null>;
