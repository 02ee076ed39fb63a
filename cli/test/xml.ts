/**
 * A real XML parser for the drawings the tests make: a duplicate attribute, an unclosed element or
 * a stray `&` fails here as it fails in a browser, which stops drawing at the first such error.
 */
import { DOMParser, type Document } from '@xmldom/xmldom';

/** Parses an SVG document; throws with every parser message when it is not well-formed XML. */
export function parseSvg(text: string): Document {
  const problems: string[] = [];
  let doc: Document | undefined;
  try {
    doc = new DOMParser({
      onError: (level, message) => void problems.push(`${level}: ${message}`),
    }).parseFromString(text, 'image/svg+xml');
  } catch (err) {
    // A fatal error is reported through onError and then thrown.
    if (problems.length === 0) problems.push(err instanceof Error ? err.message : String(err));
  }
  if (problems.length > 0 || !doc) throw new Error(`the SVG is not well-formed XML:\n${problems.join('\n')}`);
  const root = doc.documentElement;
  if (root?.localName !== 'svg' || root.namespaceURI !== 'http://www.w3.org/2000/svg')
    throw new Error('the document element is not an SVG <svg>');
  return doc;
}
