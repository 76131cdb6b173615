export { NotebookEditor, type NotebookEditorProps } from './NotebookEditor';
export { FigureRefreshNotice } from '../figures/FigureRefreshNotice';
export { useFigure, useFigureLiveRefresh, figureKeys } from '../api/figures';
