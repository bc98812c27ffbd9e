import "server-only";
import type { Database, Transaction } from "@/db/client";
import { auditLog } from "@/db/schema";

export type AuditAction =
  | "auth.sign_in"
  | "auth.sign_in_failed"
  | "auth.sign_out"
  | "auth.sign_up"
  | "auth.password_reset"
  | "members.invite"
  | "members.join"
  | "members.role_change"
  | "members.remove"
  | "projects.create"
  | "projects.update"
  | "layouts.save"
  | "layouts.restore"
  | "scenarios.save"
  | "seats.assign"
  | "catalogue.import"
  | "catalogue.delete";

export interface AuditEntry {
  organisationId: string | null;
  actorId: string | null;
  action: AuditAction;
  targetType?: string;
  targetId?: string;
  details?: Record<string, unknown>;
  success?: boolean;
}

/** Appends to the audit log; pass the transaction of the change it records so both land together. */
export async function recordAudit(db: Database | Transaction, entry: AuditEntry): Promise<void> {
  await db.insert(auditLog).values({
    organisationId: entry.organisationId,
    actorId: entry.actorId,
    action: entry.action,
    targetType: entry.targetType ?? null,
    targetId: entry.targetId ?? null,
    details: entry.details ?? null,
    success: entry.success ?? true,
  });
}
