import { Module, type DynamicModule, type OnModuleInit } from '@nestjs/common';
import { HttpAdapterHost } from '@nestjs/core';
import { join } from 'node:path';
import express, { type Express, type Request, type Response } from 'express';
import { APP_PAGE_ALIASES, isAppPage } from '@broodsilk/shared';

const CLIENT_DIST = 'CLIENT_DIST';

/**
 * Serves the built web client: its files as they are, its pages (the shared APP_PAGES patterns) as
 * index.html with 200, a guessed address (/login) as a redirect, and every other path outside /api
 * as index.html with 404, so the client shows its not-found page and the status tells the truth.
 * Registered after the API routes (on module init), so /api paths never reach it.
 */
class ClientAppServer implements OnModuleInit {
  constructor(
    private readonly adapterHost: HttpAdapterHost,
    private readonly dist: string,
  ) {}

  onModuleInit(): void {
    const app = this.adapterHost.httpAdapter.getInstance<Express>();
    const index = join(this.dist, 'index.html');
    const page = (status: number) => (_req: Request, res: Response) => {
      res.status(status).sendFile(index, (err) => {
        if (err && !res.headersSent) res.status(404).end();
      });
    };
    const outsideApi = /^\/(?!api(?:\/|$))/;
    app.use(express.static(this.dist, { index: false }));
    for (const [from, to] of Object.entries(APP_PAGE_ALIASES)) app.get(from, (_req, res) => res.redirect(302, to));
    app.get(outsideApi, (req, res, next) => (isAppPage(req.path) ? page(200)(req, res) : next()));
    app.get(outsideApi, page(404));
  }
}

@Module({})
export class ClientAppModule {
  /** Nothing is served when `dist` is empty (development runs the client on Vite). */
  static forRoot(dist: string): DynamicModule {
    if (!dist) return { module: ClientAppModule };
    return {
      module: ClientAppModule,
      providers: [
        { provide: CLIENT_DIST, useValue: dist },
        { provide: ClientAppServer, inject: [HttpAdapterHost, CLIENT_DIST], useFactory: (host: HttpAdapterHost, d: string) => new ClientAppServer(host, d) },
      ],
    };
  }
}
