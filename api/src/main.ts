import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { AppModule } from './app.module.js';
import { configureApp } from './app.setup.js';

async function bootstrap(): Promise<void> {
  const app = configureApp(await NestFactory.create<NestExpressApplication>(AppModule, { bufferLogs: false, rawBody: true }));
  app.enableShutdownHooks();
  const config = app.get(ConfigService);
  const port = config.getOrThrow<number>('app.port');
  const host = config.getOrThrow<string>('app.host');
  await app.listen(port, host);
  // A string address is a pipe or socket path, which has no port of its own.
  const bound: unknown = app.getHttpServer().address();
  const boundPort = typeof bound === 'object' && bound !== null && 'port' in bound ? bound.port : port;
  new Logger('Wiretrail').log(`API listening on http://${host}:${String(boundPort)}/api`);
}

bootstrap().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
