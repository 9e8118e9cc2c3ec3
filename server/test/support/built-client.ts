import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

// Imported first by specs about the production build of the client: the app serves client/dist
// exactly as `npm start` does. AppModule reads CLIENT_DIST on import. npm test builds it first.
export const clientDist = fileURLToPath(new URL('../../../client/dist', import.meta.url));
if (!existsSync(`${clientDist}/.vite/manifest.json`)) throw new Error(`No client build in ${clientDist}: run "npm run build -w client" first.`);
process.env.CLIENT_DIST = clientDist;
