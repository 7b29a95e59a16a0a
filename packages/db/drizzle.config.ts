import { defineConfig } from 'drizzle-kit';

// Only `generate` reads this; it needs no database connection.
export default defineConfig({
  dialect: 'postgresql',
  schema: './src/schema.ts',
  out: './migrations',
});
