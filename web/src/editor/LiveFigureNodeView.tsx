import { NodeViewWrapper, type NodeViewProps } from '@tiptap/react';
import { LIVE_NUMBER, type ParsedFigureRecipe } from '@upwell/common';
import { FigureView } from '../figures/FigureView';
import { useFigureNumber, useNotebookEditor } from './notebook-context';

/** The live figure node in the editor: the figure view, with its settings writing into the node's attributes. */
export function LiveFigureNodeView({ node, editor, getPos, updateAttributes, selected }: NodeViewProps) {
  const { notebookId, groupId, editable } = useNotebookEditor();
  const id = (node.attrs.id as string | null) ?? null;
  const figureNumber = useFigureNumber(getPos(), id);

  // The figure's live numbers follow it: they take the new recipe in the same step.
  const saveRecipe = (recipe: ParsedFigureRecipe) => {
    editor.commands.command(({ tr }) => {
      const pos = getPos();
      if (typeof pos !== 'number') return false;
      tr.setNodeMarkup(pos, undefined, { ...node.attrs, recipe });
      if (id) {
        tr.doc.descendants((n, p) => {
          if (n.type.name === LIVE_NUMBER && n.attrs.figureId === id) tr.setNodeMarkup(p, undefined, { ...n.attrs, recipe });
        });
      }
      return true;
    });
  };

  return (
    <NodeViewWrapper className={`upwell-figure-node${selected ? ' is-selected' : ''}`} data-figure-id={id ?? undefined}>
      {editable && (
        <span className="upwell-drag-handle" data-drag-handle draggable contentEditable={false} title="Drag to move this figure" aria-hidden>
          ⠿
        </span>
      )}
      <FigureView
        figureId={id}
        notebookId={notebookId}
        groupId={groupId}
        figureNumber={figureNumber}
        recipe={(node.attrs.recipe as Record<string, unknown> | null) ?? null}
        caption={(node.attrs.caption as string) ?? ''}
        editable={editable}
        onRecipeChange={saveRecipe}
        onCaptionChange={(caption) => updateAttributes({ caption })}
      />
    </NodeViewWrapper>
  );
}
