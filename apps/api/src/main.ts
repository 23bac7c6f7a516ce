import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import type { Server } from 'node:http';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { AppModule } from './app.module.js';
import type { AppConfig } from './config.js';
import { configureApp } from './configure-app.js';
import { serveWeb } from './web/serve-web.js';

const defaultWebDist = resolve(dirname(fileURLToPath(import.meta.url)), '../../web/dist');

async function bootstrap(): Promise<void> {
  const logger = new Logger('Tressury');
  const app = await NestFactory.create<NestExpressApplication>(AppModule.register(), { rawBody: true });
  configureApp(app);
  const config = app.get(ConfigService<AppConfig, true>);
  const webDist = config.get('webDist', { infer: true }) ?? defaultWebDist;
  if (!serveWeb(app, webDist)) logger.warn(`No built web app at ${webDist}; serving the API only`);

  const server: Server = await app.listen(config.get('port', { infer: true }), config.get('host', { infer: true }));
  logger.log(`Tressury is listening on ${await app.getUrl()}`);

  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.log(`${signal}: finishing requests in flight, then closing the database`);
    const force = setTimeout(() => server.closeAllConnections(), 10_000).unref();
    await new Promise<void>((done) => server.close(() => done()));
    clearTimeout(force);
    await app.close();
    process.exit(0);
  };
  process.once('SIGINT', () => void stop('SIGINT'));
  process.once('SIGTERM', () => void stop('SIGTERM'));
}

bootstrap().catch((error: unknown) => {
  new Logger('Tressury').error(error instanceof Error ? (error.stack ?? error.message) : String(error));
  process.exit(1);
});
