export { CommentsPanel, type CommentsPanelProps } from './CommentsPanel';
export { anchorFromSelection, anchorToRange, useCommentAnchorFromSelection, type AnchorRange } from './anchor';
export { useCommentThreads, useCommentActions, useCommentsLive, commentKeys } from './api';
