-- Custom SQL migration file, put your code below! --
-- After a password reset every session of that staff member ends, including a half-signed-in one:
-- between the password and the second factor a session holds only `secondFactor` (its userId; no
-- Passport user yet, server/src/auth/second-factor/half-state.ts), and whoever knew the old password
-- must not finish that step after the reset. CREATE OR REPLACE keeps the owner, SECURITY DEFINER
-- and search_path as 0018 set them; the grants are said again so this file reads on its own.
CREATE OR REPLACE FUNCTION auth_sessions_end_for_staff(p_user_id uuid) RETURNS void
  LANGUAGE sql VOLATILE SECURITY DEFINER SET search_path = public, pg_temp
  AS $$ DELETE FROM session
        WHERE (sess->'passport'->'user'->>'kind' = 'staff' AND sess->'passport'->'user'->>'id' = p_user_id::text)
           OR sess->'secondFactor'->>'userId' = p_user_id::text $$;
--> statement-breakpoint
REVOKE ALL ON FUNCTION auth_sessions_end_for_staff(uuid) FROM PUBLIC;
--> statement-breakpoint
GRANT EXECUTE ON FUNCTION auth_sessions_end_for_staff(uuid) TO layerbook_app;
