import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import type { AnimalResponse, AnimalSummary, MaleClockRow, Paged } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { AnimalsService } from './animals.service';
import { CreateAnimalDto } from './dto/create-animal.dto';
import { UpdateAnimalDto } from './dto/update-animal.dto';
import { AnimalListQueryDto } from './dto/animal-list-query.dto';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

@Controller('animals')
export class AnimalsController {
  constructor(private readonly animals: AnimalsService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Query() query: AnimalListQueryDto): Promise<Paged<AnimalSummary>> {
    return this.animals.list(user, query);
  }

  @Get('males/clock')
  males(@CurrentUser() user: AuthUser): Promise<MaleClockRow[]> {
    return this.animals.malesByClock(user);
  }

  @Post()
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateAnimalDto): Promise<AnimalResponse> {
    return this.animals.create(user, dto);
  }

  @Get(':id')
  get(@CurrentUser() user: AuthUser, @Param('id', RecordIdPipe) id: string): Promise<AnimalResponse> {
    return this.animals.get(user, id);
  }

  @Patch(':id')
  update(@CurrentUser() user: AuthUser, @Param('id', RecordIdPipe) id: string, @Body() dto: UpdateAnimalDto): Promise<AnimalResponse> {
    return this.animals.update(user, id, dto);
  }

  @Delete(':id')
  @HttpCode(204)
  remove(@CurrentUser() user: AuthUser, @Param('id', RecordIdPipe) id: string): Promise<void> {
    return this.animals.remove(user, id);
  }
}
