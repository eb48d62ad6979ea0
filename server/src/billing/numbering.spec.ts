import { documentNumber } from '@layerbook/domain';
import { Pool } from 'pg';
import { testDatabaseUrls } from '../testing/test-env';
import { numberHead, numberTextSql } from './numbering';

// Issuing makes the invoice's printed number in SQL, in the statement that takes it from the
// counter (one round trip while every issuer waits): it must print as documentNumber() does.
let pool: Pool;
beforeAll(() => {
  pool = new Pool({ connectionString: testDatabaseUrls().DATABASE_URL, max: 1 });
});
afterAll(() => pool.end());

it.each([
  ['INV-', 1],
  ['INV-', 7],
  ['INV', 42],
  ['2027/', 7],
  ['', 9],
  ['  Rech ', 123],
  ['INV-', 12345],
  ['INV-', 9999],
])('prefix %j, number %i prints as documentNumber', async (prefix, n) => {
  const { rows } = await pool.query<{ text: string }>(`select ${numberTextSql('$1::text', '$2::int', '$3::int')} as text`, [
    numberHead(prefix),
    n,
    4,
  ]);
  expect(rows[0].text).toBe(documentNumber(prefix, n, 4));
});
