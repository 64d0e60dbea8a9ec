-- Sessions made before session ids were hashed hold the cookie's secret itself as their id.
-- They could no longer be found (cookies are now looked up by their SHA-256), so they are
-- ended here rather than left in the table: everyone signs in again once after the upgrade.
DELETE FROM "sessions";
