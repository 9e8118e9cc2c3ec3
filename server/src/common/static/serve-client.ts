import { sep } from 'node:path';
import type { INestApplication } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';
import expressStaticGzip from 'express-static-gzip';

/** Vite names every file under assets/ after a hash of its content, so a new build is a new address. */
const HASHED_ASSETS = `${sep}assets${sep}`;
export const IMMUTABLE = 'public, max-age=31536000, immutable';
/** index.html names the current hashed files: the browser must ask again each time (it may keep an ETag). */
export const REVALIDATE = 'no-cache';

/**
 * Serves the built client from `dist`: the .br/.gz copies written at build time when the browser
 * accepts them, hashed assets cached for a year, and index.html for every other page path (the
 * client router takes over), never for /api.
 */
export function serveClient(app: INestApplication, dist: string): void {
  const files = expressStaticGzip(dist, {
    enableBrotli: true,
    orderPreference: ['br', 'gzip'],
    index: false,
    serveStatic: {
      index: false,
      cacheControl: false,
      setHeaders: (res, path) => res.setHeader('Cache-Control', path.includes(HASHED_ASSETS) ? IMMUTABLE : REVALIDATE),
    },
  });
  app.use(files);
  app.use((req: Request, res: Response, next: NextFunction) => {
    const isPage = (req.method === 'GET' || req.method === 'HEAD') && !req.path.startsWith('/api/') && req.path !== '/api';
    // A missing hashed file is a stale page asking for an old build: a 404, not the app's HTML.
    if (!isPage || req.path.startsWith('/assets/')) return next();
    req.url = '/index.html';
    files(req, res, next);
  });
}
