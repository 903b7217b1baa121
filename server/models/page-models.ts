import type { Sequelize } from 'sequelize';
import { Page } from './page.ts';
import { PageComment } from './page-comment.ts';
import { PageNumberFlag } from './page-number-flag.ts';
import { PageRevision } from './page-revision.ts';
import { PageSignoff } from './page-signoff.ts';
import { PageVersionGroup } from './page-version-group.ts';
import { User } from './user.ts';

export { Page, PageComment, PageNumberFlag, PageRevision, PageSignoff, PageVersionGroup };

/** Binds the object-page models and their associations; called once from initModels. */
export function initPageModels(sequelize: Sequelize): void {
  for (const model of [Page, PageRevision, PageSignoff, PageComment, PageNumberFlag, PageVersionGroup])
    model.initModel(sequelize);

  // associations
  PageComment.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
}
