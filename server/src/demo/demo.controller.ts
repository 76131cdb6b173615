import { Controller, Get, NotFoundException } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { DemoInfo, DemoStatus } from '@upwell/common';
import { Public } from '../auth/public.decorator';
import { DemoSeed } from './seed/demo-seed.service';

@ApiTags('demo')
@Controller('demo')
export class DemoController {
  constructor(private readonly seed: DemoSeed) {}

  /**
   * Always 200, so the sign-in page can ask without a 404 in the browser's
   * console on servers that run without the demo; then it asks GET /api/demo.
   */
  @Public()
  @Get('status')
  @ApiOperation({ summary: 'Whether the demo seed is in use: { enabled: boolean } (public)' })
  async status(): Promise<DemoStatus> {
    return { enabled: (await this.seed.info()) !== null };
  }

  @Public()
  @Get()
  @ApiOperation({ summary: 'The demo accounts, while the demo seed is in use (404 otherwise); public' })
  async info(): Promise<DemoInfo> {
    const info = await this.seed.info();
    if (!info) throw new NotFoundException('this server runs without the demo seed');
    return info;
  }
}
