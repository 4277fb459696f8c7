import { Module } from '@nestjs/common';
import { AppConfig } from '../config/app-config.service';
import { LocalDiskStorage } from './local-disk-storage';
import { StorageService } from './storage.service';

@Module({
  providers: [
    {
      provide: StorageService,
      inject: [AppConfig],
      useFactory: (config: AppConfig) => new LocalDiskStorage(config.get('UPLOAD_DIR')),
    },
  ],
  exports: [StorageService],
})
export class StorageModule {}
