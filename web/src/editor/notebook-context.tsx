import { createContext, useContext, useSyncExternalStore } from 'react';
import { createFigureIndex, type FigureIndex } from './figure-index';

/** What node views need to know about the notebook they are in. */
export interface NotebookEditorContextValue {
  notebookId: string;
  groupId: string;
  /** Lead authors and co-authors edit; reviewers and readers read. */
  editable: boolean;
  figures: FigureIndex;
  /** Live presence (y-protocols awareness) when the document is open over the socket. */
  awareness?: PresenceAwareness;
}

/** The part of y-protocols' Awareness the editor uses to show who is changing which figure. */
export interface PresenceAwareness {
  clientID: number;
  getStates(): Map<number, Record<string, unknown>>;
  setLocalStateField(field: string, value: unknown): void;
  on(event: 'change', fn: () => void): void;
  off(event: 'change', fn: () => void): void;
}

const fallback: NotebookEditorContextValue = { notebookId: '', groupId: '', editable: false, figures: createFigureIndex() };

export const NotebookEditorContext = createContext<NotebookEditorContextValue>(fallback);

/** The notebook the node view is in. */
export function useNotebookEditor(): NotebookEditorContextValue {
  return useContext(NotebookEditorContext);
}

/** The document's figures in order, re-rendering when they change. */
export function useFigureEntries() {
  const { figures } = useNotebookEditor();
  return useSyncExternalStore(figures.subscribe, figures.getSnapshot, figures.getSnapshot);
}

/** "Figure N" of the figure at a position or with an id. */
export function useFigureNumber(pos: number | undefined, id: string | null): number | null {
  const { figures } = useNotebookEditor();
  useFigureEntries();
  return figures.numberOf(pos, id);
}
