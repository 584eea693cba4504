import { PDFParse } from 'pdf-parse';
import type request from 'supertest';

/** Collects a binary response (a PDF, an image) into a Buffer: supertest's `.buffer(true).parse(binary)`. */
export function binary(response: request.Response, done: (error: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  response.on('data', (chunk: Buffer) => chunks.push(chunk));
  response.on('end', () => done(null, Buffer.concat(chunks)));
}

/** A PDF's text, read back with a general-purpose PDF text extractor (pdf-parse). */
export async function pdfText(pdf: Buffer): Promise<string> {
  return (await new PDFParse({ data: new Uint8Array(pdf) }).getText()).text;
}
