// An audited change and its audit row are one transaction: when the record cannot be written, the change is undone.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { AuditEvent, Brewery } from '../../server/models';
import { createTestBrewery } from './helpers';

afterEach(() => vi.restoreAllMocks());

describe('audited writes', () => {
  it('the brewery settings are not kept when their audit row fails, and are kept with it otherwise', async () => {
    const t = await createTestBrewery();
    const before = (await Brewery.findByPk(t.brewery.id))!.name;
    // The database refusing the audit row, once (a dropped connection, a full disk...).
    vi.spyOn(AuditEvent, 'create').mockRejectedValueOnce(new Error('audit insert failed'));
    const failed = await t.as.head_brewer
      .patch('/api/brewery')
      .send({ name: 'Renamed Brewing', unitSystem: 'metric', timeZone: 'UTC' });
    expect(failed.status).toBe(500);
    expect((await Brewery.findByPk(t.brewery.id))!.name).toBe(before);

    const saved = await t.as.head_brewer
      .patch('/api/brewery')
      .send({ name: 'Renamed Brewing', unitSystem: 'metric', timeZone: 'UTC' });
    expect(saved.status).toBe(200);
    expect((await Brewery.findByPk(t.brewery.id))!.name).toBe('Renamed Brewing');
    const rows = await AuditEvent.findAll({ where: { breweryId: t.brewery.id, action: 'brewery.settings' } });
    expect(rows.map((r) => (r.detail as { name: string }).name)).toEqual(['Renamed Brewing']);
  });
});
