import { type DynamicModule, Module } from '@nestjs/common';
import { ConfigModule, type ConfigType } from '@nestjs/config';
import { APP_GUARD } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import { TypeOrmModule } from '@nestjs/typeorm';
import { resolve } from 'node:path';
import { AreasModule } from './areas/areas.module.js';
import { BoardsModule } from './boards/boards.module.js';
import { CircuitsModule } from './circuits/circuits.module.js';
import { CustomersModule } from './customers/customers.module.js';
import { JobsModule } from './jobs/jobs.module.js';
import { SitesModule } from './sites/sites.module.js';
import { VisitsModule } from './visits/visits.module.js';
import { CableRunsModule } from './cable-runs/cable-runs.module.js';
import { LinkTestsModule } from './link-tests/link-tests.module.js';
import { PointChangesModule } from './point-changes/point-changes.module.js';
import { TestResultsModule } from './test-results/test-results.module.js';
import { AuthModule } from './auth/auth.module.js';
import { CardPaymentsModule } from './card-payments/card-payments.module.js';
import { JwtAuthGuard } from './common/guards/jwt-auth.guard.js';
import { RolesGuard } from './common/guards/roles.guard.js';
import { appConfig, authConfig, mailConfig, syncConfig } from './config/app.config.js';
import { databaseConfig } from './config/database.config.js';
import { paymentsConfig } from './config/payments.config.js';
import { photosConfig } from './config/photos.config.js';
import { storageConfig } from './config/storage.config.js';
import { validateEnvironment } from './config/env.validation.js';
import { databaseOptions } from './database/typeorm-options.js';
import { ConflictsModule } from './conflicts/conflicts.module.js';
import { NotifiableWorkModule } from './notifiable-work/notifiable-work.module.js';
import { DocumentsModule } from './documents/documents.module.js';
import { HealthModule } from './health/health.module.js';
import { InvoicesModule } from './invoices/invoices.module.js';
import { OrganisationsModule } from './organisations/organisations.module.js';
import { PhotosModule } from './photos/photos.module.js';
import { HiddenRoutesModule } from './hidden-routes/hidden-routes.module.js';
import { PricingModule } from './pricing/pricing.module.js';
import { ShareLinksModule } from './share-links/share-links.module.js';
import { SyncModule } from './sync/sync.module.js';
import { UsersModule } from './users/users.module.js';

/** The built web app, served at / when WEB_DIST is set (npm start); read before Nest starts, so from the environment. */
function webAppModules(): DynamicModule[] {
  const dist = process.env.WEB_DIST;
  if (!dist) return [];
  return [
    ServeStaticModule.forRoot({
      rootPath: resolve(dist),
      exclude: ['/api{/*path}'],
      serveStaticOptions: {
        // The service worker and its manifest must never be cached, or updates would not be seen.
        setHeaders: (res, path) => {
          if (/(sw\.js|workbox-[\w-]+\.js|manifest\.webmanifest|index\.html)$/.test(path)) {
            res.setHeader('Cache-Control', 'no-cache');
          }
        },
      },
    }),
  ];
}

@Module({
  imports: [
    ConfigModule.forRoot({
      isGlobal: true,
      cache: true,
      ignoreEnvFile: process.env.NODE_ENV === 'test',
      validate: validateEnvironment,
      load: [appConfig, authConfig, databaseConfig, mailConfig, photosConfig, storageConfig, paymentsConfig, syncConfig],
    }),
    TypeOrmModule.forRootAsync({
      inject: [databaseConfig.KEY],
      useFactory: (db: ConfigType<typeof databaseConfig>) => ({
        ...databaseOptions(db),
        autoLoadEntities: true,
      }),
    }),
    ...webAppModules(),
    AuthModule,
    UsersModule,
    OrganisationsModule,
    HealthModule,
    SyncModule,
    ConflictsModule,
    CustomersModule,
    SitesModule,
    AreasModule,
    BoardsModule,
    CircuitsModule,
    JobsModule,
    VisitsModule,
    CableRunsModule,
    LinkTestsModule,
    PointChangesModule,
    TestResultsModule,
    PhotosModule,
    HiddenRoutesModule,
    DocumentsModule,
    ShareLinksModule,
    PricingModule,
    InvoicesModule,
    CardPaymentsModule,
    NotifiableWorkModule,
  ],
  providers: [
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
  ],
})
export class AppModule {}
