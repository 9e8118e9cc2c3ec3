import { Module } from '@nestjs/common';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Photo } from './photo.entity';

@Module({
  imports: [MikroOrmModule.forFeature([Photo])],
})
export class PhotosModule {}
