import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { writeFileSync } from 'node:fs';
import { AppModule } from './app.module.js';
import { configureApp } from './configure-app.js';

/** Writes the OpenAPI document of the built API, from which the web app's types are generated. */
async function writeOpenApi(outFile: string): Promise<void> {
  process.env.TRESSURY_DATA_DIR = 'memory://openapi';
  process.env.TRESSURY_SEED_DEMO = 'false';
  process.env.DATABASE_URL = '';
  const app = await NestFactory.create(AppModule.register(), { logger: ['error'] });
  const document = configureApp(app);
  writeFileSync(outFile, `${JSON.stringify(document, null, 2)}\n`);
  await app.close();
}

void writeOpenApi(process.argv[2] ?? 'openapi.json');
