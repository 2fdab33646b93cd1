import { describe, expect, it } from 'vitest';
import { requestLogLine } from './request-log';

describe('request log line', () => {
  it('gives the full /api path, as the caller asked for it, without the query string', () => {
    expect(requestLogLine('GET', '/api/scenarios/3?token=secret', 200, 4.26, 'person 2')).toBe('GET /api/scenarios/3 200 4.3ms person 2');
  });

  it('stays quiet for built assets and other static files', () => {
    expect(requestLogLine('GET', '/assets/index-CPPl_uva.js', 200, 1, 'anonymous')).toBeNull();
    expect(requestLogLine('GET', '/favicon.svg', 304, 1, 'anonymous')).toBeNull();
  });

  it('still logs page loads of the app and API paths that look like files', () => {
    expect(requestLogLine('GET', '/scenarios/3', 200, 2, 'person 1')).toBe('GET /scenarios/3 200 2.0ms person 1');
    expect(requestLogLine('GET', '/api/runs/5/result.json', 404, 2, 'person 1')).toBe('GET /api/runs/5/result.json 404 2.0ms person 1');
  });
});
