-- The booking guards read one member's flights for the currency rules on every booking; without
-- this index that read walks every flight of the club. Added by the bookings feature (additive;
-- the flights table itself belongs to the fleet schema).
CREATE INDEX IF NOT EXISTS `flights_club_pilot` ON `flights` (`club_id`, `pilot_id`, `flown_on`);
