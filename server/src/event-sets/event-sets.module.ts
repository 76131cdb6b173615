import { Module } from '@nestjs/common';
import { FiguresModule } from '../figures/figures.module';
import { NotebooksModule } from '../notebooks/notebooks.module';
import { EventSetsController } from './event-sets.controller';
import { EventSetsService } from './event-sets.service';

/** A notebook's saved event sets. */
@Module({ imports: [NotebooksModule, FiguresModule], controllers: [EventSetsController], providers: [EventSetsService] })
export class EventSetsModule {}
