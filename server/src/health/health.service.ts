import { Injectable } from '@nestjs/common';
import { MikroORM } from '@mikro-orm/postgresql';

@Injectable()
export class HealthService {
  constructor(private readonly orm: MikroORM) {}

  /** A real round trip, bounded so a hung database answers 503 instead of hanging the probe. */
  async databaseUp(timeoutMs = 2000): Promise<boolean> {
    try {
      const query = this.orm.em.getConnection().execute('select 1');
      const timeout = new Promise<never>((_, reject) => setTimeout(() => reject(new Error('timeout')), timeoutMs).unref());
      await Promise.race([query, timeout]);
      return true;
    } catch {
      return false;
    }
  }
}
