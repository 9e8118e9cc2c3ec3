import { Controller, Get, Param } from '@nestjs/common';
import type { AnimalBreedingRow } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { AnimalBreedingService } from './animal-breeding.service';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

/** Lives with the projects (which know pairings and sacs); the animal must be the viewer's own. */
@Controller('animals/:id/breeding')
export class AnimalBreedingController {
  constructor(private readonly breeding: AnimalBreedingService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Param('id', RecordIdPipe) id: string): Promise<AnimalBreedingRow[]> {
    return this.breeding.forAnimal(user, id);
  }
}
