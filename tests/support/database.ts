import { connectDatabase } from '@vatside/db/client';

/** The test profile's database (infra-local/test.sh exports DATABASE_URL). */
export function testDatabase() {
  const url = process.env.DATABASE_URL;
  if (!url?.includes('vatside_test')) throw new Error('End-to-end tests run through `npm test`.');
  return connectDatabase(url, 2);
}
