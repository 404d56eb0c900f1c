import type { Sequelize } from 'sequelize';
import { Organisation } from './organisation';
import { User } from './user';
import { Job } from './job';
import { Panel } from './panel';
import { Load } from './load';
import { Revision } from './revision';
import { Comment } from './comment';
import { Activity } from './activity';
import { CatalogueItem } from './catalogue-item';
import { LabourUnit } from './labour-unit';
import { BomLineRow } from './bom-line';
import { MailMessage } from './mail-message';
import { CombinationRatingRow } from './combination-rating';
import { StoredFileRow } from './stored-file';

export function initModels(sequelize: Sequelize) {
  for (const m of [
    Organisation,
    User,
    Job,
    Panel,
    Load,
    Revision,
    Comment,
    Activity,
    CatalogueItem,
    LabourUnit,
    BomLineRow,
    MailMessage,
    CombinationRatingRow,
    StoredFileRow,
  ]) {
    m.initModel(sequelize);
  }
  Organisation.hasMany(User, { foreignKey: 'organisationId' });
  User.belongsTo(Organisation, { foreignKey: 'organisationId' });
  const scoped = [
    Job,
    Panel,
    Load,
    Revision,
    Comment,
    Activity,
    CatalogueItem,
    LabourUnit,
    BomLineRow,
    CombinationRatingRow,
    StoredFileRow,
  ] as Array<{ belongsTo: typeof Job.belongsTo }>;
  for (const m of scoped) m.belongsTo.call(m as typeof Job, Organisation, { foreignKey: 'organisationId' });
  // A model's class imports only the models its foreign keys point to (load -> panel -> job), so the
  // models import one way; the has-many sides exist here, for queries, and are not declared on the parent.
  Job.hasMany(Panel, { foreignKey: 'jobId', as: 'panels' });
  Panel.belongsTo(Job, { foreignKey: 'jobId', as: 'job' });
  Panel.hasMany(Load, { foreignKey: 'panelId', as: 'loads' });
  Load.belongsTo(Panel, { foreignKey: 'panelId' });
  Panel.hasMany(Revision, { foreignKey: 'panelId', as: 'revisions' });
  Revision.belongsTo(Panel, { foreignKey: 'panelId' });
  Panel.hasMany(Comment, { foreignKey: 'panelId', as: 'comments' });
  Comment.belongsTo(Panel, { foreignKey: 'panelId' });
  Comment.belongsTo(User, { foreignKey: 'userId', as: 'author' });
  Activity.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Panel.hasMany(BomLineRow, { foreignKey: 'panelId', as: 'bomLines' });
  BomLineRow.belongsTo(Panel, { foreignKey: 'panelId' });
}
