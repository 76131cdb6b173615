import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import {
  anomalyRequestSchema,
  budgetRequestSchema,
  compositeRequestSchema,
  eventsRequestSchema,
  integrateRequestSchema,
  lagCorrelationRequestSchema,
  runAnomaly,
  runBudget,
  runComposite,
  runEvents,
  runIntegrate,
  runLagCorrelation,
  runTrend,
  trendRequestSchema,
  type AnomalyRequest,
  type BudgetRequest,
  type CompositeRequest,
  type EventsRequest,
  type IntegrateRequest,
  type LagCorrelationRequest,
  type TrendRequest,
} from '@upwell/common';
import { ApiJsonBody } from '../common/api-docs';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { AnalysisService } from './analysis.service';

/**
 * The anomaly engine as a stateless API for scripts and other tools: each
 * route takes series in the body and answers with the computation. Sign-in
 * is required (the global guard); nothing is stored.
 */
@ApiTags('analysis')
@ApiBearerAuth()
@Controller('analysis')
export class AnalysisController {
  constructor(private readonly analysis: AnalysisService) {}

  @Post('anomaly')
  @HttpCode(200)
  @ApiOperation({ summary: 'Deseasonalised anomalies against a base period (monthly-mean or harmonic climatology)', description: 'Answers { anomaly, climatology (12, January first), warnings }.' })
  @ApiJsonBody(anomalyRequestSchema)
  anomaly(@Body(new ZodValidationPipe(anomalyRequestSchema)) body: AnomalyRequest) {
    return this.analysis.run(runAnomaly, body);
  }

  @Post('lag-correlation')
  @HttpCode(200)
  @ApiOperation({
    summary: 'Lagged correlation of x and y for lags −maxLag..+maxLag (positive: x leads y)',
    description: 'Answers { lags: [{ lag, r, n, nEff, p }] }. nEff = n(1 − r1x·r1y)/(1 + r1x·r1y) after Bretherton et al. (1999); p is two-sided with nEff − 2 degrees of freedom. Correlation is not cause.',
  })
  @ApiJsonBody(lagCorrelationRequestSchema)
  lagCorrelation(@Body(new ZodValidationPipe(lagCorrelationRequestSchema)) body: LagCorrelationRequest) {
    return this.analysis.run(runLagCorrelation, body);
  }

  @Post('events')
  @HttpCode(200)
  @ApiOperation({ summary: 'Warm and cold events: runs of ≥ minDuration months beyond ±threshold (the operational 3-month-index rule)' })
  @ApiJsonBody(eventsRequestSchema)
  events(@Body(new ZodValidationPipe(eventsRequestSchema)) body: EventsRequest) {
    return this.analysis.run(runEvents, body);
  }

  @Post('composite')
  @HttpCode(200)
  @ApiOperation({ summary: 'Event composite: mean and t-interval of the series at offsets around each event' })
  @ApiJsonBody(compositeRequestSchema)
  composite(@Body(new ZodValidationPipe(compositeRequestSchema)) body: CompositeRequest) {
    return this.analysis.run(runComposite, body);
  }

  @Post('trend')
  @HttpCode(200)
  @ApiOperation({ summary: 'Ordinary-least-squares trend per year or per decade, with its standard error' })
  @ApiJsonBody(trendRequestSchema)
  trend(@Body(new ZodValidationPipe(trendRequestSchema)) body: TrendRequest) {
    return this.analysis.run(runTrend, body);
  }

  @Post('budget')
  @HttpCode(200)
  @ApiOperation({ summary: 'Budget closure: tendency minus the sum of the terms, month by month' })
  @ApiJsonBody(budgetRequestSchema)
  budget(@Body(new ZodValidationPipe(budgetRequestSchema)) body: BudgetRequest) {
    return this.analysis.run(runBudget, body);
  }

  @Post('integrate')
  @HttpCode(200)
  @ApiOperation({ summary: 'Total change over a period of a rate series, honouring its unit and each month’s length' })
  @ApiJsonBody(integrateRequestSchema)
  integrate(@Body(new ZodValidationPipe(integrateRequestSchema)) body: IntegrateRequest) {
    return this.analysis.run(runIntegrate, body);
  }
}
