// @ts-check
// What the browser pays for the first page: the JavaScript index.html loads (gzip, as served
// compressed), and the Today page's largest contentful paint in headless Chromium.
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { execFileSync } from 'node:child_process';

/** Scripts and module preloads named in the built index.html. @param {string} dist */
export function firstPageScripts(dist) {
  const html = readFileSync(path.join(dist, 'index.html'), 'utf8');
  const files = [...html.matchAll(/(?:src|href)="\/?([^"]+\.js)"/g)].map((m) => m[1]);
  const gzipBytes = files.reduce((sum, f) => sum + gzipSync(readFileSync(path.join(dist, f))).length, 0);
  return { files: files.length, gzipBytes };
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
