-- Custom SQL migration file, put your code below! --
-- Pending sign-ups: not firm data (like password_resets); the web role writes, finds by token hash and marks used.
GRANT SELECT, INSERT, UPDATE ON "pending_sign_ups" TO layerbook_app;
GRANT SELECT, DELETE ON "pending_sign_ups" TO layerbook_jobs;
