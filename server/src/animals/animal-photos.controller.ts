import { Controller, Param, Post, UploadedFile, UseInterceptors } from '@nestjs/common';
import type { PhotoRef } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { ImageUploadInterceptor } from '../photos/image-upload.interceptor';
import { PhotoUploadLimit } from '../photos/photo-upload-limit';
import { AnimalPhotosService } from './animal-photos.service';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

@Controller('animals/:animalId')
export class AnimalPhotosController {
  constructor(private readonly photos: AnimalPhotosService) {}

  @Post('photos')
  @PhotoUploadLimit()
  @UseInterceptors(ImageUploadInterceptor)
  forAnimal(@CurrentUser() user: AuthUser, @Param('animalId', RecordIdPipe) animalId: string, @UploadedFile() file?: { buffer?: Buffer }): Promise<PhotoRef> {
    return this.photos.addToAnimal(user, animalId, file);
  }

  @Post('molts/:moltId/photos')
  @PhotoUploadLimit()
  @UseInterceptors(ImageUploadInterceptor)
  forMolt(
    @CurrentUser() user: AuthUser,
    @Param('animalId', RecordIdPipe) animalId: string,
    @Param('moltId', RecordIdPipe) moltId: string,
    @UploadedFile() file?: { buffer?: Buffer },
  ): Promise<PhotoRef> {
    return this.photos.addToMolt(user, animalId, moltId, file);
  }
}
