import type { QueryInterface } from 'sequelize';
import * as m0001 from './20261201-0001-platform';
import * as m0002 from './20261201-0002-boats-and-plans';
import * as m0003 from './20261201-0003-knowledge';
import * as m0004 from './20261201-0004-exchange';
import * as m0005 from './20261201-0005-dues';
import * as m0006 from './20261202-0006-plan-kinds';
import * as m0007 from './20261202-0007-topics-retired';
import * as m0008 from './20261202-0008-listings-updated-ms';
import * as m0009 from './20261202-0009-notification-digest';
import * as m0020 from './20261202-0020-post-revisions';
import * as m0030 from './20261202-0030-storm-watch';
import * as m0040 from './20261202-0040-cluster-state';
import * as m0041 from './20261202-0041-uploaded-images';
import * as m0050 from './20261203-0050-refund-returned-by';
import * as m0055 from './20261203-0055-moderation-decisions';

export interface MigrationModule {
  up: (p: { context: QueryInterface }) => Promise<void>;
  down: (p: { context: QueryInterface }) => Promise<void>;
}

/** Every migration, in order. Add new files here; never edit or reorder one that has shipped. */
export const MIGRATIONS: Array<[name: string, module: MigrationModule]> = [
  ['20261201-0001-platform', m0001],
  ['20261201-0002-boats-and-plans', m0002],
  ['20261201-0003-knowledge', m0003],
  ['20261201-0004-exchange', m0004],
  ['20261201-0005-dues', m0005],
  ['20261202-0006-plan-kinds', m0006],
  ['20261202-0007-topics-retired', m0007],
  ['20261202-0008-listings-updated-ms', m0008],
  ['20261202-0009-notification-digest', m0009],
  ['20261202-0020-post-revisions', m0020],
  ['20261202-0030-storm-watch', m0030],
  ['20261202-0040-cluster-state', m0040],
  ['20261202-0041-uploaded-images', m0041],
  ['20261203-0050-refund-returned-by', m0050],
  ['20261203-0055-moderation-decisions', m0055],
];
