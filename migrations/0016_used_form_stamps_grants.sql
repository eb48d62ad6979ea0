-- Custom SQL migration file, put your code below! --
GRANT SELECT, INSERT, DELETE ON "used_form_stamps" TO layerbook_app, layerbook_jobs;
