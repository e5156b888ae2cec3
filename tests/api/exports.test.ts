// Exports of a project: diagram (SVG, PDF), report PDF, bill of materials CSV (with edited spares),
// design JSON, SPICE netlist, and the design import. PDF text is read back with poppler's pdftotext,
// the netlist is solved by ngspice, the SVG is checked for XML well-formedness.
import { execFileSync } from 'node:child_process'
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { parse } from 'csv-parse/sync'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { analyzeDesign } from '../../shared/analysis'
import { createDemoDesign } from '../../shared/design/demo'
import { createOrganization, createProject, type TestOrganization } from '../helpers/factories'
import { freshSessionClient, type Api } from '../helpers/http'
import { runNgspice } from '../helpers/ngspice'
import { startTestServer, type TestServer } from '../helpers/server'
import { xmlWellFormedError } from '../../shared/export/xmlWellFormed'

let server: TestServer
let org: TestOrganization
let designer: Api
let client: Api
let otherClient: Api
let projectId: string
const demo = createDemoDesign()
const PROJECT_NAME = 'Expedition truck for the Okafor family'

/** supertest buffers binary bodies only when asked to. */
const binary = (res: request.Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = []
  res.on('data', (c: Buffer) => chunks.push(c))
  res.on('end', () => cb(null, Buffer.concat(chunks)))
}

export function pdfText(pdf: Buffer): string {
  const dir = mkdtempSync(join(tmpdir(), 'pdf-'))
  try {
    writeFileSync(join(dir, 'a.pdf'), pdf)
    return execFileSync('pdftotext', ['-layout', join(dir, 'a.pdf'), '-'], { encoding: 'utf8' })
  } finally {
    rmSync(dir, { recursive: true, force: true })
  }
}
const squash = (text: string) => text.replace(/\s+/g, ' ')

beforeAll(async () => {
  server = await startTestServer()
  org = await createOrganization(server.db, 'Exports')
  const session = (user: { id: string }) => freshSessionClient(server, { userId: user.id, organizationId: org.id })
  designer = await session(org.designer)
  client = await session(org.client)
  otherClient = await session(org.otherClient)
  projectId = await createProject(server.db, org, { name: PROJECT_NAME, nominalVoltageV: 24, sharedWith: [org.client], document: demo })
})
afterAll(() => server.close())

