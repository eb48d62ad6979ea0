-- Custom SQL migration file, put your code below! --
-- Whether a session is still live for this person: checked in the first round trip of every
-- signed-in request's own transaction, so a session read from a process's short-lived cache
-- (http/session.ts) is never honoured after sign-out or expiry, whichever process ended it.
CREATE FUNCTION auth_session_live(p_sid text, p_user_id text) RETURNS boolean
  LANGUAGE sql STABLE SECURITY DEFINER SET search_path = public, pg_temp
  AS $$ SELECT EXISTS (SELECT 1 FROM session WHERE sid = p_sid AND expire >= now()
                         AND sess->'passport'->'user'->>'id' = p_user_id) $$;
REVOKE ALL ON FUNCTION auth_session_live(text, text) FROM PUBLIC;
GRANT EXECUTE ON FUNCTION auth_session_live(text, text) TO layerbook_app;
