-- Custom SQL migration file, put your code below! --
-- Sign-in throttle: not firm data; the web role counts, the jobs role prunes old windows.
GRANT SELECT, INSERT, UPDATE, DELETE ON "sign_in_throttle" TO layerbook_app;
GRANT SELECT, DELETE ON "sign_in_throttle" TO layerbook_jobs;

-- The prune queue job (jobs role) deletes expired sessions.
GRANT SELECT, DELETE ON "session" TO layerbook_jobs;

-- Password hashes: the web role may write a new person's row, but neither read nor overwrite a hash.
-- It verifies and sets a hash through the functions below, one person at a time, by user id.
REVOKE SELECT, UPDATE ON "users" FROM layerbook_app;
GRANT SELECT ("id", "email", "name", "failed_sign_ins", "locked_until", "created_at") ON "users" TO layerbook_app;
GRANT UPDATE ("email", "name") ON "users" TO layerbook_app;

CREATE FUNCTION auth_password_hash(p_user_id uuid) RETURNS text
  LANGUAGE sql STABLE SECURITY DEFINER SET search_path = public, pg_temp
  AS $$ SELECT password_hash FROM users WHERE id = p_user_id $$;

CREATE FUNCTION auth_set_password_hash(p_user_id uuid, p_hash text) RETURNS void
  LANGUAGE sql VOLATILE SECURITY DEFINER SET search_path = public, pg_temp
  AS $$ UPDATE users SET password_hash = p_hash WHERE id = p_user_id $$;

-- Sessions: the web role reaches a row only by its secret id (the cookie), never by listing.
REVOKE ALL ON "session" FROM layerbook_app;

CREATE FUNCTION auth_session_get(p_sid text) RETURNS json
  LANGUAGE sql STABLE SECURITY DEFINER SET search_path = public, pg_temp
  AS $$ SELECT sess FROM session WHERE sid = p_sid AND expire >= now() $$;

CREATE FUNCTION auth_session_set(p_sid text, p_sess json, p_expire timestamptz) RETURNS void
  LANGUAGE sql VOLATILE SECURITY DEFINER SET search_path = public, pg_temp
  AS $$ INSERT INTO session (sid, sess, expire) VALUES (p_sid, p_sess, p_expire)
        ON CONFLICT (sid) DO UPDATE SET sess = excluded.sess, expire = excluded.expire $$;

CREATE FUNCTION auth_session_touch(p_sid text, p_expire timestamptz) RETURNS void
  LANGUAGE sql VOLATILE SECURITY DEFINER SET search_path = public, pg_temp
  AS $$ UPDATE session SET expire = p_expire WHERE sid = p_sid AND expire >= now() $$;

CREATE FUNCTION auth_session_destroy(p_sid text) RETURNS void
  LANGUAGE sql VOLATILE SECURITY DEFINER SET search_path = public, pg_temp
  AS $$ DELETE FROM session WHERE sid = p_sid $$;

-- After a password reset: every session of that staff member ends.
CREATE FUNCTION auth_sessions_end_for_staff(p_user_id uuid) RETURNS void
  LANGUAGE sql VOLATILE SECURITY DEFINER SET search_path = public, pg_temp
  AS $$ DELETE FROM session
        WHERE sess->'passport'->'user'->>'kind' = 'staff' AND sess->'passport'->'user'->>'id' = p_user_id::text $$;

REVOKE ALL ON FUNCTION auth_password_hash(uuid), auth_set_password_hash(uuid, text), auth_session_get(text),
  auth_session_set(text, json, timestamptz), auth_session_touch(text, timestamptz), auth_session_destroy(text),
  auth_sessions_end_for_staff(uuid) FROM PUBLIC;
GRANT EXECUTE ON FUNCTION auth_password_hash(uuid), auth_set_password_hash(uuid, text), auth_session_get(text),
  auth_session_set(text, json, timestamptz), auth_session_touch(text, timestamptz), auth_session_destroy(text),
  auth_sessions_end_for_staff(uuid) TO layerbook_app;
