import { Controller, Get, ServiceUnavailableException } from '@nestjs/common';
import { Public } from '../common/decorators/public.decorator';
import { HealthService } from './health.service';

@Public()
@Controller('health')
export class HealthController {
  constructor(private readonly health: HealthService) {}

  @Get()
  async check(): Promise<{ status: 'ok'; db: 'up' }> {
    if (!(await this.health.databaseUp())) {
      throw new ServiceUnavailableException({ message: 'The database cannot be reached.', details: [{ field: 'db', message: 'down' }] });
    }
    return { status: 'ok', db: 'up' };
  }
}
