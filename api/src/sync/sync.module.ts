import { Global, type MiddlewareConsumer, Module, type NestModule, RequestMethod } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { TypeOrmModule } from '@nestjs/typeorm';
import { syncConfig } from '../config/app.config.js';
import { WriteQueue } from '../common/write-queue.js';
import { User } from '../users/entities/user.entity.js';
import { SYNC_BOOKKEEPING } from './entities/sync-bookkeeping.entity.js';
import { ALL_SYNC_SCHEMAS } from './entities/sync-schemas.js';
import { setMutationsAside } from './pushed-mutations.js';
import { ChangeLogCompaction } from './change-log-compaction.js';
import { ScopeService } from './scope.service.js';
import { SyncController } from './sync.controller.js';
import { SyncEngine } from './sync-engine.service.js';
import { SyncService } from './sync.service.js';

/** Global so that every feature writing synced rows shares the one write queue and engine. */
@Global()
@Module({
  imports: [TypeOrmModule.forFeature([...ALL_SYNC_SCHEMAS, ...SYNC_BOOKKEEPING, User]), ConfigModule.forFeature(syncConfig)],
  controllers: [SyncController],
  providers: [WriteQueue, SyncEngine, SyncService, ScopeService, ChangeLogCompaction],
  exports: [WriteQueue, SyncEngine, SyncService, ScopeService, ChangeLogCompaction],
})
export class SyncModule implements NestModule {
  configure(consumer: MiddlewareConsumer): void {
    consumer.apply(setMutationsAside).forRoutes({ path: 'sync/push', method: RequestMethod.POST });
  }
}
