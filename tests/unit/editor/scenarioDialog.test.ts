// @vitest-environment happy-dom
// The scenario dialog: add, rename, duplicate and delete scenarios (never the last), set sun,
// charging and motor start, and what runs at which level. Every accepted edit lands in the Y.Doc as
// one undo step; a refused one shows the shared schema's message and leaves the Y.Doc as it was.
import { flushPromises, type DOMWrapper } from '@vue/test-utils'
import type * as Y from 'yjs'
import { afterEach, describe, expect, it } from 'vitest'
import { createDemoDesign } from '@shared/design/demo'
import type { Design, Scenario } from '@shared/design/schema'
import ScenarioDialog from '@/components/editor/ScenarioDialog.vue'
import EditorToolbar from '@/components/editor/EditorToolbar.vue'
import type { useDesignEditorStore } from '@/stores/designEditor'
import { mountEditor } from './mountEditor'

type Store = ReturnType<typeof useDesignEditorStore>

// happy-dom has no visualViewport, which Vuetify's overlays listen to; a still viewport stands in.
if (!(globalThis as { visualViewport?: unknown }).visualViewport) {
  const still = Object.assign(new EventTarget(), { width: 1280, height: 720, scale: 1, offsetLeft: 0, offsetTop: 0 })
  Object.defineProperty(globalThis, 'visualViewport', { value: still, configurable: true, writable: true })
}

let unmount: (() => void) | undefined
afterEach(() => {
  unmount?.()
  document.body.innerHTML = ''
})

/** The scenarios as the shared document holds them (what co-editors and the analysis get). */
const yScenarios = (store: Store) => store.handle!.doc.getArray<Y.Map<unknown>>('scenarios').toJSON() as Scenario[]

async function openDialog(design: Design = createDemoDesign()) {
  const mounted = mountEditor(ScenarioDialog, () => ({ modelValue: true }), design)
  unmount = () => mounted.wrapper.unmount()
  await flushPromises()
  return mounted
}

// The dialog is teleported to the overlay container, outside the wrapper.
const dialog = () => document.querySelector('[data-testid="scenario-dialog"]') as HTMLElement | null
const q = <T extends Element = HTMLElement>(selector: string) => dialog()!.querySelector(selector) as T

async function typeInto(input: HTMLInputElement, text: string) {
  input.value = text
  input.dispatchEvent(new Event('input', { bubbles: true }))
  input.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true }))
  await flushPromises()
}
const nameInput = () => q<HTMLInputElement>('[data-field="scenario-name"] input')
const fieldMessage = (selector: string) => q(selector).closest('.v-input')?.querySelector('.v-messages')?.textContent?.trim() ?? ''

