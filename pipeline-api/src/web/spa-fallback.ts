import { existsSync } from 'node:fs';
import { join } from 'node:path';
import type { NextFunction, Request, Response } from 'express';

/** Serves the web client's index.html for client-side routes (GET, not under /api, wanting HTML). */
export function spaFallback(distDir: string) {
  const index = join(distDir, 'index.html');
  return (req: Request, res: Response, next: NextFunction) => {
    if (
      req.method !== 'GET' ||
      req.path.startsWith('/api') ||
      !req.accepts('html') ||
      !existsSync(index)
    ) {
      return next();
    }
    res.sendFile(index);
  };
}
