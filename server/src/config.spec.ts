import { loadConfig } from './config';

const base = {
  DATABASE_URL: 'postgres://a@localhost/x',
  DATABASE_OWNER_URL: 'postgres://b@localhost/x',
  DATABASE_JOBS_URL: 'postgres://c@localhost/x',
  SESSION_SECRET: 'config-spec-secret-long-enough-1234567890',
};

describe('PUBLIC_URL', () => {
  it('is kept without a trailing slash, so the links built on it never read //path', () => {
    expect(loadConfig({ ...base, PUBLIC_URL: 'https://plaster.example/' }).PUBLIC_URL).toBe('https://plaster.example');
    expect(loadConfig({ ...base, PUBLIC_URL: 'https://plaster.example/office//' }).PUBLIC_URL).toBe('https://plaster.example/office');
    expect(loadConfig(base).PUBLIC_URL).toBe('http://localhost:4300');
  });
});
