// Starts tests/helpers/collab-server-process.ts in its own Node process (no npx/tsx wrapper process, so
// a SIGKILL hits the server itself) and resolves once it listens.
import { spawn, type ChildProcess } from 'node:child_process'
import path from 'node:path'
import { fileURLToPath } from 'node:url'

const SCRIPT = path.join(path.dirname(fileURLToPath(import.meta.url)), 'collab-server-process.ts')

export interface ChildUsage {
  cpuUserUs: number
  cpuSystemUs: number
  maxRssKb: number
  /** Arrival → broadcast inside the server (queue wait, commit, apply). */
  updateLatency: { count: number; p50Ms: number; p95Ms: number; maxMs: number }
  /** Group commit: statements, rows, and each statement's own time. */
  commits: { commits: number; rows: number; commitMs: { count: number; p50Ms: number; p95Ms: number; maxMs: number } }
}

export interface ChildServer {
  baseUrl: string
  process: ChildProcess
  /** SIGKILL, resolved once the process is gone. */
  kill(): Promise<void>
  usage(): Promise<ChildUsage>
}

export function startChildServer(env: { databaseUrl: string; jwtSecret: string; port?: number; compactEvery?: number }): Promise<ChildServer> {
  const child = spawn(process.execPath, ['--import', 'tsx', SCRIPT], {
    env: {
      ...process.env,
      DATABASE_URL: env.databaseUrl,
      AMPWRIGHT_JWT_SECRET: env.jwtSecret,
      PORT: String(env.port ?? 0),
      COLLAB_COMPACT_EVERY: env.compactEvery ? String(env.compactEvery) : '',
      SMTP_HOST: '',
    },
    stdio: ['ignore', 'pipe', 'pipe', 'ipc'],
  })
  let stderr = ''
  child.stderr!.on('data', (chunk: Buffer) => (stderr += chunk.toString()))
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()))
  return new Promise((resolve, reject) => {
    let stdout = ''
    const timer = setTimeout(() => reject(new Error(`child server did not start:\n${stderr}`)), 30_000)
    child.once('exit', (code) => reject(new Error(`child server exited (${code}):\n${stderr}`)))
    child.stdout!.on('data', (chunk: Buffer) => {
      stdout += chunk.toString()
      const match = /ready (\d+)/.exec(stdout)
      if (!match) return
      clearTimeout(timer)
      resolve({
        baseUrl: `http://127.0.0.1:${match[1]}`,
        process: child,
        async kill() {
          if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL')
          await exited
        },
        usage() {
          return new Promise((resolveUsage) => {
            const onMessage = (message: ChildUsage & { type?: string }) => {
              if (message?.type !== 'usage') return
              child.off('message', onMessage)
              resolveUsage(message)
            }
            child.on('message', onMessage)
            child.send({ type: 'usage' })
          })
        },
      })
    })
  })
}
