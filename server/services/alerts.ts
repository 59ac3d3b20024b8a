/**
 * Cellar alerts for the brewers: the D-rest trigger crossed, gravity not falling over a day (shared/brewing's
 * stall rule), no reading for the plan's interval. The first two are raised once per batch, "no reading" once per
 * lapse (a unique index on batch, kind and occasion), shown in the app and e-mailed to every role the access
 * policy lets read cellar alerts.
 */
import { Op, QueryTypes, UniqueConstraintError } from 'sequelize';
import { sequelize } from '../config/database';
import { Alert, Batch, BatchLogEntry, GravityReading, IN_FORCE, readingInForce, User } from '../models';
import { notFound } from '../errors';
import { rolesFor } from '../../shared/policy';
import { sendMail, publicLink } from './mail';
import { logger } from '../logger';
import { cellarPlanFor, cellarPlansFor } from './cellar/plans';
import {
  crossesDRestTrigger,
  dRestTriggerSg,
  gravityStalled,
  readingOverdue,
  STALL_MAX_FALL_POINTS,
  STALL_WINDOW_HOURS,
} from '../../shared/brewing';
import type { AlertKind, AlertView } from '../../shared/schemas/cellar';

const sg3 = (sg: number) => sg.toFixed(3);

/** Raises an alert unless this batch already has one of this kind for this occasion; e-mails it when new. */
async function raise(batch: Batch, kind: AlertKind, message: string, occasion = ''): Promise<boolean> {
  let alert: Alert;
  try {
    alert = await Alert.create({
      breweryId: batch.breweryId,
      batchId: batch.id,
      kind,
      occasion,
      message,
      emailedAt: null,
      readAt: null,
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) return false; // already raised: sent once only
    throw error;
  }
  await emailAlert(alert, batch).catch((err: unknown) => {
    // The reading is saved and the alert shows in the app; the sweep sends the e-mail later.
    logger.error({ err, alertId: alert.id }, 'alert e-mail failed');
  });
  return true;
}

/** E-mails everyone of the brewery whose role reads cellar alerts, then marks the alert sent. */
async function emailAlert(alert: Alert, batch: Batch): Promise<void> {
  const readers = await User.findAll({
    where: { breweryId: batch.breweryId, role: { [Op.in]: rolesFor('cellar.alerts') }, disabledAt: null },
  });
  for (const person of readers) {
    await sendMail({
      to: person.email,
      subject: `Batch ${batch.number} ${batch.beerName}: ${alert.message}`,
      text: `${alert.message}\n\nBatch ${batch.number} (${batch.beerName}).\nOpen its cellar page: ${publicLink(`/cellar/batches/${batch.id}`)}\n\n— Kettlewright`,
    });
  }
  await alert.update({ emailedAt: new Date() });
}

/** Checks a batch's readings against its plan after new readings arrive. */
export async function evaluateReadingAlerts(breweryId: number, batchId: number): Promise<void> {
  const batch = await Batch.findOne({ where: { id: batchId, breweryId } });
  if (!batch || batch.status !== 'fermenting') return;
  const plan = await cellarPlanFor(batch);
  const trigger = dRestTriggerSg(plan.plannedFg, plan.dRestPoints);
  const readings = await GravityReading.findAll({
    where: { batchId, [Op.and]: [IN_FORCE] },
    order: [
      ['takenAt', 'ASC'],
      ['id', 'ASC'],
    ],
    attributes: ['sg', 'takenAt'],
  });
  const dRestLogged = await BatchLogEntry.count({ where: { batchId, kind: 'action', stepKey: 'd_rest' } });

  const crossing = readings.findIndex((r, i) =>
    crossesDRestTrigger(i === 0 ? null : readings[i - 1]!.sg, r.sg, trigger),
  );
  if (crossing >= 0 && !dRestLogged) {
    await raise(
      batch,
      'd_rest',
      `Gravity ${sg3(readings[crossing]!.sg)} reached the D-rest trigger (${sg3(trigger)}): start the D-rest`,
    );
  }
  const points = readings.map((r) => ({ atMs: r.takenAt.getTime(), sg: r.sg }));
  if (gravityStalled(points, trigger)) {
    await raise(
      batch,
      'stalled',
      `Gravity has fallen no more than ${STALL_MAX_FALL_POINTS} point in ${STALL_WINDOW_HOURS} hours (${sg3(readings[readings.length - 1]!.sg)}), above the D-rest trigger`,
    );
  }
}

/**
 * Raises "no reading" alerts for fermenting batches whose last reading is older than their plan allows,
 * and sends any alert whose e-mail failed before.
 */
export async function sweepOverdueReadings(now = new Date()): Promise<number> {
  // A minute's grace, so an alert whose e-mail is being sent right now is not sent twice.
  for (const alert of await Alert.findAll({
    where: { emailedAt: null, createdAt: { [Op.lt]: new Date(Date.now() - 60_000) } },
  })) {
    const batch = await Batch.findByPk(alert.batchId);
    if (batch) await emailAlert(alert, batch);
  }
  const batches = await Batch.findAll({ where: { status: 'fermenting' } });
  if (batches.length === 0) return 0;
  const timeByBatch = async (sql: string) => {
    const rows = await sequelize.query<{ batchId: number; at: Date }>(sql, {
      type: QueryTypes.SELECT,
      replacements: { ids: batches.map((b) => b.id) },
    });
    return new Map(rows.map((r) => [Number(r.batchId), new Date(r.at)]));
  };
  const [lastReadings, knockouts] = await Promise.all([
    timeByBatch(`SELECT g.batch_id AS batchId, MAX(g.taken_at) AS at FROM gravity_readings g
                  WHERE g.batch_id IN (:ids) AND ${readingInForce('g')} GROUP BY g.batch_id`),
    timeByBatch(`SELECT batch_id AS batchId, MIN(captured_at) AS at FROM batch_log_entries
                  WHERE batch_id IN (:ids) AND step_key = 'knockout-end' GROUP BY batch_id`),
  ]);
  const plans = await cellarPlansFor(batches);
  let raised = 0;
  for (const batch of batches) {
    const plan = plans.get(batch.id)!;
    // Without a reading yet, the wait runs from knockout (or, with no knockout logged, from the batch's last change).
    const since = lastReadings.get(batch.id) ?? knockouts.get(batch.id) ?? batch.updatedAt;
    if (readingOverdue(since.getTime(), now.getTime(), plan.readingIntervalHours)) {
      // Once per lapse: the next reading starts a new one.
      if (
        await raise(
          batch,
          'overdue',
          `No gravity reading for over ${plan.readingIntervalHours} hours`,
          since.toISOString(),
        )
      )
        raised += 1;
    }
  }
  return raised;
}

/** The brewery's alerts, newest first (unread first). */
export async function listAlerts(breweryId: number): Promise<AlertView[]> {
  const alerts = await Alert.findAll({
    where: { breweryId },
    order: [
      ['readAt', 'ASC'],
      ['createdAt', 'DESC'],
    ],
    limit: 100,
  });
  const batches = await Batch.findAll({
    where: { id: { [Op.in]: [...new Set(alerts.map((a) => a.batchId))] } },
    attributes: ['id', 'number', 'beerName'],
  });
  const byId = new Map(batches.map((b) => [b.id, b]));
  return alerts.map((a) => ({
    id: a.id,
    batchId: a.batchId,
    batchNumber: byId.get(a.batchId)?.number ?? '',
    beerName: byId.get(a.batchId)?.beerName ?? '',
    kind: a.kind,
    message: a.message,
    createdAt: a.createdAt.toISOString(),
    readAt: a.readAt ? a.readAt.toISOString() : null,
  }));
}

export async function markAlertRead(breweryId: number, id: number): Promise<void> {
  const alert = await Alert.findOne({ where: { id, breweryId } });
  if (!alert) throw notFound('This alert');
  if (!alert.readAt) await alert.update({ readAt: new Date() });
}
