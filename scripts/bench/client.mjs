// @ts-check
// What the browser pays for the first page: the JavaScript index.html loads (gzip, as served
// compressed), and the Today page's largest contentful paint in headless Chromium.
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { execFileSync } from 'node:child_process';

/** The route modules a signed-in keeper's first page loads besides the entry: the shell and Today, and sign-in. */
const FIRST_PAGE_ROUTES = ['src/app/routes/protected-layout.tsx', 'src/app/routes/home.tsx', 'src/app/routes/sign-in.tsx'];

/**
 * Every JavaScript file the first page loads: the entry with its static imports, plus the first
 * routes' lazy chunks with theirs, followed through Vite's build manifest (`build.manifest`).
 * @param {string} dist
 */
export function firstPageScripts(dist) {
  /** @type {Record<string, { file: string, isEntry?: boolean, imports?: string[] }>} */
  const manifest = JSON.parse(readFileSync(path.join(dist, '.vite/manifest.json'), 'utf8'));
  const seen = new Set();
  /** @param {string} key */
  const visit = (key) => {
    if (seen.has(key) || !manifest[key]) return;
    seen.add(key);
    for (const next of manifest[key].imports ?? []) visit(next);
  };
  for (const [key, chunk] of Object.entries(manifest)) if (chunk.isEntry) visit(key);
  FIRST_PAGE_ROUTES.forEach(visit);
  const files = [...seen].map((key) => manifest[key].file).filter((file) => file.endsWith('.js'));
  const gzipBytes = files.reduce((sum, f) => sum + gzipSync(readFileSync(path.join(dist, f))).length, 0);
  return { files, gzipBytes };
}

function chromiumPath() {
  try {
    return execFileSync('sh', ['-c', 'command -v chromium || command -v chromium-browser'], { encoding: 'utf8' }).trim() || null;
  } catch {
    return null;
  }
}

/** Signs in through the page, opens Today and reads its largest contentful paint. @param {string} base @param {string} email @param {string} password */
export async function todayLargestPaint(base, email, password) {
  const executablePath = chromiumPath();
  if (!executablePath || !existsSync(executablePath)) return null;
  const { chromium } = await import('playwright-core');
  const browser = await chromium.launch({ executablePath, args: ['--no-sandbox'] });
  try {
    const context = await browser.newContext();
    const login = await context.request.post(`${base}/api/auth/login`, { data: { email, password } });
    if (!login.ok()) throw new Error(`sign-in for the paint measurement answered ${login.status()}`);
    const page = await context.newPage();
    await page.goto(`${base}/`, { waitUntil: 'networkidle' });
    return await page.evaluate(
      () =>
        new Promise((resolve) => {
          new PerformanceObserver((list) => {
            const entries = list.getEntries();
            resolve(entries[entries.length - 1].startTime);
          }).observe({ type: 'largest-contentful-paint', buffered: true });
        }),
    );
  } finally {
    await browser.close();
  }
}
