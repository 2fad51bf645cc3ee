const loneSurrogate = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/**
 * Why PostgreSQL would refuse to store a piece of text, or null when it stores it as sent.
 * PostgreSQL's text and jsonb hold no NUL character, and jsonb (and the UTF-8 a request is
 * stored as) no half of a UTF-16 surrogate pair — what remains when an emoji is cut in two.
 */
export function unstorableTextReason(text: string): string | null {
  if (text.includes('\u0000')) {
    return 'Contains a NUL character (code 0), which cannot be stored; remove it';
  }
  if (loneSurrogate.test(text)) {
    return 'Contains a broken character (half of an emoji or symbol); retype it';
  }
  return null;
}
