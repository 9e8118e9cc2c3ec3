import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// Imported first by specs that need the app as production runs it: serving the built client too, so
// serveClient (common/static) is in the chain. The config reads CLIENT_DIST on import.
const dist = mkdtempSync(join(tmpdir(), 'broodsilk-client-'));
writeFileSync(join(dist, 'index.html'), '<!doctype html><title>Broodsilk</title>');
process.env.CLIENT_DIST = dist;
