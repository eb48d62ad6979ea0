-- Custom SQL migration file, put your code below! --
-- Ends a staff member's sessions in one firm (deactivation): a reactivated member signs in again
-- rather than finding old sessions working once more. Only the firm the caller's transaction is in:
-- the web role cannot end another firm's sessions through it. Sessions in the person's other firms stay.
CREATE FUNCTION auth_sessions_end_for_member(p_user_id uuid, p_tenant_id uuid) RETURNS void
  LANGUAGE sql VOLATILE SECURITY DEFINER SET search_path = public, pg_temp
  AS $$ DELETE FROM session
        WHERE p_tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid
          AND sess->'passport'->'user'->>'kind' = 'staff'
          AND sess->'passport'->'user'->>'id' = p_user_id::text
          AND sess->'passport'->'user'->>'tenantId' = p_tenant_id::text $$;
--> statement-breakpoint
REVOKE ALL ON FUNCTION auth_sessions_end_for_member(uuid, uuid) FROM PUBLIC;
--> statement-breakpoint
GRANT EXECUTE ON FUNCTION auth_sessions_end_for_member(uuid, uuid) TO layerbook_app;
