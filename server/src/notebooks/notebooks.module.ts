import { Module } from '@nestjs/common';
import { GroupsModule } from '../groups/groups.module';
import { NotebookPolicy } from './notebook.policy';
import { NotebooksController } from './notebooks.controller';
import { NotebooksService } from './notebooks.service';

@Module({
  imports: [GroupsModule],
  controllers: [NotebooksController],
  providers: [NotebooksService, NotebookPolicy],
  exports: [NotebookPolicy],
})
export class NotebooksModule {}
