import PDFDocument from 'pdfkit';
import { registerInter } from './fonts';

/**
 * Draws a whole PDF in memory and returns its bytes: a new pdfkit document with Inter registered (and selected), the
 * chunks collected as pdfkit streams them, and the document ended after `draw`. A throw in `draw` rejects.
 */
export async function renderToBuffer(
  options: PDFKit.PDFDocumentOptions,
  draw: (doc: PDFKit.PDFDocument) => void | Promise<void>,
): Promise<Buffer> {
  const doc = new PDFDocument(options);
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const finished = new Promise<Buffer>((done, fail) => {
    doc.on('end', () => done(Buffer.concat(chunks)));
    doc.on('error', fail);
  });
  registerInter(doc);
  await draw(doc);
  doc.end();
  return finished;
}
