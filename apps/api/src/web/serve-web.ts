import type { NestExpressApplication } from '@nestjs/platform-express';
import type { NextFunction, Request, Response } from 'express';
import { existsSync } from 'node:fs';
import { join } from 'node:path';

/** Serves the built web app at / with a single-page fallback; /api stays the API's. */
export function serveWeb(app: NestExpressApplication, webDist: string): boolean {
  const index = join(webDist, 'index.html');
  if (!existsSync(index)) return false;
  app.useStaticAssets(webDist, { index: false, maxAge: '1h', immutable: false });
  app.use((request: Request, response: Response, next: NextFunction) => {
    if (request.method !== 'GET' || request.path.startsWith('/api')) return next();
    response.setHeader('Cache-Control', 'no-cache');
    response.sendFile(index);
  });
  return true;
}
