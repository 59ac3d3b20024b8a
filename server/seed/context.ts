import type { Transaction } from 'sequelize';
import type { Brewery, User } from '../models';
import type { Role } from '../../shared/schemas/roles';

/** What each demo step writes with: the demo brewery, its people by role, and the seeding transaction. */
export interface DemoContext {
  brewery: Brewery;
  users: Record<Role, User>;
  transaction: Transaction;
}
