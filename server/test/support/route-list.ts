import type { INestApplication } from '@nestjs/common';

export interface RegisteredRoute {
  method: string;
  /** As registered, with Nest's parameter names: `/api/projects/:projectId/pairings`. */
  path: string;
}

interface Layer {
  route?: { path: string | string[]; methods: Record<string, boolean> };
}

/** Every route the Express instance under Nest serves, read from its router stack. */
export function registeredRoutes(app: INestApplication): RegisteredRoute[] {
  const express = app.getHttpAdapter().getInstance() as { router: { stack: Layer[] } };
  const out: RegisteredRoute[] = [];
  for (const layer of express.router.stack) {
    if (!layer.route) continue;
    const paths = Array.isArray(layer.route.path) ? layer.route.path : [layer.route.path];
    for (const path of paths) {
      for (const [method, on] of Object.entries(layer.route.methods)) {
        if (on && method !== '_all') out.push({ method: method.toUpperCase(), path });
      }
    }
  }
  return out;
}
