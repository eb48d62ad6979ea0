-- Custom SQL migration file, put your code below! --
-- Second factors and recovery codes: not firm data (they belong to the person, like users); the web role
-- reads and writes them by user id. The secret is sealed (AES-256-GCM) and the codes are keyed hashes.
GRANT SELECT, INSERT, UPDATE, DELETE ON "user_second_factors", "user_recovery_codes" TO layerbook_app;
