import { Global, Module } from '@nestjs/common';
import { Clock } from './clock';

/** One clock for the whole app, so a test pins "now" once for every feature. */
@Global()
@Module({ providers: [Clock], exports: [Clock] })
export class ClockModule {}
