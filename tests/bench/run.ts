// `npm run bench`: runs the exported `run()` of every tests/bench/*.bench.ts module in turn; each
// prints its own figures. Benchmarks measure, they never assert on time.
import { readdirSync } from 'node:fs'
import { dirname, join } from 'node:path'
import { fileURLToPath, pathToFileURL } from 'node:url'

const here = dirname(fileURLToPath(import.meta.url))
const only = process.argv[2]
const modules = readdirSync(here)
  .filter((name) => name.endsWith('.bench.ts') && (!only || name.includes(only)))
  .sort()

for (const name of modules) {
  const module = (await import(pathToFileURL(join(here, name)).href)) as { run?: () => unknown }
  if (typeof module.run !== 'function') {
    console.log(`\n## ${name}: no exported run(), skipped`)
    continue
  }
  console.log(`\n## ${name}`)
  await module.run()
}
