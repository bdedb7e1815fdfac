import { inflateSync } from 'node:zlib';
/**
 * Reads the text back out of an uncompressed PDF written by pdfkit (`compress: false`), for
 * tests only. pdfkit writes embedded-font text as glyph ids in hex inside `[...] TJ` arrays and
 * gives each font a ToUnicode CMap (`<start> <end> [<code points> ...]` ranges). The text is
 * decoded with every CMap of the file (text in another font decodes to noise, which does not
 * hurt a search); lines are joined with spaces.
 */
export function pdfTexts(pdf: Buffer): string[] {
  const raw = pdf.toString('latin1');
  const cmaps: Map<number, string>[] = [];
  for (const block of raw.matchAll(/beginbfrange([\s\S]*?)endbfrange/g)) {
    const map = new Map<number, string>();
    for (const range of block[1].matchAll(/<([0-9a-f]+)>\s*<[0-9a-f]+>\s*\[([^\]]*)\]/gi)) {
      let code = parseInt(range[1], 16);
      for (const entry of range[2].matchAll(/<([0-9a-f ]*)>/gi)) {
        const units = entry[1]
          .trim()
          .split(/\s+/)
          .filter(Boolean)
          .map((hex) => parseInt(hex, 16));
        map.set(code++, String.fromCharCode(...units));
      }
    }
    cmaps.push(map);
  }
  const runs = [...raw.matchAll(/\[([^\][]*)\]\s*TJ/g)].map((match) =>
    [...match[1].matchAll(/<([0-9a-f]*)>/gi)].map((hex) => hex[1]).join(''),
  );
  return cmaps.map((map) =>
    runs
      .map((hex) => (hex.match(/.{4}/g) ?? []).map((code) => map.get(parseInt(code, 16)) ?? '\uFFFD').join(''))
      .join(' ')
      .replace(/\s+/g, ' '),
  );
}

/** True when any font's decoding of the PDF's text contains `text` (spaces normalised). */
export function pdfHasText(pdf: Buffer, text: string): boolean {
  const wanted = text.replace(/\s+/g, ' ');
  return pdfTexts(pdf).some((decoded) => decoded.includes(wanted));
}

/** Number of page objects (`/Type /Page`, not `/Pages`). */
export function pdfPageCount(pdf: Buffer): number {
  return pdf.toString('latin1').match(/\/Type\s*\/Page(?![a-zA-Z])/g)?.length ?? 0;
}

/**
 * The PDF with every Flate-compressed stream inflated in place, so that `pdfTexts` reads a
 * compressed PDF as sent (streams that do not inflate are left as they are).
 */
export function inflatePdf(pdf: Buffer): Buffer {
  const raw = pdf.toString('latin1');
  const out: string[] = [];
  let at = 0;
  for (const match of raw.matchAll(/(?<!end)stream\r?\n/g)) {
    const start = match.index! + match[0].length;
    const end = raw.indexOf('endstream', start);
    if (end < 0 || start < at) continue;
    out.push(raw.slice(at, start));
    const body = pdf.subarray(start, end);
    try {
      out.push(inflateSync(body).toString('latin1'));
    } catch {
      out.push(raw.slice(start, end));
    }
    at = end;
  }
  out.push(raw.slice(at));
  return Buffer.from(out.join(''), 'latin1');
}
