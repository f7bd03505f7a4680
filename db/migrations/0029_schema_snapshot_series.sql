-- No change to the database: migration 0028 (the weekly series id) was written by hand; this entry
-- carries drizzle-kit's record of the schema after it (meta/0029_snapshot.json), so that the next
-- `npm run db:generate` compares against the schema as it is. The statement below does nothing.
DROP TABLE IF EXISTS `hangarline_no_such_table`;
