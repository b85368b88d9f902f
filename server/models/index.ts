// Model registry: every model is initialised on a Sequelize instance before use.
import type { Sequelize } from 'sequelize';
import { User, initUser } from './user';
import { Team, initTeam } from './team';
import { Membership, initMembership } from './membership';
import { Invitation, initInvitation } from './invitation';
import { AccountToken, initAccountToken } from './account-token';
import { StudyArea, initStudyArea } from './study-area';
import { CoverStateRow, initCoverState } from './cover-state';
import { StartCover, initStartCover } from './start-cover';
import { AuditEvent, initAuditEvent } from './audit-event';
import { Scenario, initScenario } from './scenario';
import { ScenarioPhaseRow, initScenarioPhase } from './scenario-phase';
import { Survey, initSurvey } from './survey';
import { SurveyFile, initSurveyFile } from './survey-file';
import { Run, initRun } from './run';
import { RunInput, initRunInput } from './run-input';
import { RunResultRow, initRunResult } from './run-result';
import { RunFrame, initRunFrame } from './run-frame';
import { Notice, initNotice } from './notice';

export { AuditEvent, User, Team, Membership, Invitation, AccountToken, StudyArea, CoverStateRow, StartCover };
export { Scenario, ScenarioPhaseRow, Survey, SurveyFile };
export { Run, RunInput, RunResultRow, RunFrame, Notice };

export function initModels(sequelize: Sequelize): void {
  initUser(sequelize);
  initTeam(sequelize);
  initMembership(sequelize);
  initInvitation(sequelize);
  initAccountToken(sequelize);
  initStudyArea(sequelize);
  initCoverState(sequelize);
  initStartCover(sequelize);
  initAuditEvent(sequelize);
  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Membership.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
  Invitation.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
  Invitation.belongsTo(User, { foreignKey: 'invitedBy', as: 'inviter' });
  StudyArea.hasMany(CoverStateRow, { foreignKey: 'studyAreaId', as: 'states' });
  StudyArea.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
  initScenario(sequelize);
  initScenarioPhase(sequelize);
  initSurvey(sequelize);
  initSurveyFile(sequelize);
  Scenario.hasMany(ScenarioPhaseRow, { foreignKey: 'scenarioId', as: 'phases' });
  Scenario.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
  Scenario.belongsTo(User, { foreignKey: 'updatedBy', as: 'updater' });
  ScenarioPhaseRow.belongsTo(Survey, { foreignKey: 'surveyId', as: 'survey' });
  Survey.hasMany(SurveyFile, { foreignKey: 'surveyId', as: 'files' });
  Survey.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
  initRun(sequelize);
  initRunInput(sequelize);
  initRunResult(sequelize);
  initRunFrame(sequelize);
  initNotice(sequelize);
  Run.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
}
