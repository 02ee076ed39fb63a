/** Carried by the footer of every screen and by every printed report. */
export const CAUTION =
  'Ligament is a checking aid. The engineer of record decides; the governing code and local requirements apply.';
