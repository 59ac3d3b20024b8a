// The demo brewery: an invented harbour-town brewpub. Every name and number here is made up.
import { sequelize } from '../config/database';
import { User } from '../models';
import { createBrewery } from '../services/auth';
import { hashPassword } from '../services/passwords';
import type { Role } from '../../shared/schemas/roles';
import type { DemoContext } from './context';
import { seedRecipes } from './recipes';
import { seedBatches } from './batches';
import { seedCellar } from './cellar';
import { seedTaproom } from './taproom';

export const DEMO_PASSWORD = 'harbour-copper-kettle-72';

export const DEMO_PEOPLE: { email: string; displayName: string; role: Role }[] = [
  { email: 'maren@tidewrack.example', displayName: 'Maren Holt', role: 'head_brewer' },
  { email: 'ilya@tidewrack.example', displayName: 'Ilya Brandt', role: 'assistant_brewer' },
  { email: 'priya@tidewrack.example', displayName: 'Priya Okafor', role: 'taproom_manager' },
];

/** Steps later areas add to fill the demo brewery (recipes, batches, cellar...). They run once, in order. */
export const demoSteps: ((ctx: DemoContext) => Promise<void>)[] = [seedRecipes, seedBatches, seedCellar, seedTaproom];

/** Seeds the demo brewery once; returns false when it is already there. */
export async function seedDemo(): Promise<boolean> {
  if (await User.findOne({ where: { email: DEMO_PEOPLE[0]!.email } })) return false;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await sequelize.transaction(async (transaction) => {
    const brewery = await createBrewery(
      { name: 'Tidewrack Brewing Co.', unitSystem: 'us', timeZone: 'America/Halifax' },
      transaction,
    );
    const users = {} as Record<Role, User>;
    for (const person of DEMO_PEOPLE) {
      users[person.role] = await User.create(
        { ...person, breweryId: brewery.id, passwordHash, disabledAt: null },
        { transaction },
      );
    }
    for (const step of demoSteps) await step({ brewery, users, transaction });
  });
  return true;
}
