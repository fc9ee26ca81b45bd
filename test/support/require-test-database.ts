// Integration tests need the PostgreSQL test cluster that `npm test` starts; say so plainly.
export default function requireTestDatabase(): void {
  if (!process.env.TEST_DATABASE_URL) {
    throw new Error("TEST_DATABASE_URL is not set: run integration tests through `npm test`, which starts the test cluster.");
  }
}
