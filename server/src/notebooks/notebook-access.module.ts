import { Module } from '@nestjs/common';
import { NotebookPolicy } from './notebook.policy';

/** The notebook policy alone, so every feature that guards notebooks can import it without the notebook routes. */
@Module({ providers: [NotebookPolicy], exports: [NotebookPolicy] })
export class NotebookAccessModule {}
