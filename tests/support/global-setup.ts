// Integration tests get their database from scripts/test.sh (DATABASE_URL); unit tests need nothing.
export default function setup() {}
