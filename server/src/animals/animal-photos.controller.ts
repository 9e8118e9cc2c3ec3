import { Controller, Param, ParseUUIDPipe, Post, UploadedFile, UseInterceptors } from '@nestjs/common';
import type { PhotoRef } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { ImageUploadInterceptor } from '../photos/image-upload.interceptor';
import { PhotoUploadLimit } from '../photos/photo-upload-limit';
import { AnimalPhotosService } from './animal-photos.service';

@Controller('animals/:animalId')
export class AnimalPhotosController {
  constructor(private readonly photos: AnimalPhotosService) {}

  @Post('photos')
  @PhotoUploadLimit()
  @UseInterceptors(ImageUploadInterceptor)
  forAnimal(@CurrentUser() user: AuthUser, @Param('animalId', ParseUUIDPipe) animalId: string, @UploadedFile() file?: { buffer?: Buffer }): Promise<PhotoRef> {
    return this.photos.addToAnimal(user, animalId, file);
  }

  @Post('molts/:moltId/photos')
  @PhotoUploadLimit()
  @UseInterceptors(ImageUploadInterceptor)
  forMolt(
    @CurrentUser() user: AuthUser,
    @Param('animalId', ParseUUIDPipe) animalId: string,
    @Param('moltId', ParseUUIDPipe) moltId: string,
    @UploadedFile() file?: { buffer?: Buffer },
  ): Promise<PhotoRef> {
    return this.photos.addToMolt(user, animalId, moltId, file);
  }
}
