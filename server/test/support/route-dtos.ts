import type { INestApplication, Type } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA, ROUTE_ARGS_METADATA } from '@nestjs/common/constants';
import { RequestMethod } from '@nestjs/common';
import { ModulesContainer } from '@nestjs/core';
import { getMetadataStorage } from 'class-validator';

/** Nest's numbering of @Body() and @Query() in route argument metadata (RouteParamtypes). */
const BODY = 3;
const QUERY = 4;

export interface RouteInput {
  method: string;
  /** As registered: `/api/animals/:id`. */
  path: string;
  body?: Type<unknown>;
  query?: Type<unknown>;
}

const join = (...parts: string[]) =>
  `/${parts
    .flatMap((p) => p.split('/'))
    .filter(Boolean)
    .join('/')}`;

/** Every controller handler with the DTO classes of its @Body() and @Query(), read from Nest's decorator metadata. */
export function routeInputs(app: INestApplication, prefix = 'api'): RouteInput[] {
  const out: RouteInput[] = [];
  for (const mod of app.get(ModulesContainer).values()) {
    for (const wrapper of mod.controllers.values()) {
      const ctrl = wrapper.metatype as Type<unknown> | null;
      if (!ctrl) continue;
      const base = [Reflect.getMetadata(PATH_METADATA, ctrl) as string | string[]].flat()[0] ?? '';
      for (const name of Object.getOwnPropertyNames(ctrl.prototype)) {
        const fn = (ctrl.prototype as Record<string, unknown>)[name];
        if (name === 'constructor' || typeof fn !== 'function') continue;
        const method = Reflect.getMetadata(METHOD_METADATA, fn) as RequestMethod | undefined;
        if (method === undefined) continue;
        const sub = [Reflect.getMetadata(PATH_METADATA, fn) as string | string[]].flat()[0] ?? '';
        const args = (Reflect.getMetadata(ROUTE_ARGS_METADATA, ctrl, name) ?? {}) as Record<string, { index: number; data?: unknown }>;
        const types = (Reflect.getMetadata('design:paramtypes', ctrl.prototype, name) ?? []) as Type<unknown>[];
        const dtoOf = (kind: number) => {
          const entry = Object.entries(args).find(([k, v]) => k.startsWith(`${kind}:`) && v.data === undefined);
          const type = entry ? types[entry[1].index] : undefined;
          return type && type !== Object ? type : undefined;
        };
        out.push({ method: RequestMethod[method], path: join(prefix, base, sub), body: dtoOf(BODY), query: dtoOf(QUERY) });
      }
    }
  }
  return out;
}

/** The properties class-validator checks on `dto` (inherited ones included). */
export function dtoFields(dto: Type<unknown>): string[] {
  const metas = getMetadataStorage().getTargetValidationMetadatas(dto, '', true, false);
  return [...new Set(metas.map((m) => m.propertyName))];
}