describe('scenario dialog', () => {
  it('lists the scenarios and adds one with loads and inverters running at full level', async () => {
    const { store } = await openDialog()
    const listed = [...dialog()!.querySelectorAll('[data-scenario-id]')].map((el) => el.textContent)
    expect(listed.join('|')).toContain('Night, all loads')
    expect(listed).toHaveLength(3)

    q('[data-testid="scenario-add"]').click()
    await flushPromises()
    const added = yScenarios(store)[3]
    expect(added.name).toBe('New scenario')
    expect(added.sunOn).toBe(false)
    // The demo's loads and its inverter run at 100 %; its chargers are not listed (off).
    const switchedOn = store.design!.parts.filter((p) => p.type === 'load' || p.type === 'inverter').map((p) => p.id)
    expect(Object.keys(added.loads).sort()).toEqual(switchedOn.sort())
    expect(Object.values(added.loads).every((l) => l.on && l.level === 1)).toBe(true)
    // The new scenario is the one being edited.
    expect(nameInput().value).toBe('New scenario')
    store.handle!.undo()
    expect(yScenarios(store)).toHaveLength(3)
  })

  it('renames; an empty or already used name shows its message and changes nothing', async () => {
    const { store } = await openDialog()
    await typeInto(nameInput(), '  ')
    expect(fieldMessage('[data-field="scenario-name"]')).toBe('Enter the scenario name')
    await typeInto(nameInput(), 'noon, CHARGING')
    expect(fieldMessage('[data-field="scenario-name"]')).toBe('Another scenario is already called "Noon, charging"')
    expect(yScenarios(store)[0].name).toBe('Night, all loads')

    await typeInto(nameInput(), 'Night at anchor')
    expect(yScenarios(store)[0].name).toBe('Night at anchor')
    expect(dialog()!.textContent).toContain('Night at anchor')
    store.handle!.undo()
    expect(yScenarios(store)[0].name).toBe('Night, all loads')
  })

  it('turns a load off, sets a level in per cent and refuses a level above 100 %', async () => {
    const { store } = await openDialog()
    const pumpOn = q<HTMLInputElement>('[data-load-on="water-pump"] input')
    expect(pumpOn.checked).toBe(true)
    pumpOn.click()
    await flushPromises()
    expect(yScenarios(store)[0].loads['water-pump']).toEqual({ on: false, level: 1 })

    // The demo's inverter runs at 50 % in the first scenario.
    const inverterLevel = q<HTMLInputElement>('[data-load-level="inverter"] input')
    expect(inverterLevel.value).toBe('50')
    await typeInto(inverterLevel, '150')
    expect(fieldMessage('[data-load-level="inverter"] input')).toBe('Load level must be at most 100 %')
    expect(yScenarios(store)[0].loads.inverter).toEqual({ on: true, level: 0.5 })
    await typeInto(q<HTMLInputElement>('[data-load-level="inverter"] input'), 'lots')
    expect(fieldMessage('[data-load-level="inverter"] input')).toBe('Enter a number, e.g. 12.5')
    await typeInto(q<HTMLInputElement>('[data-load-level="inverter"] input'), '75')
    expect(yScenarios(store)[0].loads.inverter).toEqual({ on: true, level: 0.75 })
  })

  it('sets sun, mains charging and motor start', async () => {
    const { store } = await openDialog()
    for (const flag of ['sunOn', 'chargerOn', 'motorStart'] as const) {
      q<HTMLInputElement>(`[data-flag="${flag}"] input`).click()
      await flushPromises()
      expect(yScenarios(store)[0][flag]).toBe(true)
    }
    store.handle!.undo()
    expect(yScenarios(store)[0].motorStart).toBeFalsy()
    expect(yScenarios(store)[0].chargerOn).toBe(true)
  })

  it('duplicates after the original and deletes, but never the last scenario', async () => {
    const { store } = await openDialog()
    q('[data-testid="scenario-duplicate"]').click()
    await flushPromises()
    const copy = yScenarios(store)[1]
    expect(copy.name).toBe('Night, all loads (copy)')
    expect(copy.loads).toEqual(yScenarios(store)[0].loads)
    expect(copy.id).not.toBe(yScenarios(store)[0].id)

    for (let left = 4; left > 1; left--) {
      q('[data-testid="scenario-delete"]').click()
      await flushPromises()
      expect(yScenarios(store)).toHaveLength(left - 1)
    }
    expect(q<HTMLButtonElement>('[data-testid="scenario-delete"]').disabled).toBe(true)
    // The shown scenario was deleted: the toolbar falls back to what remains (checked below);
    // undo brings the deleted ones back one step at a time.
    store.handle!.undo()
    expect(yScenarios(store)).toHaveLength(2)
  })
})

describe('scenario editing for read-only roles', () => {
  const toolbarProps = (canEdit: boolean, store: Store) => ({
    projectId: 'p1', designName: 'Demo', canUndo: false, canRedo: false, canEdit, selectedParts: 0,
    saveState: canEdit ? 'saved' : 'read-only', unitSystem: 'metric',
    scenarios: store.design!.scenarios.map((s) => ({ id: s.id, name: s.name })),
    scenarioId: store.scenarioId, 'onUpdate:scenarioId': (id: string | null) => (store.scenarioId = id),
    snapToGrid: true,
  })

  it('offers no way into the dialog without the right to edit, and follows a removed scenario', async () => {
    const readOnly = mountEditor(EditorToolbar, (store) => toolbarProps(false, store), createDemoDesign())
    unmount = () => readOnly.wrapper.unmount()
    await flushPromises()
    expect(readOnly.wrapper.find('[data-testid="edit-scenarios"]').exists()).toBe(false)
    expect(readOnly.wrapper.find('[data-testid="scenario-select"]').exists()).toBe(true)
    unmount()

    const editor = mountEditor(EditorToolbar, (store) => toolbarProps(true, store), createDemoDesign())
    unmount = () => editor.wrapper.unmount()
    await flushPromises()
    const button: DOMWrapper<Element> = editor.wrapper.find('[data-testid="edit-scenarios"]')
    expect(button.exists()).toBe(true)
    await button.trigger('click')
    await flushPromises()
    expect(dialog()).not.toBeNull()
    // Deleting the scenario shown moves the toolbar to the first remaining one.
    expect(editor.store.scenarioId).toBe('night-all-loads')
    q('[data-testid="scenario-delete"]').click()
    await flushPromises()
    expect(editor.store.scenarioId).toBe('noon-charging')
  })
})
