import { Controller, Get, NotFoundException } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { DemoInfo } from '@upwell/common';
import { Public } from '../auth/public.decorator';
import { DemoSeed } from './seed/demo-seed.service';

@ApiTags('demo')
@Controller('demo')
export class DemoController {
  constructor(private readonly seed: DemoSeed) {}

  @Public()
  @Get()
  @ApiOperation({ summary: 'The demo accounts, while the demo seed is in use (404 otherwise); public' })
  async info(): Promise<DemoInfo> {
    const info = await this.seed.info();
    if (!info) throw new NotFoundException('this server runs without the demo seed');
    return info;
  }
}
