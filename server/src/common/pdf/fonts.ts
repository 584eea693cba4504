import { readFileSync } from 'node:fs';
import { woffToSfnt } from './woff-to-sfnt';

// The same Inter the web app ships, as .woff (pdfkit cannot read woff2), unpacked once per process.
export const INTER_REGULAR_WOFF = require.resolve('@fontsource/inter/files/inter-latin-400-normal.woff');
export const INTER_BOLD_WOFF = require.resolve('@fontsource/inter/files/inter-latin-700-normal.woff');

/** The names documents pass to doc.font() after registerInter. */
export const INTER = 'Inter';
export const INTER_BOLD = 'Inter-Bold';

let unpacked: { regular: Buffer; bold: Buffer } | undefined;

/** Inter regular and bold as TrueType bytes, read and unpacked on first use. */
export function interFonts(): { regular: Buffer; bold: Buffer } {
  unpacked ??= {
    regular: woffToSfnt(readFileSync(INTER_REGULAR_WOFF)),
    bold: woffToSfnt(readFileSync(INTER_BOLD_WOFF)),
  };
  return unpacked;
}

/** Makes Inter regular and bold available to a document under INTER and INTER_BOLD. */
export function registerInter(doc: PDFKit.PDFDocument): PDFKit.PDFDocument {
  const { regular, bold } = interFonts();
  doc.registerFont(INTER, regular);
  doc.registerFont(INTER_BOLD, bold);
  return doc.font(INTER);
}
