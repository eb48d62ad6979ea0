-- A product of kind lime carries the lime flag (its alkali and eye-protection caution follows the flag
-- alone): products saved before the server set it get it now. The owner reads past row-level security
-- only inside this transaction.
ALTER TABLE products NO FORCE ROW LEVEL SECURITY;--> statement-breakpoint
UPDATE products SET hazards = hazards || '{"isLime": true}'::jsonb
 WHERE kind = 'lime' AND coalesce((hazards->>'isLime')::boolean, false) = false;--> statement-breakpoint
ALTER TABLE products FORCE ROW LEVEL SECURITY;
