import { Module } from '@nestjs/common';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Animal } from './animal.entity';
import { Molt } from './molt.entity';

@Module({
  imports: [MikroOrmModule.forFeature([Animal, Molt])],
})
export class AnimalsModule {}
