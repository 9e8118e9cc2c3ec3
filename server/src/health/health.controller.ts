import { Controller, Get, ServiceUnavailableException } from '@nestjs/common';
import { Public } from '../common/decorators/public.decorator';
import { HealthService } from './health.service';
import { fieldRefusal, refusal } from '../common/refusal';

@Public()
@Controller('health')
export class HealthController {
  constructor(private readonly health: HealthService) {}

  @Get()
  async check(): Promise<{ status: 'ok'; db: 'up' }> {
    if (!(await this.health.databaseUp())) {
      throw new ServiceUnavailableException({ ...refusal('request.databaseDown'), details: [fieldRefusal('db', 'request.down')] });
    }
    return { status: 'ok', db: 'up' };
  }
}
