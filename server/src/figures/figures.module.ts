import { Module } from '@nestjs/common';
import { NotebooksModule } from '../notebooks/notebooks.module';
import { FigureCache } from './figure-cache';
import { FigureInputsService } from './figure-inputs.service';
import { FiguresController } from './figures.controller';
import { FiguresService } from './figures.service';

/** Live figures: recipes computed over stored series, with their cache. */
@Module({
  imports: [NotebooksModule],
  controllers: [FiguresController],
  // The cache is a provider so tests and the bench can inspect and clear it.
  providers: [FiguresService, FigureInputsService, { provide: FigureCache, useFactory: () => new FigureCache() }],
  exports: [FiguresService, FigureInputsService, FigureCache],
})
export class FiguresModule {}
