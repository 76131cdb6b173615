import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable } from '@nestjs/common';
import type { SeriesUsage } from '@upwell/common';
import { renderDocument } from '../documents/document-render';
import { DocumentsService } from '../documents/documents.service';
import { Notebook } from '../notebooks/notebook.entity';
import { NotebookPolicy } from '../notebooks/notebook.policy';
import type { User } from '../users/user.entity';
import { SeriesPolicy } from './series.policy';

/**
 * Which notebooks bind a series in a figure or a live number, so that
 * deleting it can say what would break. Notebooks the asker has no role on
 * are counted, not named.
 */
@Injectable()
export class SeriesUsageService {
  constructor(
    private readonly em: EntityManager,
    private readonly policy: SeriesPolicy,
    private readonly documents: DocumentsService,
    private readonly notebooksPolicy: NotebookPolicy,
  ) {}

  async usage(user: User, seriesId: string): Promise<SeriesUsage> {
    const series = await this.policy.authorize(user, seriesId, 'view');
    const notebooks = await this.em.find(Notebook, { group: series.group });
    const mine = await this.notebooksPolicy.notebooksAllowing(user, series.group.id, 'read');
    const using: Notebook[] = [];
    for (const nb of notebooks) {
      const { json } = renderDocument(await this.documents.load(nb.id));
      // Recipes hold bindings as { seriesId }: a textual search of the rendered document finds figures and numbers alike.
      if (JSON.stringify(json).includes(`"seriesId":"${seriesId}"`)) using.push(nb);
    }
    return {
      notebooks: using.filter((n) => mine.has(n.id)).map((n) => ({ id: n.id, title: n.title })),
      otherNotebooks: using.filter((n) => !mine.has(n.id)).length,
    };
  }
}
