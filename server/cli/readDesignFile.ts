import { readFile } from 'node:fs/promises'
import { parseDesign, type Design, type DesignError } from '../../shared/design/schema'

// Reading a design file for the command line: each way it can fail gets its own plain message.

export type ReadDesignResult =
  | { ok: true; design: Design; migratedFrom?: number }
  | { ok: false; reason: 'unreadable' | 'not-json'; message: string }
  | { ok: false; reason: 'invalid'; message: string; errors: DesignError[] }

/** Design files are small; anything bigger is not a design (and would be slow to parse). */
export const MAX_DESIGN_FILE_BYTES = 20 * 1024 * 1024

export async function readDesignFile(path: string): Promise<ReadDesignResult> {
  let text: string
  try {
    const buffer = await readFile(path)
    if (buffer.byteLength > MAX_DESIGN_FILE_BYTES) {
      return { ok: false, reason: 'unreadable', message: `${path} is larger than ${MAX_DESIGN_FILE_BYTES / 1024 / 1024} MB; not a design file` }
    }
    text = buffer.toString('utf8')
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : code === 'EACCES' ? 'permission denied' : 'cannot be read'
    return { ok: false, reason: 'unreadable', message: `Cannot read ${path}: ${why}` }
  }
  let json: unknown
  try {
    json = JSON.parse(text.replace(/^\uFEFF/, ''))
  } catch (error) {
    return { ok: false, reason: 'not-json', message: `${path} is not valid JSON: ${(error as Error).message}` }
  }
  const parsed = parseDesign(json)
  if (!parsed.ok) {
    const count = parsed.errors.length
    return { ok: false, reason: 'invalid', message: `${path} is not a valid design (${count} problem${count === 1 ? '' : 's'}):`, errors: parsed.errors }
  }
  return parsed.migratedFrom === undefined
    ? { ok: true, design: parsed.design }
    : { ok: true, design: parsed.design, migratedFrom: parsed.migratedFrom }
}
