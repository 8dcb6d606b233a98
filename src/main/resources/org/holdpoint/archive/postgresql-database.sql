-- Shared Holdpoint archive on PostgreSQL, step 3 of 3: run as an administrator connected to the new archive
-- database (created in step 2 with: CREATE DATABASE holdpoint OWNER holdpoint_owner;).
-- Only the owner may create objects; the other group roles may use the schema.
REVOKE CREATE ON SCHEMA public FROM PUBLIC;
GRANT USAGE ON SCHEMA public TO holdpoint_author, holdpoint_approver, holdpoint_auditor;
