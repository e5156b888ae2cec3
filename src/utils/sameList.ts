/** Same length and, position by position, the same items (`same` decides; identity by default). */
export function sameList<T>(a: readonly T[], b: readonly T[], same: (x: T, y: T) => boolean = Object.is): boolean {
  if (a.length !== b.length) return false
  for (let i = 0; i < a.length; i++) if (!same(a[i], b[i])) return false
  return true
}

/** Same ids in the same order. */
export const sameIds = (a: readonly { id: string }[], b: readonly { id: string }[]) => sameList(a, b, (x, y) => x.id === y.id)
