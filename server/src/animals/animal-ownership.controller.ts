import { Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import type { OwnershipRequest } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { AnimalOwnershipService } from './animal-ownership.service';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

@Controller('animals/ownership-requests')
export class AnimalOwnershipController {
  constructor(private readonly ownership: AnimalOwnershipService) {}

  @Get()
  list(@CurrentUser() user: AuthUser): Promise<OwnershipRequest[]> {
    return this.ownership.requests(user);
  }

  @Post(':animalId/accept')
  @HttpCode(204)
  accept(@CurrentUser() user: AuthUser, @Param('animalId', RecordIdPipe) animalId: string): Promise<void> {
    return this.ownership.accept(user, animalId);
  }
}
