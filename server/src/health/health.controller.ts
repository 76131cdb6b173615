import { Controller, Get } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { EntityManager } from '@mikro-orm/sqlite';
import { Public } from '../auth/public.decorator';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(private readonly em: EntityManager) {}

  @Public()
  @Get()
  @ApiOperation({ summary: 'Liveness and database check' })
  async health() {
    await this.em.getConnection().execute('select 1');
    return { status: 'ok', time: new Date().toISOString() };
  }
}
