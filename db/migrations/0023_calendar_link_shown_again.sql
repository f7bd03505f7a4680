-- A calendar link can be shown again (on a second device) without making a new one, which would
-- stop the first subscription. The secret is kept sealed (AES-256-GCM under a key derived from
-- AUTH_SECRET, lib/server/tokens.ts); lookups still go by token_hash. Links made before this
-- migration have no seal: they keep working, and the page offers a new link to see one.
ALTER TABLE `calendar_feed_tokens` ADD `secret_sealed` text;
