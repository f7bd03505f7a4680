-- The database's own guard against double booking: whatever the application checked, two
-- active bookings (reserved or dispatched) may never hold one aircraft, or one instructor, at
-- the same time. Windows are half-open [starts_at, ends_at): one may end when the next begins.
-- The CHECK on bookings bounds a window to 14 days, which bounds the look-up here.
CREATE TRIGGER bookings_no_overlap_insert BEFORE INSERT ON bookings
WHEN NEW.status IN ('reserved', 'dispatched')
BEGIN
  SELECT RAISE(ABORT, 'booking_overlap_aircraft') WHERE EXISTS (
    SELECT 1 FROM bookings b WHERE b.club_id = NEW.club_id AND b.aircraft_id = NEW.aircraft_id
      AND b.starts_at < NEW.ends_at AND b.starts_at > NEW.starts_at - 1209600000 AND b.ends_at > NEW.starts_at
      AND b.status IN ('reserved', 'dispatched'));
  SELECT RAISE(ABORT, 'booking_overlap_instructor') WHERE NEW.instructor_user_id IS NOT NULL AND (EXISTS (
    SELECT 1 FROM bookings b WHERE b.club_id = NEW.club_id AND b.instructor_user_id = NEW.instructor_user_id
      AND b.starts_at < NEW.ends_at AND b.starts_at > NEW.starts_at - 1209600000 AND b.ends_at > NEW.starts_at
      AND b.status IN ('reserved', 'dispatched')) OR EXISTS (
    SELECT 1 FROM bookings b WHERE b.club_id = NEW.club_id AND b.user_id = NEW.instructor_user_id
      AND b.starts_at < NEW.ends_at AND b.starts_at > NEW.starts_at - 1209600000 AND b.ends_at > NEW.starts_at
      AND b.status IN ('reserved', 'dispatched')));
  SELECT RAISE(ABORT, 'booking_overlap_instructor') WHERE EXISTS (
    SELECT 1 FROM bookings b WHERE b.club_id = NEW.club_id AND b.instructor_user_id = NEW.user_id
      AND b.starts_at < NEW.ends_at AND b.starts_at > NEW.starts_at - 1209600000 AND b.ends_at > NEW.starts_at
      AND b.status IN ('reserved', 'dispatched'));
END;
--> statement-breakpoint
CREATE TRIGGER bookings_no_overlap_update BEFORE UPDATE OF starts_at, ends_at, aircraft_id, user_id, instructor_user_id, status ON bookings
WHEN NEW.status IN ('reserved', 'dispatched')
BEGIN
  SELECT RAISE(ABORT, 'booking_overlap_aircraft') WHERE EXISTS (
    SELECT 1 FROM bookings b WHERE b.club_id = NEW.club_id AND b.aircraft_id = NEW.aircraft_id
      AND b.starts_at < NEW.ends_at AND b.starts_at > NEW.starts_at - 1209600000 AND b.ends_at > NEW.starts_at
      AND b.status IN ('reserved', 'dispatched') AND b.id <> NEW.id);
  SELECT RAISE(ABORT, 'booking_overlap_instructor') WHERE NEW.instructor_user_id IS NOT NULL AND (EXISTS (
    SELECT 1 FROM bookings b WHERE b.club_id = NEW.club_id AND b.instructor_user_id = NEW.instructor_user_id
      AND b.starts_at < NEW.ends_at AND b.starts_at > NEW.starts_at - 1209600000 AND b.ends_at > NEW.starts_at
      AND b.status IN ('reserved', 'dispatched') AND b.id <> NEW.id) OR EXISTS (
    SELECT 1 FROM bookings b WHERE b.club_id = NEW.club_id AND b.user_id = NEW.instructor_user_id
      AND b.starts_at < NEW.ends_at AND b.starts_at > NEW.starts_at - 1209600000 AND b.ends_at > NEW.starts_at
      AND b.status IN ('reserved', 'dispatched') AND b.id <> NEW.id));
  SELECT RAISE(ABORT, 'booking_overlap_instructor') WHERE EXISTS (
    SELECT 1 FROM bookings b WHERE b.club_id = NEW.club_id AND b.instructor_user_id = NEW.user_id
      AND b.starts_at < NEW.ends_at AND b.starts_at > NEW.starts_at - 1209600000 AND b.ends_at > NEW.starts_at
      AND b.status IN ('reserved', 'dispatched') AND b.id <> NEW.id);
END;
