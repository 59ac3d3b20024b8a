import type { Request } from 'express';
import type { Transaction } from 'sequelize';
import { sequelize } from '../config/database';
import { AuditEvent } from '../models';

type Who = { userId: number | null; breweryId: number | null };

/** Writes a security event with who, when (server clock, UTC) and from where (inside `transaction` when given). */
export async function recordAudit(
  req: Request,
  action: string,
  detail: Record<string, unknown> | null = null,
  who?: Who,
  transaction?: Transaction,
): Promise<void> {
  await AuditEvent.create(
    {
      action,
      detail,
      userId: who ? who.userId : (req.user?.id ?? null),
      breweryId: who ? who.breweryId : (req.user?.breweryId ?? null),
      ip: req.ip ?? null,
      userAgent: req.get('user-agent')?.slice(0, 255) ?? null,
      requestId: typeof req.id === 'string' || typeof req.id === 'number' ? String(req.id) : null,
    },
    { transaction },
  );
}

/**
 * Makes a change and writes its audit row in one transaction: a change is never kept without its record,
 * and a failure writing the record undoes the change instead of answering 500 after it.
 */
export function withAudit<T>(
  req: Request,
  action: string,
  detail: Record<string, unknown> | null,
  change: (transaction: Transaction) => Promise<T>,
): Promise<T> {
  return sequelize.transaction(async (transaction) => {
    const result = await change(transaction);
    await recordAudit(req, action, detail, undefined, transaction);
    return result;
  });
}
