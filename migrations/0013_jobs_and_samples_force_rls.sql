-- Custom SQL migration file, put your code below! --
ALTER TABLE "jobs" FORCE ROW LEVEL SECURITY;
ALTER TABLE "payment_schedule_lines" FORCE ROW LEVEL SECURITY;
ALTER TABLE "sample_boards" FORCE ROW LEVEL SECURITY;
ALTER TABLE "sample_board_photos" FORCE ROW LEVEL SECURITY;

GRANT SELECT, INSERT, UPDATE, DELETE ON "jobs", "payment_schedule_lines", "sample_boards", "sample_board_photos" TO layerbook_app, layerbook_jobs;
