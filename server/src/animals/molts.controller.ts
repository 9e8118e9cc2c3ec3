import { Body, Controller, Get, Param, Post } from '@nestjs/common';
import type { MoltResponse } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { MoltsService } from './molts.service';
import { CreateMoltDto } from './dto/create-molt.dto';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

@Controller('animals/:animalId/molts')
export class MoltsController {
  constructor(private readonly molts: MoltsService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Param('animalId', RecordIdPipe) animalId: string): Promise<MoltResponse[]> {
    return this.molts.list(user, animalId);
  }

  @Post()
  create(@CurrentUser() user: AuthUser, @Param('animalId', RecordIdPipe) animalId: string, @Body() dto: CreateMoltDto): Promise<MoltResponse> {
    return this.molts.create(user, animalId, dto);
  }
}
