const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

/**
 * `Content-Disposition: attachment` for any file name (RFC 6266 section 4.3): a plain-ASCII
 * `filename` for old clients and, when the name is not plain ASCII, `filename*` in the RFC 5987
 * `UTF-8''…` form that carries the exact name. Header values must be Latin-1, so a raw non-ASCII
 * name in `filename="…"` is either mangled or refused by Node (ERR_INVALID_CHAR).
 *
 * @example
 * attachmentDisposition('Träger.json'); // attachment; filename="Tr_ger.json"; filename*=UTF-8''Tr%C3%A4ger.json
 */
export function attachmentDisposition(fileName: string): string {
  const fallback = fileName.replace(/[^\x20-\x7e]|["\\%]/g, '_');
  const header = `attachment; filename="${fallback}"`;
  if (fallback === fileName) return header;
  // encodeURIComponent leaves ' ( ) * unescaped; RFC 5987 attr-char does not allow them.
  // A lone surrogate cannot be encoded (encodeURIComponent throws): show it as U+FFFD.
  const wellFormed = fileName.replace(LONE_SURROGATE, '\uFFFD');
  const encoded = encodeURIComponent(wellFormed).replace(
    /['()*]/g,
    (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`,
  );
  return `${header}; filename*=UTF-8''${encoded}`;
}
