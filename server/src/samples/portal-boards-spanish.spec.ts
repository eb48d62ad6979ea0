import type { ClientBoardView, ItemList, SampleBoardView } from '@layerbook/contracts';
import { startTestServer, TestServer } from '../testing/harness';
import { firmWithFinish, makeBoard, post, signInClient } from './sample-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('a sample board read by a client who reads Spanish', () => {
  it('says the finish steps in Spanish by the catalog’s words, with the firm’s names as typed; the office still reads English', async () => {
    const f = await firmWithFinish(t, 'Veladura Norte');
    const client = await signInClient(t, f.firmId, f.clientId, f.clientEmail);
    const board = await makeBoard(f, { clientId: f.clientId, label: 'Sala, tablero A', finishSystemId: f.systemId });
    expect((await post(f, `/api/samples/${board.id}/show`)).status).toBe(200);
    expect((await client.agent.patch('/api/portal/me/language').set('x-csrf-token', client.csrf()).send({ language: 'es' })).status).toBe(
      200,
    );

    // Wording: server/src/i18n/words/es.json samples.steps (docs/i18n-glossary.md: mano = coat, veladura = glaze); common usage, no source.
    const spanish = [
      '1. Primer: Acrylic primer, con rodillo, una mano.',
      '2. Antiquing glaze: una mezcla de Umber tint paint y Glazing medium, en veladura, una mano, en cerca del 30 % de la superficie.',
    ];
    const one = await client.agent.get(`/api/portal/boards/${board.id}`);
    expect(one.status).toBe(200);
    expect((one.body as ClientBoardView).finishSteps).toEqual(spanish);
    expect((one.body as ClientBoardView).finishName).toBe('Antiqued glaze over primer');
    const list = (await client.agent.get('/api/portal/boards')).body as ItemList<ClientBoardView>;
    expect(list.items[0].finishSteps).toEqual(spanish);
    const office = (await f.agent.get(`/api/samples/${board.id}`)).body as SampleBoardView;
    expect(office.finishSteps[0]).toBe('1. Primer: Acrylic primer, rolled on, one coat.');

    // Back to the firm's language (English): the same steps in English.
    await client.agent.patch('/api/portal/me/language').set('x-csrf-token', client.csrf()).send({ language: null });
    const english = (await client.agent.get(`/api/portal/boards/${board.id}`)).body as ClientBoardView;
    expect(english.finishSteps[1]).toBe(
      '2. Antiquing glaze: a mix of Umber tint paint and Glazing medium, glazed, one coat, over about 30 % of the surface.',
    );
  });
});
