import type { UploadContentType } from '../../../shared/api/uploads.schemas'

// The type of a file from its first bytes (its "magic number"), never from its name:
// PDF "%PDF-" (ISO 32000-1 §7.5.2), PNG 89 50 4E 47 0D 0A 1A 0A (PNG spec §5.2), JPEG FF D8 FF (SOI marker + next marker, ITU T.81).
const SIGNATURES: { type: UploadContentType; bytes: number[] }[] = [
  { type: 'application/pdf', bytes: [0x25, 0x50, 0x44, 0x46, 0x2d] },
  { type: 'image/png', bytes: [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a] },
  { type: 'image/jpeg', bytes: [0xff, 0xd8, 0xff] },
]

export function detectFileType(content: Uint8Array): UploadContentType | null {
  for (const { type, bytes } of SIGNATURES) {
    if (content.length >= bytes.length && bytes.every((b, i) => content[i] === b)) return type
  }
  return null
}
