import { Module } from '@nestjs/common';
import { ConfigModule, type ConfigType } from '@nestjs/config';
import { JwtModule } from '@nestjs/jwt';
import { TypeOrmModule } from '@nestjs/typeorm';
import { signingKey } from '../auth/signing-key.js';
import { authConfig } from '../config/app.config.js';
import { photosConfig } from '../config/photos.config.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { StorageModule } from '../storage/storage.module.js';
import { User } from '../users/entities/user.entity.js';
import { BlobsController } from './blobs.controller.js';
import { PhotoBlob } from './entities/photo-blob.entity.js';
import { PhotoSender } from './entities/photo-sender.entity.js';
import { PhotosController } from './photos.controller.js';
import { PhotosService } from './photos.service.js';
import { PhotoUploads } from './uploads/photo-uploads.js';

/**
 * Photo bytes: resumable uploads (tus), the blobs they become, the sizes made from them and the office's trail.
 * Photo rows themselves are synced rows (SyncModule); this module marks them ready when their bytes arrive.
 */
@Module({
  imports: [
    ConfigModule.forFeature(photosConfig),
    TypeOrmModule.forFeature([PhotoBlob, PhotoSender, Organisation, User]),
    StorageModule,
    // Uploads check the access token themselves (they are not Nest routes), with the same secret as sign-in.
    JwtModule.registerAsync({
      imports: [ConfigModule.forFeature(authConfig)],
      inject: [authConfig.KEY],
      useFactory: (config: ConfigType<typeof authConfig>) => ({ secretOrKeyProvider: () => signingKey(config.jwtSecret), verifyOptions: { algorithms: ['HS256'] } }),
    }),
  ],
  controllers: [PhotosController, BlobsController],
  providers: [PhotosService, PhotoUploads],
  exports: [PhotoUploads, PhotosService],
})
export class PhotosModule {}
