import { Inject, Injectable, Logger, type OnModuleInit } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { CreateBucketCommand, DeleteObjectCommand, GetObjectCommand, HeadBucketCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { storageConfig } from '../config/storage.config';

/** Puts and gets objects in the photo bucket; nothing else in the app talks to S3. */
@Injectable()
export class PhotoStorageService implements OnModuleInit {
  private readonly logger = new Logger('PhotoStorage');
  private readonly s3: S3Client;

  constructor(@Inject(storageConfig.KEY) private readonly config: ConfigType<typeof storageConfig>) {
    this.s3 = new S3Client({
      region: config.region,
      endpoint: config.endpoint,
      forcePathStyle: config.forcePathStyle,
      ...(config.accessKeyId ? { credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey } } : {}),
    });
  }

  async onModuleInit(): Promise<void> {
    if (!this.config.createBucket) return;
    try {
      await this.s3.send(new HeadBucketCommand({ Bucket: this.config.bucket }));
    } catch {
      try {
        await this.s3.send(new CreateBucketCommand({ Bucket: this.config.bucket }));
      } catch (e) {
        const name = (e as { name?: string }).name;
        // Another instance created it meanwhile, or storage is down: uploads will report it then.
        if (name !== 'BucketAlreadyOwnedByYou' && name !== 'BucketAlreadyExists')
          this.logger.warn(`Could not create bucket ${this.config.bucket}: ${String(e)}`);
      }
    }
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    await this.s3.send(new PutObjectCommand({ Bucket: this.config.bucket, Key: key, Body: body, ContentType: contentType }));
  }

  async get(key: string): Promise<Buffer> {
    const out = await this.s3.send(new GetObjectCommand({ Bucket: this.config.bucket, Key: key }));
    return Buffer.from(await out.Body!.transformToByteArray());
  }

  async delete(key: string): Promise<void> {
    await this.s3.send(new DeleteObjectCommand({ Bucket: this.config.bucket, Key: key }));
  }
}
