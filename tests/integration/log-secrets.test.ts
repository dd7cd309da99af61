import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import type { AppContext } from '../../server/config/context';
import { closeContext, createContext } from '../../server/context-factory';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { seedDemo } from '../../server/dev/seed';
import { parseEnv } from '../../server/config/env';
import { createLogger } from '../../server/lib/logger';
import { createTestDatabase, dropTestDatabase, testEnv } from '../setup/test-app';

let ctx: AppContext;
let databaseUrl: string;
const written: string[] = [];

beforeAll(async () => {
  databaseUrl = await createTestDatabase();
  const base = createContext(parseEnv(testEnv(databaseUrl, { LOG_LEVEL: 'info' })));
  ctx = {
    ...base,
    logger: createLogger('info', {
      write: (line: string) => {
        written.push(line);
      },
    }),
  };
  await seedDemo(ctx.db);
});
afterAll(async () => {
  await closeContext(ctx);
  await dropTestDatabase(databaseUrl);
});

const cookieValue = (setCookie: unknown) => String(setCookie).match(/gradepass\.sid=([^;]+)/)?.[1];

describe('the request log after a sign-in', () => {
  it('holds neither the session cookie nor the OAuth code and state, and one short line per success', async () => {
    const app = createApp(ctx);
    const agent = request.agent(app);
    const start = await agent.get('/auth/google').expect(302);
    const authorize = new URL(start.headers.location);
    authorize.searchParams.set('login_hint', demoPeople[0].email);
    const back = new URL((await fetch(authorize, { redirect: 'manual' })).headers.get('location')!);
    const code = back.searchParams.get('code')!;
    const state = back.searchParams.get('state')!;
    const done = await agent.get(back.pathname + back.search).expect(302);
    const sid = cookieValue(done.headers['set-cookie'])!;
    await agent.get('/api/me').expect(200);
    await agent.get('/api/requests/mine?search=x').expect((res) => expect(res.status).toBeLessThan(500));

    expect(code.length).toBeGreaterThan(8);
    expect(state.length).toBeGreaterThan(8);
    expect(sid.length).toBeGreaterThan(20);
    const log = written.join('');
    expect(log).toContain('/auth/google/callback');
    for (const secret of [code, state, sid, decodeURIComponent(sid), decodeURIComponent(sid).slice(2).split('.')[0]]) {
      expect(log).not.toContain(secret);
    }
    expect(log).not.toMatch(/set-cookie|"headers"/i);

    const me = written
      .map((line) => JSON.parse(line) as Record<string, unknown>)
      .find((l) => (l.req as { url?: string } | undefined)?.url === '/api/me');
    expect(me).toBeDefined();
    expect(Object.keys(me!).sort()).toEqual(['hostname', 'level', 'msg', 'pid', 'req', 'res', 'responseTime', 'time']);
    expect(me!.res).toEqual({ statusCode: 200 });
    expect(JSON.stringify(me).length).toBeLessThan(250);
  });
});
