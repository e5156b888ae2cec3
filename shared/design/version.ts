/** The design document format this code reads and writes. Bump it only together with a migration
 * in `migrate.ts` (see docs/design-format.md, "Versioning"). */
export const DESIGN_FORMAT_VERSION = 1
export const DESIGN_FORMAT_ID = 'ampwright.design'
