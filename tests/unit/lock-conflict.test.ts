import { describe, expect, it } from 'vitest';
import { isLockConflict } from '@/lib/db/errors';

describe('isLockConflict', () => {
  // MariaDB error codes: 1213 ER_LOCK_DEADLOCK, 1205 ER_LOCK_WAIT_TIMEOUT, 1062 ER_DUP_ENTRY
  // (MariaDB Knowledge Base, "MariaDB Error Codes"; from memory)
  it('knows a deadlock or lock wait timeout however deep Sequelize wraps it', () => {
    expect(isLockConflict({ name: 'SequelizeDatabaseError', parent: { errno: 1213, sqlState: '40001' } })).toBe(true);
    expect(isLockConflict({ original: { errno: 1205 } })).toBe(true);
    expect(isLockConflict({ errno: 1213 })).toBe(true);
  });
  it('leaves every other error to its caller', () => {
    expect(isLockConflict({ name: 'SequelizeUniqueConstraintError', parent: { errno: 1062 } })).toBe(false);
    expect(isLockConflict(new Error('boom'))).toBe(false);
    expect(isLockConflict(null)).toBe(false);
  });
});
