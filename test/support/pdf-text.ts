// Text of a PDF, page by page, read back with pdfjs-dist (the standard fonts' metrics ship with it).
import { fileURLToPath } from "node:url";
import type { Response } from "supertest";
import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";

const FONTS = fileURLToPath(new URL("../../node_modules/pdfjs-dist/standard_fonts/", import.meta.url));

export async function pdfPages(pdf: Uint8Array): Promise<string[]> {
  const doc = await getDocument({ data: pdf.slice(), isEvalSupported: false, standardFontDataUrl: FONTS }).promise;
  const out: string[] = [];
  for (let i = 1; i <= doc.numPages; i++) {
    const content = await (await doc.getPage(i)).getTextContent();
    out.push(content.items.map((it) => ("str" in it ? it.str : "")).join(" ").replace(/\s+/g, " "));
  }
  return out;
}

/** A supertest parser that keeps a binary answer (a PDF) as one Buffer: `.buffer(true).parse(binaryBody)`. */
export function binaryBody(res: Response, cb: (err: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on("data", (c: Buffer) => chunks.push(c));
  res.on("end", () => cb(null, Buffer.concat(chunks)));
}