describe('exports', () => {
  const analysis = analyzeDesign(demo)

  it('report.pdf holds the project name, every finding with its rule and source, and the cautions', async () => {
    const res = await client.get(`/api/projects/${projectId}/exports/report.pdf`).buffer(true).parse(binary)
    expect(res.status).toBe(200)
    expect(res.headers['content-type']).toBe('application/pdf')
    const pdf = res.body as Buffer
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-')
    const text = squash(pdfText(pdf))
    expect(text).toContain(PROJECT_NAME)
    expect(analysis.findings.length).toBeGreaterThan(0)
    for (const f of analysis.findings) {
      expect(text).toContain(f.title)
      expect(text).toContain(`Rule: ${f.ruleId}`)
    }
    expect(text).toContain('these results are design aids')
    expect(text).toContain('the authority having jurisdiction and licensed practice prevail')
    expect(text).toContain('Lithium batteries') // the demo bank is LFP
    for (const c of demo.conductors) expect(text).toContain(c.label)
  })

  it('diagram.pdf is a vector drawing with the title block', async () => {
    const res = await designer.get(`/api/projects/${projectId}/exports/diagram.pdf`).buffer(true).parse(binary)
    expect(res.status).toBe(200)
    const text = squash(pdfText(res.body as Buffer))
    expect(text).toContain(PROJECT_NAME.slice(0, 40))
    expect(text).toContain('Saved revision')
    expect(text).toContain('Compressor fridge')
    expect(text).toContain('design aids')
  })

  it('diagram.svg is well-formed and names the project', async () => {
    const res = await client.get(`/api/projects/${projectId}/exports/diagram.svg`)
    expect(res.status).toBe(200)
    expect(res.headers['content-type']).toContain('image/svg+xml')
    const svg = res.text || (res.body as Buffer).toString('utf8')
    expect(xmlWellFormedError(svg)).toBeNull()
    expect(svg).toContain(PROJECT_NAME)
  })

  it('bom.csv conductor lengths total the design, and spares cover every fuse rating', async () => {
    const res = await client.get(`/api/projects/${projectId}/exports/bom.csv`)
    expect(res.status).toBe(200)
    expect(res.headers['content-disposition']).toContain('attachment')
    const rows = parse(res.text, { columns: true }) as Record<string, string>[]
    const total = rows.filter((r) => r.section === 'conductor').reduce((s, r) => s + Number(r.length_m), 0)
    expect(total).toBeCloseTo(demo.conductors.reduce((s, c) => s + c.lengthM, 0), 6)
    const fuses = rows.filter((r) => r.section === 'fuse').map((r) => `${r.family}|${r.rating_a}`)
    const spares = rows.filter((r) => r.section === 'spare').map((r) => `${r.family}|${r.rating_a}`)
    expect(new Set(spares)).toEqual(new Set(fuses))
    expect(rows.filter((r) => r.section === 'terminal').reduce((s, r) => s + Number(r.quantity), 0)).toBe(2 * demo.conductors.length)
  })

  it('POST bom.csv takes an edited spares list (validated)', async () => {
    const ok = await client.post(`/api/projects/${projectId}/exports/bom.csv`, {
      spares: [{ family: 'class-t', ratingA: 300, quantity: 0, note: 'owner keeps one' }, { family: 'blade-regular', ratingA: 12, quantity: 3 }],
      wasteAllowancePct: 20,
    })
    expect(ok.status).toBe(200)
    const rows = parse(ok.text, { columns: true }) as Record<string, string>[]
    const spares = rows.filter((r) => r.section === 'spare')
    expect(spares.map((r) => [r.family, r.rating_a, r.quantity])).toEqual([['class-t', '300', '0'], ['blade-regular', '12', '3']])
    expect(spares[1].note).toContain('HARD TO FIND')
    expect(rows.find((r) => r.section === 'conductor')!.note).toContain('20 % waste')

    const bad = await client.post(`/api/projects/${projectId}/exports/bom.csv`, { spares: [{ family: 'no-such', ratingA: -1, quantity: 1.5 }] })
    expect(bad.status).toBe(400)
    expect(bad.body.error.fields.map((f: { path: string }) => f.path).sort()).toEqual(['spares.0.family', 'spares.0.quantity', 'spares.0.ratingA'])
  })

  it('design.json round-trips the design', async () => {
    const res = await client.get(`/api/projects/${projectId}/exports/design.json`)
    expect(res.status).toBe(200)
    expect(JSON.parse(res.text)).toEqual(demo)
  })

  it('netlist.cir of a scenario runs in ngspice (independent solver)', async () => {
    const res = await designer.get(`/api/projects/${projectId}/exports/netlist.cir?scenario=night-all-loads`)
    expect(res.status).toBe(200)
    const run = runNgspice(res.text)
    expect(run.vectors.size).toBeGreaterThan(10)
    const missing = await designer.get(`/api/projects/${projectId}/exports/netlist.cir?scenario=nope`)
    expect(missing.status).toBe(400)
    expect(missing.body.error.fields[0].path).toBe('scenario')
  })

  it('refuses users who cannot read the project', async () => {
    expect((await otherClient.get(`/api/projects/${projectId}/exports/report.pdf`)).status).toBe(404)
    expect((await request(server.baseUrl).get(`/api/projects/${projectId}/exports/diagram.svg`)).status).toBe(401)
  })
})

describe('POST /api/projects/:id/design/import', () => {
  it('replaces the design with a valid file', async () => {
    const id = await createProject(server.db, org, { nominalVoltageV: 24 })
    const res = await designer.post(`/api/projects/${id}/design/import`, demo)
    expect(res.status).toBe(200)
    const after = await designer.get(`/api/projects/${id}/design`)
    expect(after.body.design).toEqual(demo)
  })

  it('answers 400 with every field path and changes nothing for a bad file', async () => {
    const id = await createProject(server.db, org, { nominalVoltageV: 24, document: demo })
    const before = (await designer.get(`/api/projects/${id}/design`)).body
    const broken = structuredClone(demo) as unknown as { parts: { params: Record<string, unknown> }[]; conductors: { lengthM: unknown }[] }
    broken.parts[5].params.capacityAh = -3
    broken.conductors[2].lengthM = 'long'
    const res = await designer.post(`/api/projects/${id}/design/import`, broken)
    expect(res.status).toBe(400)
    const paths = res.body.error.fields.map((f: { path: string }) => f.path)
    expect(paths).toEqual(expect.arrayContaining(['parts[5].params.capacityAh', 'conductors[2].lengthM']))
    const after = (await designer.get(`/api/projects/${id}/design`)).body
    expect(after).toEqual(before)
  })

  it('is for designers and owners only', async () => {
    expect((await client.post(`/api/projects/${projectId}/design/import`, demo)).status).toBe(403)
  })
})
