import { Module } from '@nestjs/common';
import { PhotosModule } from '../photos/photos.module';
import { ExportController } from './export.controller';
import { ExportService } from './export.service';

/** A keeper's download of all of their data (settings page). */
@Module({ imports: [PhotosModule], controllers: [ExportController], providers: [ExportService] })
export class ExportModule {}
