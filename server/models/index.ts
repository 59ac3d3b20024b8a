// Every model, registered with the one Sequelize instance. Later areas add theirs here.
export { Brewery } from './brewery';
export { User } from './user';
export { Invite } from './invite';
export { AuditEvent } from './audit-event';
export { Session } from './session';
