import { BadRequestException, ValidationPipe } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import type { ValidationError } from 'class-validator';
import { ConfigService } from '@nestjs/config';
import { rateLimit } from 'express-rate-limit';
import helmet from 'helmet';
import { BodyErrorFilter } from './common/filters/body-error.filter.js';
import { refuseDeepBodies } from './common/middleware/json-depth.js';
import { RefuseNulPipe } from './common/pipes/refuse-nul.pipe.js';
import { PhotoUploads } from './photos/uploads/photo-uploads.js';

function flatten(errors: ValidationError[], parent = ''): string[] {
  return errors.flatMap((e) => {
    const path = parent ? `${parent}.${e.property}` : e.property;
    const own = Object.values(e.constraints ?? {}).map((m) =>
      m.includes('should not exist') ? `${path} is not a field we accept` : m.startsWith(e.property) ? m.replace(e.property, path) : `${path}: ${m}`,
    );
    return [...own, ...flatten(e.children ?? [], path)];
  });
}

/** TRUST_PROXY as Express takes it: a flag, a number of proxies in front, or addresses and subnets. */
export function trustProxyValue(setting: string): boolean | number | string {
  if (setting === 'true' || setting === 'false') return setting === 'true';
  return /^\d+$/.test(setting) ? Number(setting) : setting;
}

/** Everything main.ts and the end-to-end tests share, so tests exercise the app as it runs. */
export function configureApp<A extends NestExpressApplication>(app: A): A {
  app.setGlobalPrefix('api');
  // Resumable photo uploads come first: no body parser may read their bytes, and Nest's routes never see them.
  app.use(app.get(PhotoUploads).handler());
  // A full push batch of field records is larger than Express's 100 kB default.
  app.useBodyParser('json', { limit: '5mb' });
  app.use(refuseDeepBodies);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // Plain http on localhost and LAN addresses must not be upgraded.
          upgradeInsecureRequests: null,
          'img-src': ["'self'", 'data:', 'blob:'],
          // The photo shrinker and the service worker are scripts of our own origin; nothing else may start a worker.
          'worker-src': ["'self'"],
        },
      },
      // HSTS makes sense only behind TLS, which a deployment's proxy adds.
      strictTransportSecurity: false,
    }),
  );
  const config = app.get(ConfigService);
  // Behind the README's load balancer every client would otherwise be the balancer's one address.
  const trustProxy = config.get<string>('app.trustProxy');
  if (trustProxy) app.set('trust proxy', trustProxyValue(trustProxy));
  // Customers' share pages need no account; a token cannot be guessed, but the pages should not be hammered either.
  app.use(
    '/api/shared',
    rateLimit({
      windowMs: config.getOrThrow<number>('app.shareRateWindowMs'),
      limit: config.getOrThrow<number>('app.shareRateLimit'),
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      message: { statusCode: 429, message: 'Too many requests for this page. Wait a minute and try again.', error: 'Too Many Requests' },
    }),
  );
  app.useGlobalFilters(new BodyErrorFilter());
  app.useGlobalPipes(
    new RefuseNulPipe(),
    new ValidationPipe({
      whitelist: true,
      forbidNonWhitelisted: true,
      transform: true,
      exceptionFactory: (errors) => new BadRequestException(flatten(errors)),
    }),
  );
  const docs = new DocumentBuilder()
    .setTitle('Wiretrail API')
    .setDescription('Records, checks and paperwork for electrical alterations and data cabling.')
    .setVersion('0.1.0')
    .addBearerAuth()
    .build();
  SwaggerModule.setup('api/docs', app, () => SwaggerModule.createDocument(app, docs));
  return app;
}
