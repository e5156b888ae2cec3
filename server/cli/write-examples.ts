import { readFile, writeFile } from 'node:fs/promises'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { EXAMPLE_FILES } from './examples/index'

// `npx tsx server/cli/write-examples.ts [--check]`: regenerate examples/*.json from code, or with
// --check report (exit 1) any file that has drifted from the code that defines it.

const EXAMPLES_DIR = fileURLToPath(new URL('../../examples/', import.meta.url))
export const exampleText = (build: () => unknown) => `${JSON.stringify(build(), null, 2)}\n`

const check = process.argv.includes('--check')
let drifted = 0
for (const [name, build] of Object.entries(EXAMPLE_FILES)) {
  const path = join(EXAMPLES_DIR, name)
  const text = exampleText(build)
  if (check) {
    const current = await readFile(path, 'utf8').catch(() => '')
    if (current !== text) {
      drifted++
      process.stderr.write(`examples/${name} differs from its code; run npx tsx server/cli/write-examples.ts\n`)
    }
  } else {
    await writeFile(path, text)
    process.stdout.write(`wrote examples/${name}\n`)
  }
}
process.exitCode = drifted > 0 ? 1 : 0
