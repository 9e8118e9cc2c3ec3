import { Inject, Injectable, PayloadTooLargeException, type CallHandler, type ExecutionContext, type NestInterceptor } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { FileInterceptor } from '@nestjs/platform-express';
import type { Observable } from 'rxjs';
import { storageConfig } from '../config/storage.config';
import { refusal } from '../common/refusal';

/** Multipart field `file`, one file, held in memory up to the configured limit (15 MB); a larger one is a clear 413. */
@Injectable()
export class ImageUploadInterceptor implements NestInterceptor {
  private readonly inner: NestInterceptor;
  private readonly limitMb: number;

  constructor(@Inject(storageConfig.KEY) config: ConfigType<typeof storageConfig>) {
    const Multer = FileInterceptor('file', { limits: { fileSize: config.maxPhotoBytes, files: 1 } });
    this.inner = new Multer();
    this.limitMb = Math.round(config.maxPhotoBytes / (1024 * 1024));
  }

  async intercept(ctx: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    try {
      return await (this.inner.intercept(ctx, next) as Promise<Observable<unknown>>);
    } catch (e) {
      if (e instanceof PayloadTooLargeException) throw new PayloadTooLargeException(refusal('photo.tooLarge', { mb: this.limitMb }));
      throw e;
    }
  }
}
