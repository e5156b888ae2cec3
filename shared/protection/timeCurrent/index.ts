export { deviceBand } from './deviceBand'
export { opensWithin, doesNotOpen, type DeviceRef } from './opening'
export { TIME_CURRENT_FAMILIES, TIME_CURRENT_FAMILY_IDS, getTimeCurrentFamily, hasTimeCurrentModel } from './families'
export type * from './types'
