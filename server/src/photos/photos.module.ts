import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { storageConfig } from '../config/storage.config';
import { Photo } from './photo.entity';
import { PhotosService } from './photos.service';
import { PhotoStorageService } from './photo-storage.service';
import { PhotoAccessRegistry } from './photo-access.registry';
import { PhotosController } from './photos.controller';
import { ImageUploadInterceptor } from './image-upload.interceptor';

@Module({
  imports: [ConfigModule.forFeature(storageConfig), MikroOrmModule.forFeature([Photo])],
  controllers: [PhotosController],
  providers: [PhotosService, PhotoStorageService, PhotoAccessRegistry, ImageUploadInterceptor],
  exports: [PhotosService, PhotoStorageService, PhotoAccessRegistry, ImageUploadInterceptor, ConfigModule],
})
export class PhotosModule {}
