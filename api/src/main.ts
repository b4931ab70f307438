import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { NestFactory } from '@nestjs/core';
import { AppModule } from './app.module.js';
import { configureApp } from './app.setup.js';

async function bootstrap(): Promise<void> {
  const app = configureApp(await NestFactory.create(AppModule, { bufferLogs: false, rawBody: true }));
  app.enableShutdownHooks();
  const config = app.get(ConfigService);
  const port = config.getOrThrow<number>('app.port');
  const host = config.getOrThrow<string>('app.host');
  await app.listen(port, host);
  const bound = app.getHttpServer().address() as { port: number } | null;
  new Logger('Wiretrail').log(`API listening on http://${host}:${bound?.port ?? port}/api`);
}

bootstrap().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
