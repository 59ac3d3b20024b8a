// An audited change and its audit row are one transaction: when the record cannot be written, the change is undone.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { AuditEvent, Brewery, Ingredient, User } from '../../server/models';
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

  it('a removed ingredient and a changed role stay as they were when their audit row fails', async () => {
    const t = await createTestBrewery();
    const hop = await t.as.head_brewer
      .post('/api/ingredients')
      .send({ kind: 'hop', name: 'Harbour Gold', alphaAcidPct: 9.5, notes: '' });
    expect(hop.status).toBe(201);
    vi.spyOn(AuditEvent, 'create').mockRejectedValueOnce(new Error('audit insert failed'));
    expect((await t.as.head_brewer.delete(`/api/ingredients/${hop.body.id}`)).status).toBe(500);
    expect(await Ingredient.count({ where: { id: hop.body.id } })).toBe(1);

    const assistant = t.users.assistant_brewer;
    vi.spyOn(AuditEvent, 'create').mockRejectedValueOnce(new Error('audit insert failed'));
    const role = await t.as.head_brewer.patch(`/api/team/${assistant.id}`).send({ role: 'taproom_manager' });
    expect(role.status).toBe(500);
    expect((await User.findByPk(assistant.id))!.role).toBe('assistant_brewer');
    // The assistant's session was not ended either: it still answers.
    expect((await t.as.assistant_brewer.get('/api/auth/me')).status).toBe(200);
  });
});
