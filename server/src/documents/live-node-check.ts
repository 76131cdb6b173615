import { FIGURE_LIMITS, figureRecipeSchema, visitLiveNodes, type PmJson } from '@upwell/common';

/** A problem with a live node of a stored document, named by its place ("figure 2", "live number 1"). */
export interface LiveNodeIssue {
  path: string;
  message: string;
}

/**
 * What the editor schema cannot judge in a document's live nodes: every recipe must be one the
 * engine computes (figureRecipeSchema), every caption at most FIGURE_LIMITS.captionMax characters.
 * A figure or number without a recipe yet (null) is fine: its settings are still to be chosen.
 */
export function liveNodeIssues(doc: PmJson): LiveNodeIssue[] {
  const issues: LiveNodeIssue[] = [];
  let figures = 0;
  let numbers = 0;
  const recipe = (where: string, r: Record<string, unknown> | null) => {
    if (r === null) return;
    const parsed = figureRecipeSchema.safeParse(r);
    if (!parsed.success) for (const i of parsed.error.issues) issues.push({ path: `${where}.recipe${i.path.length ? '.' + i.path.join('.') : ''}`, message: i.message });
  };
  visitLiveNodes(doc, {
    figure: (f) => {
      const where = `figure ${++figures}`;
      recipe(where, f.recipe);
      if (f.caption.length > FIGURE_LIMITS.captionMax) issues.push({ path: `${where}.caption`, message: `a caption holds at most ${FIGURE_LIMITS.captionMax} characters (this one ${f.caption.length})` });
    },
    number: (n) => recipe(`live number ${++numbers}`, n.recipe),
  });
  return issues;
}

/**
 * The issues an edit brings in: those of the document after it that the document before it did
 * not have, so that an older document holding a recipe later rules refuse can still be edited
 * elsewhere.
 */
export function newLiveNodeIssues(before: PmJson, after: PmJson): LiveNodeIssue[] {
  const old = new Set(liveNodeIssues(before).map((i) => `${i.path}\u0000${i.message}`));
  return liveNodeIssues(after).filter((i) => !old.has(`${i.path}\u0000${i.message}`));
}
