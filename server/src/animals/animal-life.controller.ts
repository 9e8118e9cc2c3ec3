import { Body, Controller, HttpCode, Param, Post } from '@nestjs/common';
import type { AnimalResponse } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { AnimalLifeService } from './animal-life.service';
import { AnimalDateDto } from './dto/animal-date.dto';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

/** Dated steps in an animal's life; each answers with the animal as it now stands. */
@Controller('animals/:id')
export class AnimalLifeController {
  constructor(private readonly life: AnimalLifeService) {}

  @Post('premolt')
  @HttpCode(200)
  setPremolt(@CurrentUser() user: AuthUser, @Param('id', RecordIdPipe) id: string, @Body() dto: AnimalDateDto): Promise<AnimalResponse> {
    return this.life.setPremolt(user, id, dto.on);
  }

  @Post('premolt/end')
  @HttpCode(200)
  endPremolt(@CurrentUser() user: AuthUser, @Param('id', RecordIdPipe) id: string, @Body() dto: AnimalDateDto): Promise<AnimalResponse> {
    return this.life.endPremolt(user, id, dto.on);
  }

  @Post('sperm-web')
  @HttpCode(200)
  spermWeb(@CurrentUser() user: AuthUser, @Param('id', RecordIdPipe) id: string, @Body() dto: AnimalDateDto): Promise<AnimalResponse> {
    return this.life.spermWeb(user, id, dto.on);
  }

  @Post('return')
  @HttpCode(200)
  returnToOwner(@CurrentUser() user: AuthUser, @Param('id', RecordIdPipe) id: string, @Body() dto: AnimalDateDto): Promise<AnimalResponse> {
    return this.life.returnToOwner(user, id, dto.on);
  }

  @Post('death')
  @HttpCode(200)
  recordDeath(@CurrentUser() user: AuthUser, @Param('id', RecordIdPipe) id: string, @Body() dto: AnimalDateDto): Promise<AnimalResponse> {
    return this.life.recordDeath(user, id, dto.on);
  }
}
