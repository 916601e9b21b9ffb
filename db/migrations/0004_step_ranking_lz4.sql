-- Each answer stores the ranking it showed (about 4 KB of JSON). lz4 compresses it several times
-- faster than the default pglz at a similar size, which is a measurable share of the answer's
-- insert. Rows already stored keep pglz; both read the same. Debian's PostgreSQL is built with lz4.
ALTER TABLE "case_steps" ALTER COLUMN "ranking" SET COMPRESSION lz4;
