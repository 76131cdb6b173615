import { NodeViewWrapper, type NodeViewProps } from '@tiptap/react';
import { LiveNumberView } from '../figures/LiveNumberView';
import { useFigureNumber, useNotebookEditor } from './notebook-context';

/** The live number node in the editor's text. */
export function LiveNumberNodeView({ node, selected }: NodeViewProps) {
  const { notebookId } = useNotebookEditor();
  const figureId = (node.attrs.figureId as string | null) ?? null;
  const figureNumber = useFigureNumber(undefined, figureId);
  return (
    <NodeViewWrapper as="span" className="upwell-number-node">
      <LiveNumberView
        notebookId={notebookId}
        recipe={(node.attrs.recipe as Record<string, unknown> | null) ?? null}
        numberKey={(node.attrs.key as string) ?? ''}
        precision={Number(node.attrs.precision ?? 2)}
        figureNumber={figureNumber}
        selected={selected}
      />
    </NodeViewWrapper>
  );
}
