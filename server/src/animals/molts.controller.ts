import { Body, Controller, Get, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import type { MoltResponse } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { MoltsService } from './molts.service';
import { CreateMoltDto } from './dto/create-molt.dto';

@Controller('animals/:animalId/molts')
export class MoltsController {
  constructor(private readonly molts: MoltsService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Param('animalId', ParseUUIDPipe) animalId: string): Promise<MoltResponse[]> {
    return this.molts.list(user, animalId);
  }

  @Post()
  create(@CurrentUser() user: AuthUser, @Param('animalId', ParseUUIDPipe) animalId: string, @Body() dto: CreateMoltDto): Promise<MoltResponse> {
    return this.molts.create(user, animalId, dto);
  }
}
