import { describe, expect, it } from 'vitest';
import {
  escapeInline,
  mermaidLabel,
  plainText,
  terminalText,
  truncate,
} from '../../src/report/escape.js';

const ZWJ = '\u200D';

describe('escapeInline', () => {
  it('escapes table pipes and backslashes', () => {
    expect(escapeInline('a|b')).toBe('a\\|b');
    expect(escapeInline('a\\|b')).toBe('a\\\\\\|b');
  });

  it('turns HTML into entities, so no tag opens and no entity decodes', () => {
    expect(escapeInline('<script>alert(1)</script>')).toBe('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(escapeInline('&#8238; &amp;')).toBe('&amp;\\#\u200D8238; &amp;amp;');
  });

  it('breaks mentions, issue references and autolinks with a zero-width joiner', () => {
    expect(escapeInline('@octo-org/team')).toBe(`@${ZWJ}octo-org/team`);
    expect(escapeInline('fixes #1')).toBe(`fixes \\#${ZWJ}1`);
    expect(escapeInline('owner/repo#3 GH-2')).toBe(`owner/repo\\#${ZWJ}3 GH-${ZWJ}2`);
    expect(escapeInline('https://evil.example')).toBe(`https:${ZWJ}//evil.example`);
    expect(escapeInline('www.evil.example')).toBe(`www${ZWJ}.evil.example`);
  });

  it('escapes emphasis, code, links, strikethrough and math', () => {
    expect(escapeInline('**b** _e_ ~~s~~ `c` [l](u) $x$')).toBe(
      '\\*\\*b\\*\\* \\_e\\_ \\~\\~s\\~\\~ \\`c\\` \\[l\\](u) \\$x\\$',
    );
  });

  it('removes bidi controls, zero-width and control characters; folds newlines', () => {
    expect(escapeInline('invoice\u202Egpj.exe\u202C')).toBe('invoicegpj.exe');
    expect(escapeInline('\u2066a\u2069\u200E\u200F\u061C\uFEFFb')).toBe('ab');
    expect(escapeInline('line one\nline two\r\n## x')).toBe(
      'line one line two \\#\u200D\\#\u200D x',
    );
    expect(escapeInline('\u001b[31mred\u0007\u0000')).toBe('\\[31mred');
  });

  it('cuts long names to 80 characters with an ellipsis, before escaping', () => {
    const out = escapeInline('x'.repeat(10_000));
    expect(out).toBe(`${'x'.repeat(79)}…`);
    expect(escapeInline('|'.repeat(200))).toBe(`${'\\|'.repeat(79)}…`);
    expect(escapeInline('abc', 2)).toBe('a…');
  });
});

describe('plainText and truncate', () => {
  it('collapses white space and never splits a surrogate pair', () => {
    expect(plainText('  a \t\n b  ')).toBe('a b');
    expect(truncate('😀😀😀', 2)).toBe('😀…');
    expect(truncate('abc', 3)).toBe('abc');
  });
});

describe('terminalText', () => {
  it('removes ESC so no ANSI sequence from an artifact reaches the terminal', () => {
    expect(terminalText('\u001b[2J\u001b]0;title\u0007name')).toBe('[2J]0;titlename');
  });
});

describe('mermaidLabel', () => {
  it('keeps a safe character set only', () => {
    expect(mermaidLabel('mae_loaves')).toBe('mae loaves');
    expect(mermaidLabel('err"]; click A call x() %%{init: {}}%% #35;')).toBe(
      'err click A call x() init 35',
    );
    expect(mermaidLabel('λ × 2 (per-day)')).toBe('λ 2 (per-day)');
    expect(mermaidLabel('y'.repeat(500))).toBe(`${'y'.repeat(59)}…`);
  });
});
