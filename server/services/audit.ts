import type { Request } from 'express';
import { AuditEvent } from '../models';

/** Writes a security event with who, when (server clock, UTC) and from where. */
export async function recordAudit(
  req: Request,
  action: string,
  detail: Record<string, unknown> | null = null,
  who?: { userId: number | null; breweryId: number | null },
): Promise<void> {
  await AuditEvent.create({
    action,
    detail,
    userId: who ? who.userId : (req.user?.id ?? null),
    breweryId: who ? who.breweryId : (req.user?.breweryId ?? null),
    ip: req.ip ?? null,
    userAgent: req.get('user-agent')?.slice(0, 255) ?? null,
    requestId: req.id ? String(req.id) : null,
  });
}
