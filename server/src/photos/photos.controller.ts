import { Controller, Get, Header, Param, StreamableFile } from '@nestjs/common';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { PhotosService } from './photos.service';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

@Controller('photos')
export class PhotosController {
  constructor(private readonly photos: PhotosService) {}

  @Get(':id')
  @Header('Cache-Control', 'private, max-age=86400')
  full(@CurrentUser() user: AuthUser, @Param('id', RecordIdPipe) id: string): Promise<StreamableFile> {
    return this.photos.read(user, id, 'full');
  }

  @Get(':id/thumb')
  @Header('Cache-Control', 'private, max-age=86400')
  thumb(@CurrentUser() user: AuthUser, @Param('id', RecordIdPipe) id: string): Promise<StreamableFile> {
    return this.photos.read(user, id, 'thumb');
  }
}
