import express from 'express'
import request from 'supertest'
import { describe, expect, it } from 'vitest'
import { errorMiddleware } from '../../server/http/errors'
import { createAnalyzeRouter } from '../../server/modules/analyze/analyze.routes'
import { createDemoDesign } from '../../shared/design/demo'

// The router on a bare app (the real app mounts it at /api behind the session); the analysis is pure,
// so no database is involved.
function app() {
  const a = express()
  a.use(express.json({ limit: '5mb' }))
  a.use('/api', createAnalyzeRouter())
  a.use(errorMiddleware)
  return a
}

describe('POST /api/analyze', () => {
  it('returns every scenario, the worst-case summaries and the findings of the demo design', async () => {
    const design = createDemoDesign()
    const res = await request(app()).post('/api/analyze').send({ design })
    expect(res.status).toBe(200)
    expect(res.body.scenarios.map((s: { id: string }) => s.id)).toEqual(design.scenarios.map((s) => s.id))
    expect(res.body.conductors).toHaveLength(design.conductors.length)
    expect(res.body.findings.length).toBeGreaterThanOrEqual(2)
    for (const f of res.body.findings) expect(f).toMatchObject({ id: expect.any(String), ruleId: expect.any(String), source: expect.any(String) })
    expect(res.body.spiceNetlist).toBeUndefined()
  })

  it('limits the analysis to the scenarios asked for and adds a SPICE netlist on ?spice=', async () => {
    const design = createDemoDesign()
    const id = design.scenarios[0].id
    const res = await request(app()).post(`/api/analyze?spice=${encodeURIComponent(id)}`).send({ design, scenarioIds: [id] })
    expect(res.status).toBe(200)
    expect(res.body.scenarios).toHaveLength(1)
    expect(res.body.spiceNetlist).toMatch(/\.end\s*$/)
  })

  it('answers 400 with the field paths of an invalid design', async () => {
    const design = createDemoDesign()
    const battery = design.parts.findIndex((p) => p.type === 'battery')
    const broken = structuredClone(design) as unknown as { parts: { params: Record<string, unknown> }[] }
    broken.parts[battery].params.capacityAh = -5
    const res = await request(app()).post('/api/analyze').send({ design: broken })
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('invalid_request')
    expect(res.body.error.fields).toEqual([{ path: `design.parts[${battery}].params.capacityAh`, message: 'Capacity per battery must be at least 1 Ah' }])
  })

  it('answers 400 when the design is missing or the SPICE scenario is unknown', async () => {
    const missing = await request(app()).post('/api/analyze').send({})
    expect(missing.status).toBe(400)
    expect(missing.body.error.fields).toEqual([{ path: 'design', message: 'Send the design' }])
    const unknown = await request(app()).post('/api/analyze?spice=nope').send({ design: createDemoDesign() })
    expect(unknown.status).toBe(400)
    expect(unknown.body.error.fields).toEqual([{ path: 'spice', message: 'No scenario has the id "nope"' }])
  })
})
