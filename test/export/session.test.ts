import { describe, expect, it } from 'vitest';
import { parseSession, sessionJson, SESSION_FORMAT, SESSION_FORMAT_VERSION, type Session } from '../../src/export/session';

const session: Session = {
  format: SESSION_FORMAT,
  formatVersion: SESSION_FORMAT_VERSION,
  tool: { name: 'driftgrid', version: '0.1.0' },
  inputs: { occurrences: { path: '../occ.csv', sha256: 'a'.repeat(64), bytes: 12 } },
  settings: { bins: 'stages', assign: 'mid-age', seed: 1, grid: 'healpix:32', map: { taxon: 'genus' } },
  summary: { rowsRead: 3 },
};

describe('session files', () => {
  it('read back what was written', () => {
    expect(parseSession(sessionJson(session), 's.json')).toEqual(session);
  });

  it.each([
    ['not JSON', '{', /invalid JSON/],
    ['another kind of file', '{"format":"x"}', /field "format" should be "driftgrid-session"/],
    ['a newer format', JSON.stringify({ ...session, formatVersion: 99 }), /version 99 is not supported/],
    ['a bad digest', JSON.stringify({ ...session, inputs: { occurrences: { path: 'a', sha256: 'xyz', bytes: 1 } } }), /inputs\.occurrences\.sha256/],
    ['settings that are not an object', JSON.stringify({ ...session, settings: 'stages' }), /field "settings" should be an object/],
  ])('name the field at fault for %s', (_name, text, message) => {
    expect(() => parseSession(text, 's.json')).toThrow(message);
  });
});
