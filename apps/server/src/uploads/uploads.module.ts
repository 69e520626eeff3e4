import { Module } from '@nestjs/common';
import { MulterModule } from '@nestjs/platform-express';
import { memoryStorage } from 'multer';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { KitchensModule } from '../kitchens/kitchens.module.js';
import { DiskStorage, FILE_STORAGE } from './file-storage.js';
import { UploadErrorsInterceptor } from './upload-errors.interceptor.js';
import { UploadsController } from './uploads.controller.js';
import { UploadsRepository } from './uploads.repository.js';
import { UploadsService } from './uploads.service.js';

/**
 * Photos and scanned documents of a kitchen. Multer keeps an upload in memory (at most UPLOAD_MAX_BYTES) until
 * its content has been checked, so a refused file never reaches the disk.
 */
@Module({
  imports: [
    KitchensModule,
    MulterModule.registerAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => ({
        storage: memoryStorage(),
        limits: { fileSize: config.UPLOAD_MAX_BYTES, files: 1, fields: 10, fieldSize: 1024, parts: 12 },
      }),
    }),
  ],
  controllers: [UploadsController],
  providers: [
    UploadsService,
    UploadsRepository,
    UploadErrorsInterceptor,
    {
      provide: FILE_STORAGE,
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => new DiskStorage(config.storageDir),
    },
  ],
  exports: [UploadsService, FILE_STORAGE],
})
export class UploadsModule {}
