/** Image types Covalent accepts, told apart by their first bytes only. */
export const IMAGE_MIMES = ['image/png', 'image/jpeg', 'image/webp'] as const;
export type ImageMime = (typeof IMAGE_MIMES)[number];

/** PNG signature (PNG spec §5.2, RFC 2083 §3.1): 89 50 4E 47 0D 0A 1A 0A. */
const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
/** JPEG SOI marker FF D8 followed by the first segment's FF (JFIF / ITU-T T.81 B.1.1.3). */
const JPEG_SOI = [0xff, 0xd8, 0xff];
const ASCII = (s: string): number[] => [...s].map((c) => c.charCodeAt(0));

function startsWith(bytes: Uint8Array, signature: number[], offset = 0): boolean {
  if (bytes.length < offset + signature.length) return false;
  return signature.every((b, i) => bytes[offset + i] === b);
}

/** The image type the bytes really are, or null for anything else (a renamed text file, a GIF, an SVG). */
export function sniffImageType(bytes: Uint8Array): ImageMime | null {
  if (startsWith(bytes, PNG_SIGNATURE)) return 'image/png';
  if (startsWith(bytes, JPEG_SOI)) return 'image/jpeg';
  // WebP: a RIFF container ("RIFF", 4-byte size, then the form type "WEBP") — WebP container spec, RIFF header.
  if (startsWith(bytes, ASCII('RIFF')) && startsWith(bytes, ASCII('WEBP'), 8)) return 'image/webp';
  return null;
}
