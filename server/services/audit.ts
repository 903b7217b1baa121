import type { Transaction } from 'sequelize';
import { AuditEvent } from '../models/index.ts';

/** What happened, to what, by whom. */
export interface AuditProps {
  /** The user who acted; null for the system or an anonymous visitor. */
  actorId: string | null;
  /** A dotted verb, e.g. `user.invited`, `auth.signed_in`. */
  action: string;
  subjectType?: string;
  subjectId?: string;
  data?: Record<string, unknown>;
  ip?: string;
}

/** Appends an audit event, inside the caller's transaction when given. */
export async function recordAudit(props: AuditProps, transaction?: Transaction): Promise<void> {
  await AuditEvent.create(
    {
      actorId: props.actorId,
      action: props.action,
      subjectType: props.subjectType ?? null,
      subjectId: props.subjectId ?? null,
      data: props.data ?? {},
      ip: props.ip ?? null,
    },
    { transaction },
  );
}
