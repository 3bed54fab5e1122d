import { static as serveStatic, type NextFunction, type Request, type Response } from 'express';
import { spaFallback } from './spa-fallback';

/** True for the API's own paths, which never name a file of the web client. */
const isApi = (req: Request) => req.path === '/api' || req.path.startsWith('/api/');

/**
 * The built web client's files and its client-side routes. API requests skip both: looking each
 * one up on disk first cost every API request a file-system call.
 */
export function serveWebClient(distDir: string) {
  const files = serveStatic(distDir, { index: 'index.html', maxAge: '1h' });
  const fallback = spaFallback(distDir);
  return (req: Request, res: Response, next: NextFunction) => {
    if (isApi(req)) return next();
    files(req, res, (err?: unknown) => (err ? next(err) : fallback(req, res, next)));
  };
}
