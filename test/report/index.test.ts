import { expect, it } from 'vitest';
import * as report from '../../src/report/index.js';

it('exports exactly the public API', () => {
  expect(Object.keys(report).sort()).toEqual([
    'DEFAULT_TARGET_LENGTH',
    'GITHUB_COMMENT_LIMIT',
    'buildMarker',
    'escapeInline',
    'gateReasonLines',
    'isValidCommentKey',
    'mermaidLabel',
    'parseMarker',
    'plainText',
    'renderJson',
    'renderMarkdown',
    'renderText',
    'terminalText',
  ]);
});
