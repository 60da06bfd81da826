/** Escaping for text placed in HTML, in element content or a quoted attribute. */

const ENTITIES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/**
 * Escapes the five characters that can end a text run or an attribute value,
 * and drops the C0 control characters HTML forbids (other than tab, line feed
 * and carriage return), so any string is safe inside an element or a quoted
 * attribute.
 */
export function escapeHtml(text: string): string {
  // eslint-disable-next-line no-control-regex
  return text.replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/g, '').replace(/[&<>"']/g, (c) => ENTITIES[c]);
}
