/**
 * Escaping of text that comes from the repository (model names, column names, messages) for
 * each medium it reaches. One helper per medium, tested byte for byte.
 */

/** HTML text and attribute values: & < > " ' become entities. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] as string);
}

/**
 * Markdown inline text (GitHub-flavoured, inside table cells too): line breaks become spaces;
 * `&`, `<` and `>` become entities (no HTML, no hidden comments); the characters that start
 * inline Markdown syntax or end a table cell (`\`, backtick, `*`, `_`, `[`, `]`, `|`, `~`) are
 * backslash-escaped; `@` is followed by a zero-width space so that names never mention anyone.
 * Text is always placed mid-line, so block syntax (`#`, `-`, `>` at a line start) cannot start.
 */
export function escapeMarkdown(text: string): string {
  return text
    .replace(/\r?\n|\r/g, ' ')
    .replace(/[&<>]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;' })[c] as string)
    .replace(/([\\`*_[\]|~])/g, '\\$1')
    .replace(/@/g, '@\u200b');
}

/**
 * Text for a terminal: control characters (including ESC, which starts colour codes and
 * cursor moves) are shown as `\u001b` style escapes; line breaks become spaces.
 */
export function escapeTerminal(text: string): string {
  return text
    .replace(/\r?\n|\r/g, ' ')
    .replace(/[\u0000-\u001f\u007f-\u009f]/g, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}

/**
 * XML 1.0 text and attribute values (JUnit): & < > " ' become entities; tab, line feed and
 * carriage return become character references (`&#9;`, `&#10;`, `&#13;`: kept exactly in
 * attribute values, which XML would otherwise turn into spaces, and never a raw line break from a
 * name); characters XML 1.0 does not allow (other C0 controls, U+FFFE, U+FFFF, lone surrogates)
 * become U+FFFD. No CDATA is used, so `]]>` is plain text.
 */
export function escapeXml(text: string): string {
  return text
    .replace(
      /[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffe\uffff]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g,
      '\ufffd',
    )
    .replace(
      /[&<>"'\t\n\r]/g,
      (c) =>
        ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;', '\t': '&#9;', '\n': '&#10;', '\r': '&#13;' })[c] as string,
    );
}

/**
 * Text inside a double-quoted Mermaid string (chart titles, axis labels): line breaks and other
 * control characters become spaces; `"` becomes `'`; `<` and `>` become `‹` and `›` (Mermaid
 * passes labels through an HTML sanitiser); `#` becomes the full-width `＃` (Mermaid reads
 * `#name;` as an entity code); a backtick becomes `'` so that the text cannot close a
 * Markdown code fence.
 */
export function escapeMermaid(text: string): string {
  return text
    .replace(/[\u0000-\u001f\u007f-\u009f]+/g, ' ')
    .replace(/["`]/g, "'")
    .replace(/</g, '‹')
    .replace(/>/g, '›')
    .replace(/#/g, '＃');
}
