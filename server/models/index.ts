// Every model, registered with the one Sequelize instance. Later areas add theirs here.
export { Brewery } from './brewery';
export { User } from './user';
export { Invite } from './invite';
export { AuditEvent } from './audit-event';
export { Session } from './session';
export { EquipmentProfile } from './equipment-profile';
export { Ingredient } from './ingredient';
export { Recipe } from './recipe';
export { RecipeVersion } from './recipe-version';
export { Batch } from './batch';
export { Vessel } from './vessel';
export { BatchLogEntry } from './batch-log-entry';
export { IdempotencyKey } from './idempotency-key';
export { TastingNote } from './tasting-note';
export { Attachment } from './attachment';
export { Release } from './release';
