import express, { type Request } from 'express';
import { jsonDepthExceeds } from './json-depth';

/** No form of ours comes near these; larger or deeper bodies are refused before they are parsed. */
export const BODY_LIMIT = '100kb';
export const MAX_JSON_DEPTH = 32;

/**
 * The JSON and form parsers, registered by `configureApp` (Nest then skips its own, which go by the
 * same names). `verify` runs on the raw bytes before parsing: it keeps them for signed webhooks
 * (`req.rawBody`) and refuses absurd nesting.
 */
export function bodyParsers() {
  return [
    express.json({
      limit: BODY_LIMIT,
      verify: (req, _res, buf) => {
        (req as Request & { rawBody?: Buffer }).rawBody = buf;
        if (jsonDepthExceeds(buf, MAX_JSON_DEPTH)) {
          // body-parser passes an error's own status on (as an http-error a client may read).
          throw Object.assign(new Error(`The request body is nested too deeply (more than ${MAX_JSON_DEPTH} levels).`), { status: 400 });
        }
      },
    }),
    // Flat forms only: no nested objects from bracketed keys.
    express.urlencoded({ limit: BODY_LIMIT, extended: false }),
  ];
}
