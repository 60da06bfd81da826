/**
 * The bare fastify baselines of bench/http.ts as their own process (so their CPU time can be read apart from the
 * load generator's): GET /small (a tiny object) and POST /same-size (parses the JSON body, answers the JSON object
 * in the file named by BASELINE_ANSWER, serialised per request). Listens on 127.0.0.1:BASELINE_PORT.
 */
import { readFileSync } from 'node:fs';
import Fastify from 'fastify';

const answer = JSON.parse(readFileSync(process.env.BASELINE_ANSWER!, 'utf8')) as unknown;
const bare = Fastify({ logger: false });
bare.get('/small', async () => ({ status: 'ok', value: 1.5 }));
bare.post('/same-size', async (request) => {
  if (typeof request.body !== 'object' || request.body === null) throw new Error('no body');
  return answer;
});
await bare.listen({ port: Number(process.env.BASELINE_PORT), host: '127.0.0.1' });
