DROP INDEX "job_work_items_key";--> statement-breakpoint
ALTER TABLE "job_work_items" ADD COLUMN "change_order_id" uuid;--> statement-breakpoint
ALTER TABLE "job_work_items" ADD CONSTRAINT "job_work_items_work_key" UNIQUE NULLS NOT DISTINCT("tenant_id","job_id","surface_id","layer_id","change_order_id");--> statement-breakpoint
-- Backfill: the work items approved change orders added so far (made after the job's first ones, on a
-- surface and layer the change order lists) name it, so the crew sheet's "Added by change N" surfaces
-- still find their layers. The owner reads past row-level security only inside this transaction.
ALTER TABLE job_work_items NO FORCE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE change_orders NO FORCE ROW LEVEL SECURITY;--> statement-breakpoint
UPDATE job_work_items w SET change_order_id = added.change_order_id
  FROM (
    SELECT DISTINCT ON (w2.id) w2.id, co.id AS change_order_id
      FROM job_work_items w2
      JOIN change_orders co ON co.tenant_id = w2.tenant_id AND co.job_id = w2.job_id AND co.status = 'approved'
      CROSS JOIN LATERAL jsonb_array_elements(coalesce(co.detail->'workItems', '[]'::jsonb)) item
     WHERE item->>'surfaceId' = w2.surface_id AND item->>'layerId' = w2.layer_id
       AND w2.created_at > (SELECT min(f.created_at) FROM job_work_items f WHERE f.tenant_id = w2.tenant_id AND f.job_id = w2.job_id)
     ORDER BY w2.id, co.number
  ) added
 WHERE w.id = added.id;--> statement-breakpoint
-- A change order that redid a sold surface with the same finish got no work items (the sold ones stood in for
-- them): it gets its own now, not done, after the job's other work.
INSERT INTO job_work_items (tenant_id, job_id, position, room_name, surface_id, surface_name, layer_id, layer_name, layer_order, change_order_id)
  SELECT co.tenant_id, co.job_id,
         (SELECT max(m.position) FROM job_work_items m WHERE m.tenant_id = co.tenant_id AND m.job_id = co.job_id)
           + row_number() OVER (PARTITION BY co.tenant_id, co.job_id ORDER BY co.number, item.n),
         item.v->>'roomName', item.v->>'surfaceId', item.v->>'surfaceName', item.v->>'layerId', item.v->>'layerName',
         (item.v->>'layerOrder')::int, co.id
    FROM change_orders co
    CROSS JOIN LATERAL jsonb_array_elements(coalesce(co.detail->'workItems', '[]'::jsonb)) WITH ORDINALITY AS item(v, n)
   WHERE co.status = 'approved'
     AND EXISTS (SELECT 1 FROM job_work_items j WHERE j.tenant_id = co.tenant_id AND j.job_id = co.job_id)
     AND NOT EXISTS (SELECT 1 FROM job_work_items w WHERE w.tenant_id = co.tenant_id AND w.job_id = co.job_id
                       AND w.surface_id = item.v->>'surfaceId' AND w.layer_id = item.v->>'layerId' AND w.change_order_id = co.id)
  ON CONFLICT DO NOTHING;--> statement-breakpoint
ALTER TABLE job_work_items FORCE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE change_orders FORCE ROW LEVEL SECURITY;
