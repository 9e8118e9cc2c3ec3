import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { ConfigService } from '@nestjs/config';
import { AppModule } from './app.module';
import { configureApp } from './app.setup';

async function bootstrap(): Promise<void> {
  const app = await NestFactory.create(AppModule, { bufferLogs: true, rawBody: true });
  configureApp(app);
  const config = app.get(ConfigService);
  const port = config.getOrThrow<number>('app.port');
  const host = config.getOrThrow<string>('app.host');
  await app.listen(port, host);
  console.log(`Broodsilk is serving at http://${host}:${port}`);
}

void bootstrap();
