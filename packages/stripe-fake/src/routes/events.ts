import express from 'express';
import { api, type IdempotencyStore } from '../api';
import { resourceMissing } from '../errors';
import { expireDue } from '../lifecycle';
import { createdFilter, paginate } from '../list';
import { list, onlyKnown, str } from '../params';
import type { FakeState } from '../state';

/** Events: retrieve, and list newest first with created[gt|gte|lt|lte], type or types[], cursors and limit. */
export function eventRoutes(state: FakeState, store: IdempotencyStore) {
  const router = express.Router();
  router.get(
    '/v1/events',
    api(store, ({ params }) => {
      onlyKnown(params, ['created', 'limit', 'starting_after', 'ending_before', 'type', 'types', 'delivery_success', 'expand']);
      expireDue(state);
      const created = createdFilter(params);
      const type = str(params, 'type');
      const types = list(params, 'types')?.map(String);
      const matches = (t: string) =>
        (!type || (type.endsWith('*') ? t.startsWith(type.slice(0, -1)) : t === type)) && (!types || types.includes(t));
      const all = state.events.filter((e) => created(e.created) && matches(e.type)).sort(state.compareNewestFirst);
      return { body: paginate(all, params, '/v1/events', 'event') };
    }),
  );
  router.get(
    '/v1/events/:id',
    api(store, ({ params, path }) => {
      onlyKnown(params, ['expand']);
      expireDue(state);
      const event = state.events.find((e) => e.id === path['id']);
      if (!event) throw resourceMissing('event', path['id']);
      return { body: event };
    }),
  );
  return router;
}
