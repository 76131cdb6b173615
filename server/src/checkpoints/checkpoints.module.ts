import { Module } from '@nestjs/common';
import { CollaborationModule } from '../collaboration/collaboration.module';
import { NotebookAccessModule } from '../notebooks/notebook-access.module';
import { CheckpointsController } from './checkpoints.controller';
import { CheckpointsService } from './checkpoints.service';

/** A notebook's version history: named checkpoints and restoring them. */
@Module({ imports: [NotebookAccessModule, CollaborationModule], controllers: [CheckpointsController], providers: [CheckpointsService] })
export class CheckpointsModule {}
