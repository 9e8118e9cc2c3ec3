import { Body, Controller, Get, Param, Patch, Query } from '@nestjs/common';
import type { Paged, SpeciesResponse } from '@broodsilk/shared';
import { Roles } from '../common/decorators/roles.decorator';
import { SpeciesService } from './species.service';
import { SpeciesListQueryDto } from './dto/species-list-query.dto';
import { UpdateSpeciesDto } from './dto/update-species.dto';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

@Controller('species')
export class SpeciesController {
  constructor(private readonly species: SpeciesService) {}

  @Get()
  list(@Query() query: SpeciesListQueryDto): Promise<Paged<SpeciesResponse>> {
    return this.species.list(query);
  }

  @Get(':id')
  get(@Param('id', RecordIdPipe) id: string): Promise<SpeciesResponse> {
    return this.species.get(id);
  }

  @Patch(':id')
  @Roles('admin')
  update(@Param('id', RecordIdPipe) id: string, @Body() dto: UpdateSpeciesDto): Promise<SpeciesResponse> {
    return this.species.update(id, dto);
  }
}
