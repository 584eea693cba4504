// The same Inter the web app ships; pdfkit embeds the .woff files (it cannot read woff2).
export const INTER_REGULAR_WOFF = require.resolve('@fontsource/inter/files/inter-latin-400-normal.woff');
export const INTER_BOLD_WOFF = require.resolve('@fontsource/inter/files/inter-latin-700-normal.woff');

/** The names documents pass to doc.font() after registerInter. */
export const INTER = 'Inter';
export const INTER_BOLD = 'Inter-Bold';

/** Makes Inter regular and bold available to a document under INTER and INTER_BOLD. */
export function registerInter(doc: PDFKit.PDFDocument): PDFKit.PDFDocument {
  doc.registerFont(INTER, INTER_REGULAR_WOFF);
  doc.registerFont(INTER_BOLD, INTER_BOLD_WOFF);
  return doc.font(INTER);
}
