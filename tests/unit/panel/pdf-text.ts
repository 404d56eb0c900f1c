import { inflateSync } from 'node:zlib';
// A small text extractor for the uncompressed PDFs pdfkit writes (compress: false): follows each font's
// ToUnicode map for embedded fonts and reads standard-font strings as Latin-1. Test use only.

function parseToUnicode(cmap: string): Map<number, string> {
  const map = new Map<number, string>();
  const re = /<([0-9a-fA-F]+)>\s*<([0-9a-fA-F]+)>\s*\[([^\]]*)\]/g;
  for (let m = re.exec(cmap); m; m = re.exec(cmap)) {
    const start = parseInt(m[1], 16);
    const entries = [...m[3].matchAll(/<([0-9a-fA-F ]*)>/g)].map((e) =>
      String.fromCharCode(
        ...e[1]
          .trim()
          .split(/\s+/)
          .filter(Boolean)
          .map((h) => parseInt(h, 16)),
      ),
    );
    entries.forEach((s, i) => {
      map.set(start + i, s);
    });
  }
  return map;
}

export function extractPdfText(pdf: Buffer): string {
  const src = pdf.toString('latin1');
  const objects = new Map<string, string>();
  for (const m of src.matchAll(/(\d+) 0 obj([\s\S]*?)endobj/g)) objects.set(m[1], m[2]);
  const fontMaps = new Map<string, Map<number, string> | null>();
  for (const body of objects.values()) {
    for (const m of body.matchAll(/\/(F\d+) (\d+) 0 R/g)) {
      const font = objects.get(m[2]) ?? '';
      const tu = /\/ToUnicode (\d+) 0 R/.exec(font);
      fontMaps.set(m[1], tu ? parseToUnicode(objects.get(tu[1]) ?? '') : null);
    }
  }
  const out: string[] = [];
  for (const body of objects.values()) {
    const stream = /stream\r?\n([\s\S]*?)endstream/.exec(body)?.[1];
    if (!stream || !/\bT[Jj]\b/.test(stream)) continue;
    let current: Map<number, string> | null = null;
    for (const op of stream.matchAll(/\/(F\d+) [\d.]+ Tf|(\[[^\]]*\]\s*TJ|<[0-9a-fA-F]*>\s*Tj)/g)) {
      if (op[1]) {
        current = fontMaps.get(op[1]) ?? null;
        continue;
      }
      let text = '';
      for (const h of op[2].matchAll(/<([0-9a-fA-F]*)>/g)) {
        const hex = h[1];
        if (current) {
          for (let i = 0; i + 4 <= hex.length; i += 4) text += current.get(parseInt(hex.slice(i, i + 4), 16)) ?? '?';
        } else {
          for (let i = 0; i + 2 <= hex.length; i += 2) text += String.fromCharCode(parseInt(hex.slice(i, i + 2), 16));
        }
      }
      out.push(text);
    }
  }
  return out.join(' ').replace(/\s+/g, ' ');
}

/** The same PDF with its Flate streams inflated, for extractPdfText on a compressed document (test use only). */
export function inflatePdf(pdf: Buffer): Buffer {
  const parts: Buffer[] = [];
  let at = 0;
  const src = pdf.toString('latin1');
  const re = /\/FlateDecode[\s\S]*?>>\s*stream\r?\n/g;
  for (let m = re.exec(src); m; m = re.exec(src)) {
    const start = m.index + m[0].length;
    const end = src.indexOf('endstream', start);
    parts.push(pdf.subarray(at, start));
    try {
      parts.push(inflateSync(pdf.subarray(start, end)), Buffer.from('\n'));
    } catch {
      parts.push(pdf.subarray(start, end));
    }
    at = end;
    re.lastIndex = end;
  }
  parts.push(pdf.subarray(at));
  return Buffer.concat(parts);
}
