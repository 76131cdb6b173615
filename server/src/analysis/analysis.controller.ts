import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { ApiJsonBody } from '../common/api-docs';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { ANALYSIS_ROUTES, type AnalysisRoute } from './analysis-routes';
import { AnalysisService } from './analysis.service';

/**
 * The anomaly engine as a stateless API for scripts and other tools: each
 * route takes series in the body and answers with the computation. Sign-in
 * is required (the global guard); nothing is stored. The handlers are
 * registered below from ANALYSIS_ROUTES, one per row.
 */
@ApiTags('analysis')
@ApiBearerAuth()
@Controller('analysis')
export class AnalysisController {
  constructor(readonly analysis: AnalysisService) {}
}

// One handler per row of the table: the same decorators a hand-written method would carry.
for (const [name, route] of Object.entries(ANALYSIS_ROUTES) as [string, AnalysisRoute][]) {
  const proto = AnalysisController.prototype as unknown as Record<string, unknown>;
  const method = `run_${name.replace(/-/g, '_')}`;
  proto[method] = function (this: AnalysisController, body: unknown) {
    return this.analysis.run(route.run as (b: unknown) => unknown, body);
  };
  Object.defineProperty(proto[method], 'name', { value: method });
  Body(new ZodValidationPipe(route.request))(proto, method, 0);
  const descriptor = Object.getOwnPropertyDescriptor(proto, method) as PropertyDescriptor;
  for (const decorate of [Post(name), HttpCode(200), ApiOperation({ summary: route.summary, description: route.description }), ApiJsonBody(route.request)]) {
    decorate(proto, method, descriptor);
  }
}
