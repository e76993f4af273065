import type { RequestHandler } from 'express';
import { now } from '../integrations/context.js';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Locals {
      /** The request's one reading of the clock; every service and query it calls gets this value. */
      now: Date;
    }
  }
}

/** Reads the clock once per request. */
export const requestClock: RequestHandler = (_req, res, next) => {
  res.locals.now = now();
  next();
};
