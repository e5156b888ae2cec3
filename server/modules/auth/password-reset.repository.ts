import { and, eq, gt, isNull } from 'drizzle-orm'
import type { DbOrTx } from '../../db/client'
import { passwordResets } from '../../db/schema'

export async function insertPasswordReset(db: DbOrTx, input: { userId: string; tokenHash: string; expiresAt: Date }) {
  await db.insert(passwordResets).values(input)
}

/** An unused, unexpired reset, locked until the transaction ends so it can be used only once. */
export async function lockUsablePasswordReset(db: DbOrTx, tokenHash: string) {
  const [row] = await db
    .select()
    .from(passwordResets)
    .where(
      and(eq(passwordResets.tokenHash, tokenHash), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, new Date())),
    )
    .for('update')
    .limit(1)
  return row
}

/** Marks every outstanding reset of the user used (the one just taken and any older ones). */
export async function markPasswordResetsUsed(db: DbOrTx, userId: string) {
  await db
    .update(passwordResets)
    .set({ usedAt: new Date() })
    .where(and(eq(passwordResets.userId, userId), isNull(passwordResets.usedAt)))
}
