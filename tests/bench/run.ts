// `npm run bench`: runs the exported `run()` of every tests/bench/*.bench.ts module in turn; each
// prints its own figures. Benchmarks measure, they never assert on time.
// `npx tsx tests/bench/run.ts solver` runs only the modules whose file name contains "solver".
import { readdirSync } from 'node:fs'
import { dirname, join } from 'node:path'
import { fileURLToPath, pathToFileURL } from 'node:url'

const here = dirname(fileURLToPath(import.meta.url))
const only = process.argv[2]
const modules = readdirSync(here)
  .filter((name) => name.endsWith('.bench.ts') && (!only || name.includes(only)))
  .sort()

if (modules.length === 0) console.log(`no tests/bench/*.bench.ts module matches "${only ?? ''}"`)

// One failing module does not hide the others' figures; the exit code still reports it.
for (const name of modules) {
  try {
    const module = (await import(pathToFileURL(join(here, name)).href)) as { run?: () => unknown }
    if (typeof module.run !== 'function') {
      console.log(`\n## ${name}: no exported run(), skipped`)
      continue
    }
    console.log(`\n## ${name}`)
    await module.run()
  } catch (error) {
    console.error(`\n## ${name} failed: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`)
    process.exitCode = 1
  }
}
