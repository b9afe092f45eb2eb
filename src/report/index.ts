/** Renderers of a review: PR comment / job summary (GFM), terminal text, JSON report. */
export { renderMarkdown, GITHUB_COMMENT_LIMIT, DEFAULT_TARGET_LENGTH } from './markdown.js';
export type { MarkdownOptions } from './markdown.js';
export { renderText } from './text.js';
export type { TextOptions } from './text.js';
export { renderJson } from './json.js';
export { escapeInline, mermaidLabel, plainText, terminalText } from './escape.js';
export { buildMarker, parseMarker, isValidCommentKey } from './marker.js';
export type { Marker } from './marker.js';
export type { ProvenanceFile } from './method.js';
export { gateReasonLines } from './gate.js';
