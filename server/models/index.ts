// Model registry: every model is initialised on a Sequelize instance before use.
import type { Sequelize } from 'sequelize';
import { User, initUser } from './user';
import { Team, initTeam } from './team';
import { Membership, initMembership } from './membership';
import { Invitation, initInvitation } from './invitation';
import { AccountToken, initAccountToken } from './account-token';

export { User, Team, Membership, Invitation, AccountToken };

export function initModels(sequelize: Sequelize): void {
  initUser(sequelize);
  initTeam(sequelize);
  initMembership(sequelize);
  initInvitation(sequelize);
  initAccountToken(sequelize);
  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Membership.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
  Invitation.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
  Invitation.belongsTo(User, { foreignKey: 'invitedBy', as: 'inviter' });
}
