import compression from 'compression';
import type { Request, RequestHandler, Response } from 'express';

/**
 * Compress API answers (search and listing data are tens of kilobytes of JSON). Answers from the sign-in and account
 * routes carry the CSRF token next to text the visitor typed, so they are never compressed: compressed secrets
 * beside attacker-chosen text can be guessed from the compressed length (the BREACH attack).
 */
export function compressApi(): RequestHandler {
  return compression({
    filter: (req: Request, res: Response) => !/^\/(auth|account)(\/|$)/.test(req.path) && compression.filter(req, res),
  });
}
