/**
 * The caution every screen, report, drawing and e-mail of Ligament carries (the product's own rule:
 * a checking aid, never the engineer of record's decision). The CLI, the API and the web app print
 * this one sentence.
 */
export const CAUTION =
  'Ligament is a checking aid. The engineer of record decides; the governing code and local requirements apply.';
