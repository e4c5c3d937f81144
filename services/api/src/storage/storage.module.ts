import { Module } from '@nestjs/common';
import { FileStorage } from './file-storage';
import { LocalDiskStorage } from './local-disk.storage';

@Module({
  providers: [{ provide: FileStorage, useClass: LocalDiskStorage }],
  exports: [FileStorage],
})
export class StorageModule {}
