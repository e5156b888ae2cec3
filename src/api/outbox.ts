import type { OutboxMessage } from '@shared/api/members.schemas'
import { http } from './http'

export const listOutbox = () => http.get<OutboxMessage[]>('/outbox')
