// The API as its own process for the fault scripts and the benchmark (see scripts/fault-harness.ts).
// `--seed N` first creates a brewery with one person per role and N planned batches, and prints them.
import { randomBytes } from 'node:crypto';
import { env } from '../server/config/env';
import { sequelize } from '../server/config/database';
import { User } from '../server/models';
import { createBrewery } from '../server/services/auth';
import { hashPassword } from '../server/services/passwords';
import { createBatchFromPlan } from '../server/services/batches';
import { computeRecipe } from '../shared/brewing';
import { EXAMPLE_IPA, PILOT_SYSTEM } from '../shared/brewing/example-recipes';
import { startServer } from '../server/index';
import type { Role } from '../shared/schemas/roles';

async function seed(batches: number) {
  const password = `fault-${randomBytes(9).toString('base64url')}-harbour`;
  const passwordHash = await hashPassword(password);
  const tag = randomBytes(4).toString('hex');
  return sequelize.transaction(async (transaction) => {
    const brewery = await createBrewery(
      { name: `Fault brewery ${tag}`, unitSystem: 'us', timeZone: 'UTC' },
      transaction,
    );
    const emails = {} as Record<Role, string>;
    const ids = {} as Record<Role, number>;
    for (const role of ['head_brewer', 'assistant_brewer', 'taproom_manager'] as Role[]) {
      const user = await User.create(
        {
          breweryId: brewery.id,
          email: `${role}.${tag}@fault.example`,
          displayName: `${role} ${tag}`,
          role,
          passwordHash,
          disabledAt: null,
        },
        { transaction },
      );
      emails[role] = user.email;
      ids[role] = user.id;
    }
    const plan = {
      recipeName: EXAMPLE_IPA.name,
      equipmentName: PILOT_SYSTEM.name,
      equipment: PILOT_SYSTEM,
      recipe: EXAMPLE_IPA,
      computed: computeRecipe(EXAMPLE_IPA, PILOT_SYSTEM),
    };
    const batchIds: number[] = [];
    for (let i = 0; i < batches; i++) {
      const batch = await createBatchFromPlan(
        { id: ids.head_brewer, breweryId: brewery.id },
        plan,
        { brewDate: '2026-11-30' },
        transaction,
      );
      batchIds.push(batch.id);
    }
    return { breweryId: brewery.id, emails, password, batchIds };
  });
}

const seedAt = process.argv.indexOf('--seed');
const seeded = seedAt > 0 ? await seed(Number(process.argv[seedAt + 1])) : {};
await startServer({ serveClient: false });
console.log(`READY ${JSON.stringify({ port: env.PORT, ...seeded })}`);
