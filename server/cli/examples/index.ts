import { createDemoDesign } from '../../../shared/design/demo'
import { badDesign, floatingPart } from './faulty'
import { sailboat24V } from './sailboat'
import { smallVan12V } from './smallVan'

/** Every file in examples/ and the code that produces it (server/cli/write-examples.ts writes them). */
export const EXAMPLE_FILES: Record<string, () => unknown> = {
  'demo-expedition-truck.json': createDemoDesign,
  'small-van-12v.json': smallVan12V,
  'sailboat-24v.json': sailboat24V,
  'bad-design.json': badDesign,
  'floating-part.json': floatingPart,
}
