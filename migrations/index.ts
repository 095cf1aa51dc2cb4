import type { QueryInterface } from 'sequelize';
import * as coreTables from './001-core-tables';
import * as guides from './002-guides';
import * as accounts from './003-accounts';
import * as authAdapter from './004-auth-adapter';
import * as forum from './005-forum';
import * as moderation from './006-moderation';
import * as fieldLog from './007-field-log';
import * as mail from './008-mail';
import * as listIndexes from './009-list-indexes';
import * as rateLimits from './010-rate-limits';
import * as sessionVersion from './011-session-version';
import * as whatFixedIt from './012-what-fixed-it';
import * as safetyCheckText from './013-safety-check-text';
import * as appeals from './014-appeals';
import * as hiddenReasonLength from './015-hidden-reason-length';
import * as sites from './016-sites';
import * as listCounts from './017-list-counts';
import * as idempotencyKeys from './020-idempotency-keys';

type Step = (params: { context: QueryInterface }) => Promise<void>;

/**
 * Every migration in order. Listed here rather than globbed so the same list runs
 * under tsx, vitest and any bundler. Never rename or reorder a landed entry.
 */
export const migrations: { name: string; up: Step; down: Step }[] = [
  { name: '001-core-tables', ...coreTables },
  { name: '002-guides', ...guides },
  { name: '003-accounts', ...accounts },
  { name: '004-auth-adapter', ...authAdapter },
  { name: '005-forum', ...forum },
  { name: '006-moderation', ...moderation },
  { name: '007-field-log', ...fieldLog },
  { name: '008-mail', ...mail },
  { name: '009-list-indexes', ...listIndexes },
  { name: '010-rate-limits', ...rateLimits },
  { name: '011-session-version', ...sessionVersion },
  { name: '012-what-fixed-it', ...whatFixedIt },
  { name: '013-safety-check-text', ...safetyCheckText },
  { name: '014-appeals', ...appeals },
  { name: '015-hidden-reason-length', ...hiddenReasonLength },
  { name: '016-sites', ...sites },
  { name: '017-list-counts', ...listCounts },
  { name: '020-idempotency-keys', ...idempotencyKeys },
];
