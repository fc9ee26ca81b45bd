/**
 * Text as the report's embedded font (src/report/report-font.ts) can print it. The font covers
 * Latin, Greek, super- and subscripts, arrows and mathematical operators, so symbols print as
 * themselves; only characters outside it (emoji, other scripts) become "?" rather than an empty box.
 */
const OUTSIDE = /[^\u0000-\u024f\u0307\u0370-\u03ff\u1e40\u1e41\u2000-\u206f\u2070-\u209f\u20ac\u2100-\u22ff\u2300-\u2312\u25a0-\u25cf]/gu;

export function pdfText(s: string): string {
  return s.replace(OUTSIDE, "?");
}
