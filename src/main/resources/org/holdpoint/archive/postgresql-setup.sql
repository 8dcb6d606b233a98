-- Shared Holdpoint archive on PostgreSQL, step 1 of 3: the group roles (run once per server as an
-- administrator, in any database; safe to run again). People log in with their own role and are members of
-- exactly one of these:
--   holdpoint_owner     owns the tables, runs the migrations; never used for daily work
--   holdpoint_author    may insert studies, their characteristics and audit events (and read)
--   holdpoint_approver  may insert signatures and their audit events (and read)
--   holdpoint_auditor   may only read
-- Step 2 creates the database (docs/archive.md); step 3 is postgresql-database.sql.
DO $$
BEGIN
    IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'holdpoint_owner') THEN
        CREATE ROLE holdpoint_owner NOLOGIN;
    END IF;
    IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'holdpoint_author') THEN
        CREATE ROLE holdpoint_author NOLOGIN;
    END IF;
    IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'holdpoint_approver') THEN
        CREATE ROLE holdpoint_approver NOLOGIN;
    END IF;
    IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'holdpoint_auditor') THEN
        CREATE ROLE holdpoint_auditor NOLOGIN;
    END IF;
END
$$;
