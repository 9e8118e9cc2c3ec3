import { Controller, Get, HttpCode, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import type { OwnershipRequest } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { AnimalOwnershipService } from './animal-ownership.service';

@Controller('animals/ownership-requests')
export class AnimalOwnershipController {
  constructor(private readonly ownership: AnimalOwnershipService) {}

  @Get()
  list(@CurrentUser() user: AuthUser): Promise<OwnershipRequest[]> {
    return this.ownership.requests(user);
  }

  @Post(':animalId/accept')
  @HttpCode(204)
  accept(@CurrentUser() user: AuthUser, @Param('animalId', ParseUUIDPipe) animalId: string): Promise<void> {
    return this.ownership.accept(user, animalId);
  }
}
