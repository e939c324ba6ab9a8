import { sniffImageType } from './image-sniff';

const bytes = (...b: number[]) => Uint8Array.from(b);
const ascii = (s: string) => [...s].map((c) => c.charCodeAt(0));

describe('sniffImageType', () => {
  it('knows PNG by its eight-byte signature', () => {
    // PNG spec (W3C, 2nd ed.) §5.2 "PNG signature" and RFC 2083 §3.1: 137 80 78 71 13 10 26 10.
    expect(sniffImageType(bytes(137, 80, 78, 71, 13, 10, 26, 10, 0, 0, 0, 13))).toBe('image/png');
  });

  it('refuses a PNG signature with the line-ending check bytes altered', () => {
    // RFC 2083 §12.11: the CR-LF and ^Z bytes exist to catch text-mode transfers; a mangled one is not PNG.
    expect(sniffImageType(bytes(137, 80, 78, 71, 10, 26, 10, 0))).toBeNull();
  });

  it('knows JPEG by the SOI marker followed by a marker byte', () => {
    // ITU-T T.81 Annex B.1.1.3: SOI = X'FFD8'; JFIF 1.02 puts APP0 (FF E0) right after it.
    expect(sniffImageType(bytes(0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, ...ascii('JFIF'), 0))).toBe('image/jpeg');
    // Exif files start SOI then APP1 (FF E1) — same first three bytes (Exif 2.3 §4.5.4; from memory).
    expect(sniffImageType(bytes(0xff, 0xd8, 0xff, 0xe1, 0x00, 0x10))).toBe('image/jpeg');
  });

  it('knows WebP by the RIFF header with form type WEBP at byte 8', () => {
    // WebP container specification, "RIFF file header": 'RIFF', uint32 file size, 'WEBP'.
    expect(sniffImageType(bytes(...ascii('RIFF'), 0x24, 0, 0, 0, ...ascii('WEBP'), ...ascii('VP8 ')))).toBe('image/webp');
  });

  it('refuses other RIFF files such as WAVE audio', () => {
    // RIFF form type 'WAVE' (Microsoft/IBM RIFF spec, 1991; from memory) is a RIFF file that is not WebP.
    expect(sniffImageType(bytes(...ascii('RIFF'), 0x24, 0, 0, 0, ...ascii('WAVE')))).toBeNull();
  });

  it('refuses a text file, a GIF, an SVG and files too short to tell', () => {
    expect(sniffImageType(Buffer.from('this is not a picture\n'))).toBeNull();
    // GIF89a header (GIF89a spec §17): a real image type we do not accept.
    expect(sniffImageType(Buffer.from('GIF89a\x01\x00\x01\x00'))).toBeNull();
    expect(sniffImageType(Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>'))).toBeNull();
    expect(sniffImageType(bytes(0x89, 0x50, 0x4e))).toBeNull();
    expect(sniffImageType(bytes(0xff, 0xd8))).toBeNull();
    expect(sniffImageType(bytes())).toBeNull();
  });
});
