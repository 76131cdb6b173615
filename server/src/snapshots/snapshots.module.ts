import { Module } from '@nestjs/common';
import { CollaborationModule } from '../collaboration/collaboration.module';
import { DocumentsModule } from '../documents/documents.module';
import { FiguresModule } from '../figures/figures.module';
import { NotebookAccessModule } from '../notebooks/notebook-access.module';
import { SharedSnapshotsController, ShareLinksController } from './share-links.controller';
import { ShareLinksService } from './share-links.service';
import { SnapshotFreezer } from './snapshot-freezer';
import { SnapshotPolicy } from './snapshot.policy';
import { NotebookSnapshotsController, SnapshotsController } from './snapshots.controller';
import { SnapshotsService } from './snapshots.service';

/** Read-only snapshots of notebooks: publishing, reading, HTML files, comparing, share links. */
@Module({
  imports: [NotebookAccessModule, DocumentsModule, CollaborationModule, FiguresModule],
  controllers: [NotebookSnapshotsController, SnapshotsController, ShareLinksController, SharedSnapshotsController],
  providers: [SnapshotPolicy, SnapshotFreezer, SnapshotsService, ShareLinksService],
  exports: [SnapshotPolicy],
})
export class SnapshotsModule {}
