// A minimal zip writer for hostile-upload tests: real local headers and central directory, with
// the option to declare an uncompressed size other than the real one (a lying archive).
import { crc32, deflateRawSync } from "node:zlib";

export interface ZipPart {
  name: string;
  data: Buffer | string;
  /** The uncompressed size written into the headers; the real one when omitted. */
  declaredSize?: number;
  /** Already deflated data (to avoid deflating a huge buffer twice); `data` is then ignored for the body. */
  deflated?: Buffer;
}

export function makeZip(parts: readonly ZipPart[]): Buffer {
  const locals: Buffer[] = [];
  const centrals: Buffer[] = [];
  let offset = 0;
  for (const part of parts) {
    const raw = typeof part.data === "string" ? Buffer.from(part.data, "utf8") : part.data;
    const body = part.deflated ?? deflateRawSync(raw);
    const name = Buffer.from(part.name, "utf8");
    const size = part.declaredSize ?? raw.byteLength;
    const crc = crc32(raw);
    const local = Buffer.alloc(30);
    local.writeUInt32LE(0x04034b50, 0);
    local.writeUInt16LE(20, 4);
    local.writeUInt16LE(8, 8); // deflate
    local.writeUInt32LE(crc, 14);
    local.writeUInt32LE(body.byteLength, 18);
    local.writeUInt32LE(size, 22);
    local.writeUInt16LE(name.byteLength, 26);
    const central = Buffer.alloc(46);
    central.writeUInt32LE(0x02014b50, 0);
    central.writeUInt16LE(20, 4);
    central.writeUInt16LE(20, 6);
    central.writeUInt16LE(8, 10);
    central.writeUInt32LE(crc, 16);
    central.writeUInt32LE(body.byteLength, 20);
    central.writeUInt32LE(size, 24);
    central.writeUInt16LE(name.byteLength, 28);
    central.writeUInt32LE(offset, 42);
    locals.push(local, name, body);
    centrals.push(central, name);
    offset += 30 + name.byteLength + body.byteLength;
  }
  const directory = Buffer.concat(centrals);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(parts.length, 8);
  end.writeUInt16LE(parts.length, 10);
  end.writeUInt32LE(directory.byteLength, 12);
  end.writeUInt32LE(offset, 16);
  return Buffer.concat([...locals, directory, end]);
}

const MAIN = "http://schemas.openxmlformats.org/spreadsheetml/2006/main";
const RELS = "http://schemas.openxmlformats.org/package/2006/relationships";
const DOC = "http://schemas.openxmlformats.org/officeDocument/2006/relationships";

/** The parts every XLSX needs around one worksheet named `sheetName`, whose XML is given. */
export function xlsxParts(sheetName: string, sheetXml: string | Buffer, sheetPart: Partial<ZipPart> = {}): ZipPart[] {
  return [
    {
      name: "[Content_Types].xml",
      data: `<?xml version="1.0" encoding="UTF-8" standalone="yes"?><Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types"><Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" ContentType="application/xml"/><Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/><Override PartName="/xl/worksheets/sheet1.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/></Types>`,
    },
    { name: "_rels/.rels", data: `<?xml version="1.0" encoding="UTF-8"?><Relationships xmlns="${RELS}"><Relationship Id="rId1" Type="${DOC}/officeDocument" Target="xl/workbook.xml"/></Relationships>` },
    { name: "xl/workbook.xml", data: `<?xml version="1.0" encoding="UTF-8"?><workbook xmlns="${MAIN}" xmlns:r="${DOC}"><sheets><sheet name="${sheetName}" sheetId="1" r:id="rId1"/></sheets></workbook>` },
    { name: "xl/_rels/workbook.xml.rels", data: `<?xml version="1.0" encoding="UTF-8"?><Relationships xmlns="${RELS}"><Relationship Id="rId1" Type="${DOC}/worksheet" Target="worksheets/sheet1.xml"/></Relationships>` },
    { name: "xl/worksheets/sheet1.xml", data: sheetXml, ...sheetPart },
  ];
}

const inline = (ref: string, text: string) => `<c r="${ref}" t="inlineStr"><is><t>${text}</t></is></c>`;

/**
 * A worksheet whose heading row is `headings` (A1, B1 …) and whose next `rows` rows each hold one
 * number in column XFD (16,384), with or without the `<dimension>` that says so.
 */
export function farColumnSheet(headings: readonly string[], rows: number, withDimension: boolean): string {
  const letters = (n: number) => {
    let s = "";
    for (let c = n; c > 0; c = Math.floor((c - 1) / 26)) s = String.fromCharCode(65 + ((c - 1) % 26)) + s;
    return s;
  };
  const head = `<row r="1">${headings.map((h, i) => inline(`${letters(i + 1)}1`, h)).join("")}</row>`;
  const body: string[] = [];
  for (let r = 2; r <= rows + 1; r++) body.push(`<row r="${r}"><c r="XFD${r}"><v>1</v></c></row>`);
  const dimension = withDimension ? `<dimension ref="A1:XFD${rows + 1}"/>` : "";
  return `<?xml version="1.0" encoding="UTF-8" standalone="yes"?><worksheet xmlns="${MAIN}">${dimension}<sheetData>${head}${body.join("")}</sheetData></worksheet>`;
}
