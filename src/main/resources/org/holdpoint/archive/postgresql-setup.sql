-- One-time setup of a shared Holdpoint archive on PostgreSQL; run as an administrator (psql -f),
-- e.g. psql -v ON_ERROR_STOP=1 -f postgresql-setup.sql postgres
-- Then the owner's first `holdpoint` start (or JdbcArchive.migrate) creates the tables and grants.
--
-- Group roles (NOLOGIN): people log in with their own role and are members of one of these.
--   holdpoint_author    may insert studies, their characteristics and audit events
--   holdpoint_approver  may insert signatures and their audit events
--   holdpoint_auditor   may only read
--   holdpoint_owner     owns the tables (runs migrations); never used for daily work
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

-- The archive database, owned by the owner role; nobody else may create objects in it.
-- (CREATE DATABASE cannot run inside a DO block; skip this line if the database exists.)
CREATE DATABASE holdpoint OWNER holdpoint_owner;
\connect holdpoint
REVOKE CREATE ON SCHEMA public FROM PUBLIC;
ALTER SCHEMA public OWNER TO holdpoint_owner;
GRANT USAGE ON SCHEMA public TO holdpoint_author, holdpoint_approver, holdpoint_auditor;

-- People (examples; use your site's authentication, e.g. scram-sha-256 passwords or certificates):
--   CREATE ROLE migrator LOGIN PASSWORD '...' IN ROLE holdpoint_owner;   -- runs the migrations
--   CREATE ROLE alice    LOGIN PASSWORD '...' IN ROLE holdpoint_author;
--   CREATE ROLE quentin  LOGIN PASSWORD '...' IN ROLE holdpoint_approver;
--   CREATE ROLE audrey   LOGIN PASSWORD '...' IN ROLE holdpoint_auditor;
-- A login role that runs migrations must act as the owner: ALTER ROLE migrator SET role = 'holdpoint_owner';
