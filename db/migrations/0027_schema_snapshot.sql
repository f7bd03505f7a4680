-- No change to the database: migrations 0021-0026 were written by hand; this entry carries
-- drizzle-kit's record of the schema after them (meta/0027_snapshot.json), so that the next
-- `npm run db:generate` compares against the schema as it is. The statement below does nothing.
DROP TABLE IF EXISTS `hangarline_no_such_table`;
