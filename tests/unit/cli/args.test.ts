import { describe, expect, it } from 'vitest'
import { parseAnalyzeArgs } from '../../../server/cli/args'

describe('parseAnalyzeArgs', () => {
  it.each([
    [['d.json'], { file: 'd.json', scenario: undefined, json: false }],
    [['d.json', '--json'], { file: 'd.json', scenario: undefined, json: true }],
    [['--scenario', 'Pump start', 'd.json'], { file: 'd.json', scenario: 'Pump start', json: false }],
    [['d.json', '--scenario=noon'], { file: 'd.json', scenario: 'noon', json: false }],
    [['--', 'd.json'], { file: 'd.json', scenario: undefined, json: false }],
  ])('%j', (argv, args) => {
    expect(parseAnalyzeArgs(argv)).toEqual({ ok: true, help: false, args })
  })

  it.each([
    [[], 'Give the design file to analyse'],
    [['a.json', 'b.json'], 'Give one design file (got 2: a.json, b.json)'],
    [['d.json', '--scenario'], '--scenario needs a scenario id or name'],
    [['d.json', '--scenario='], '--scenario needs a scenario id or name'],
    [['d.json', '--scenario', 'a', '--scenario', 'b'], '--scenario may be given once'],
    [['d.json', '--verbose'], 'Unknown option --verbose'],
  ])('refuses %j', (argv, message) => {
    expect(parseAnalyzeArgs(argv)).toEqual({ ok: false, message })
  })

  it('answers --help before anything else', () => {
    expect(parseAnalyzeArgs(['--json', '-h'])).toEqual({ ok: true, help: true })
  })
})
