import type { Request, RequestHandler } from 'express';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';

/** Query parameters whose values are secrets (e-mailed one-time links) and never reach a log. */
const SECRET_PARAMS = /([?&](?:token|code|secret)=)[^&#]*/gi;

export const redactUrl = (url: string) => url.replace(SECRET_PARAMS, '$1[hidden]');

/** One log line per request: method, path without secrets, status, time, user and address. */
export function requestLog(logger: Logger): RequestHandler {
  return pinoHttp({
    logger,
    customProps: (req) => ({ userId: (req as Request).user?.id, ip: (req as Request).ip }),
    serializers: {
      req: (req: { method: string; url: string; id: unknown }) => ({
        id: req.id,
        method: req.method,
        url: redactUrl(req.url),
      }),
      res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
    },
  });
}
