import { Body, Controller, Get, Param, Post } from '@nestjs/common';
import type { FeedingResponse } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { FeedingsService } from './feedings.service';
import { CreateFeedingDto } from './dto/create-feeding.dto';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

@Controller('animals/:animalId/feedings')
export class FeedingsController {
  constructor(private readonly feedings: FeedingsService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Param('animalId', RecordIdPipe) animalId: string): Promise<FeedingResponse[]> {
    return this.feedings.list(user, animalId);
  }

  @Post()
  add(@CurrentUser() user: AuthUser, @Param('animalId', RecordIdPipe) animalId: string, @Body() dto: CreateFeedingDto): Promise<FeedingResponse> {
    return this.feedings.add(user, animalId, dto);
  }
}
