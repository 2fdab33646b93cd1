import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { isDiskOrReadOnly } from '../../server/middleware/error-handler';
import { createTestApp, type TestApp } from '../helpers/test-app';

// The audit row is written inside every write's transaction; failing it the way the SQLite driver
// does stands in for a disk that stops accepting writes part-way through a request.
const failure = vi.hoisted(() => ({ code: '' }));
vi.mock('../../server/audit/audit.repo', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../server/audit/audit.repo')>();
  const fail = () => {
    if (!failure.code) return;
    throw Object.assign(new Error(`${failure.code}: disk I/O error`), { code: failure.code });
  };
  return {
    ...real,
    writeAudit: async (...args: Parameters<typeof real.writeAudit>) => {
      fail();
      return real.writeAudit(...args);
    },
    auditOf:
      (targetType: string) =>
      async (...args: Parameters<ReturnType<typeof real.auditOf>>) => {
        fail();
        return real.auditOf(targetType)(...args);
      },
  };
});

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('a write that meets an I/O error', () => {
  it.each(['SQLITE_IOERR_WRITE', 'SQLITE_IOERR_FSYNC', 'SQLITE_FULL', 'SQLITE_READONLY_DBMOVED', 'ENOSPC', 'EROFS'])(
    'answers 503 with the one error shape for %s, saves nothing, and the next request is served',
    async (code) => {
      const engineer = await t.signIn('engineer');
      failure.code = code;
      const res = await engineer.post('/api/sites').send({ name: `Site during ${code}`, data: {} });
      failure.code = '';
      expect(res.status).toBe(503);
      expect(res.body).toEqual({ code: 'storage_unavailable', message: 'Storage is unavailable (full or read-only); nothing was saved' });
      expect(
        await t
          .db('sites')
          .where({ name: `Site during ${code}` })
          .first(),
      ).toBeUndefined();
      expect((await engineer.get('/api/sites')).status).toBe(200);
    },
  );

  it('still answers 500 for errors that are not about storage', () => {
    for (const code of ['SQLITE_CONSTRAINT', 'SQLITE_ERROR', 'SQLITE_IOERRX', 'ECONNRESET', undefined])
      expect(isDiskOrReadOnly({ code })).toBe(false);
  });
});
