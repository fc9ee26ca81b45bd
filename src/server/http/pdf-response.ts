import "server-only";

/** A built report as a download: the PDF, its file name, and its page count for scripts. */
export function pdfResponse(r: { pdf: Uint8Array; pages: number; filename: string }): Response {
  return new Response(new Blob([r.pdf as Uint8Array<ArrayBuffer>], { type: "application/pdf" }), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${r.filename}"`,
      "cache-control": "no-store",
      "x-report-pages": String(r.pages),
    },
  });
}
