import { dottedPath } from './field-path';

// The path style of zod issues and of RFC 9457 problem details' `errors[].field` here (common practice, no source).
describe('dottedPath', () => {
  it.each([
    ['shape.openings[0].width', 'shape.openings.0.width'],
    ['layers.2.coatCoverages[0].unit', 'layers.2.coatCoverages.0.unit'],
    ['rooms[10].surfaces[2].shape.rise', 'rooms.10.surfaces.2.shape.rise'],
    ['startDate', 'startDate'],
  ])('%s → %s', (engine, dotted) => expect(dottedPath(engine)).toBe(dotted));
});
