import { Module } from '@nestjs/common';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Species } from './species.entity';

@Module({
  imports: [MikroOrmModule.forFeature([Species])],
})
export class SpeciesModule {}
