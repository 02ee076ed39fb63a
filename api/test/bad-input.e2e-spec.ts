/**
 * Hostile and careless input: every case below answered 500 once. Each now gets a 4xx in the one
 * error shape, naming what was wrong (for calc files: file, JSON pointer and rule).
 */
import request from 'supertest';
import { bearer, bootApp, calcFile, EMAIL, login, type TestApp } from './helpers.js';

let t: TestApp;
let admin: string;
let consultant: string;
beforeAll(async () => {
  t = await bootApp();
  admin = await login(t.http, EMAIL.admin);
  consultant = await login(t.http, EMAIL.consultant);
});
afterAll(async () => t.close());

const nested = (depth: number) => `${'['.repeat(depth)}${']'.repeat(depth)}`;

function upload(name: string, content: Buffer, title = 'Bad input') {
  return request(t.http)
    .post('/api/projects/1/submittals')
    .set(bearer(consultant))
    .field('title', title)
    .attach('files', content, name);
}

function withMember(memberId: string, change: (member: Record<string, unknown>) => void): Buffer {
  const doc = JSON.parse(calcFile(memberId).toString()) as { members: Record<string, unknown>[] };
  change(doc.members[0]!);
  return Buffer.from(JSON.stringify(doc, null, 2));
}

describe('JSON nested 3,000 deep', () => {
  it('a request body: 400 naming where it is too deep', async () => {
    const res = await request(t.http)
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send(`{"email":${nested(3000)},"password":"x"}`);
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: expect.stringMatching(
        /^email(\[0\])+.* nests more than 32 levels deep; no request needs that$/,
      ),
      details: [
        { property: expect.stringMatching(/^email\[0\]/), constraints: { maxDepth: expect.any(String) } },
      ],
    });
  });

  it('an object body on an admin route: 400', async () => {
    const res = await request(t.http)
      .patch('/api/users/2')
      .set(bearer(admin))
      .set('Content-Type', 'application/json')
      .send(`${'{"a":'.repeat(3000)}1${'}'.repeat(3000)}`);
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({
      statusCode: 400,
      error: 'Bad Request',
      details: [{ constraints: { maxDepth: expect.stringContaining('nests more than 32 levels deep') } }],
    });
  });

  it('a calc file: 422 with file, pointer, position and rule json-depth; nothing stored', async () => {
    const doc = JSON.parse(calcFile('SP-DEEP').toString()) as { meta: Record<string, unknown> };
    doc.meta.notes = JSON.parse(nested(3000)) as unknown;
    const res = await upload('deep.json', Buffer.from(JSON.stringify(doc)));
    expect(res.status).toBe(422);
    const pointer = `/meta/notes${'/0'.repeat(30)}`;
    expect(res.body).toEqual({
      statusCode: 422,
      error: 'Unprocessable Entity',
      message: '1 of 1 file(s) are invalid (1 error(s)); nothing was stored.',
      details: [
        {
          file: 'deep.json',
          pointer,
          line: 1,
          column: expect.any(Number),
          rule: 'json-depth',
          message: `${pointer}: nests more than 32 levels deep; a calc file needs fewer than ten (rule json-depth)`,
        },
      ],
    });
  });

  it('a calc file of 20,000 brackets (deeper than the JSON parser can recurse): 422, not a crash', async () => {
    const res = await upload('brackets.json', Buffer.from(nested(20000)));
    expect(res.status).toBe(422);
    expect(res.body.details).toEqual([
      expect.objectContaining({ file: 'brackets.json', rule: 'json-depth', line: 1, column: 33 }),
    ]);
  });
});

describe('numbers no id or page can be', () => {
  it.each(['/api/projects/1/discrepancies', '/api/projects/1/events'])(
    '%s?page=99999999999999999999: 400 naming page',
    async (path) => {
      const res = await request(t.http).get(`${path}?page=99999999999999999999`).set(bearer(admin));
      expect(res.status).toBe(400);
      expect(res.body).toEqual({
        statusCode: 400,
        error: 'Bad Request',
        message: 'page must be a whole number below 2^53, not 99999999999999999999',
        details: [
          {
            property: 'page',
            constraints: { safeInteger: 'page must be a whole number below 2^53, not 99999999999999999999' },
          },
        ],
      });
    },
  );

  it('a page beyond 1,000,000: 400 (no list has that many pages)', async () => {
    const res = await request(t.http).get('/api/projects/1/discrepancies?page=1000001').set(bearer(admin));
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({
      statusCode: 400,
      details: [{ property: 'page', constraints: { max: 'page must not be greater than 1000000' } }],
    });
  });

  it('an id of 20 digits in the path: 400 naming the parameter', async () => {
    const res = await request(t.http)
      .patch('/api/users/99999999999999999999')
      .set(bearer(admin))
      .send({ name: 'X' });
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'userId must be a whole number below 2^53, not 99999999999999999999',
      details: [
        {
          property: 'userId',
          constraints: { safeInteger: 'userId must be a whole number below 2^53, not 99999999999999999999' },
        },
      ],
    });
  });

  it('an id of 1e20 in a JSON body: 400 naming the property', async () => {
    const res = await request(t.http)
      .patch('/api/users/2')
      .set(bearer(admin))
      .set('Content-Type', 'application/json')
      .send('{"organisationId":1e20}');
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({
      statusCode: 400,
      details: [{ property: 'organisationId', constraints: { safeInteger: expect.any(String) } }],
    });
  });
});

describe('numbers in multipart bodies and query strings (text the DTO converts)', () => {
  const submittals = async () =>
    ((await request(t.http).get('/api/projects/1/submittals').set(bearer(admin))).body as unknown[]).length;
  const safeIntegerError = (property: string, text: string) => ({
    statusCode: 400,
    error: 'Bad Request',
    message: `${property} must be a whole number below 2^53, not ${text}`,
    details: [
      {
        property,
        constraints: { safeInteger: `${property} must be a whole number below 2^53, not ${text}` },
      },
    ],
  });

  it.each(['99999999999999999999', '1e20', '9007199254740993'])(
    'a multipart revisionOf of %s: 400 naming revisionOf; nothing stored',
    async (revisionOf) => {
      const before = await submittals();
      const res = await request(t.http)
        .post('/api/projects/1/submittals')
        .set(bearer(consultant))
        .field('title', 'Revision with a huge number')
        .field('revisionOf', revisionOf)
        .attach('files', calcFile('SP-HUGE'), 'huge-revision.json');
      expect(res.status).toBe(400);
      expect(res.body).toEqual(safeIntegerError('revisionOf', revisionOf));
      expect(await submittals()).toBe(before);
    },
  );

  it('a multipart revisionOf that is not a number: 400 naming revisionOf', async () => {
    const res = await request(t.http)
      .post('/api/projects/1/submittals')
      .set(bearer(consultant))
      .field('title', 'Revision of nothing')
      .field('revisionOf', 'B')
      .attach('files', calcFile('SP-NAN'), 'nan-revision.json');
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({
      statusCode: 400,
      error: 'Bad Request',
      details: [{ property: 'revisionOf', constraints: { isInt: 'revisionOf must be an integer number' } }],
    });
  });

  it('a title of 20 digits is text, not a number: the upload goes through', async () => {
    const res = await request(t.http)
      .post('/api/projects/1/submittals')
      .set(bearer(consultant))
      .field('title', '99999999999999999999')
      .attach('files', calcFile('SP-DIGITS'), 'digits-title.json');
    expect(res.status).toBe(201);
  });

  it.each([
    ['/api/projects/1/discrepancies?submittalId=1e20', 'submittalId', '1e20'],
    ['/api/dashboard?projectId=1e20', 'projectId', '1e20'],
    ['/api/dashboard/open-discrepancies.csv?projectId=1e20', 'projectId', '1e20'],
  ])(
    '%s: 400 naming %s, as JSON (also where the route answers CSV or HTML)',
    async (path, property, text) => {
      const res = await request(t.http).get(path).set(bearer(admin));
      expect(res.status).toBe(400);
      expect(res.headers['content-type']).toBe('application/json; charset=utf-8');
      expect(res.headers['content-disposition']).toBeUndefined();
      expect(res.body).toEqual(safeIntegerError(property, text));
    },
  );

  it.each(['1e20', '99999999999999999999'])(
    'the HTML report of submittal %s: 404 as JSON, naming the id as sent',
    async (id) => {
      const res = await request(t.http).get(`/api/submittals/${id}/report`).set(bearer(admin));
      expect(res.status).toBe(404);
      expect(res.headers['content-type']).toBe('application/json; charset=utf-8');
      expect(res.body).toEqual({ statusCode: 404, error: 'Not Found', message: `No submittal ${id}.` });
    },
  );

  it('a pageSize of 1e20: 400 naming pageSize (above its maximum)', async () => {
    const res = await request(t.http).get('/api/projects/1/discrepancies?pageSize=1e20').set(bearer(admin));
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({
      statusCode: 400,
      details: [{ property: 'pageSize', constraints: { max: 'pageSize must not be greater than 500' } }],
    });
  });
});

describe('references to what does not exist', () => {
  it('PATCH /api/users/:id {"organisationId":999}: 404 and the user unchanged', async () => {
    const before = (await request(t.http).get('/api/users').set(bearer(admin))).body as {
      id: number;
      organisationId: number | null;
    }[];
    const res = await request(t.http).patch('/api/users/2').set(bearer(admin)).send({ organisationId: 999 });
    expect(res.status).toBe(404);
    expect(res.body).toEqual({ statusCode: 404, error: 'Not Found', message: 'No organisation 999.' });
    const after = (await request(t.http).get('/api/users').set(bearer(admin))).body as typeof before;
    expect(after.find((u) => u.id === 2)?.organisationId).toBe(
      before.find((u) => u.id === 2)?.organisationId,
    );
  });
});

describe('file names that are not plain ASCII', () => {
  async function storedAndDownloaded(submittalId: number) {
    const files = (await request(t.http).get(`/api/submittals/${submittalId}/files`).set(bearer(admin)))
      .body as { id: number; fileName: string }[];
    const file = files[0]!;
    const download = await request(t.http).get(`/api/calc-files/${file.id}/content`).set(bearer(admin));
    return { fileName: file.fileName, download };
  }

  it('a UTF-8 filename is stored as typed and downloads with filename* (RFC 6266, RFC 5987)', async () => {
    const res = await upload('Träger-ß.json', calcFile('SP-U1'), 'UTF-8 name');
    expect(res.status).toBe(201);
    const { fileName, download } = await storedAndDownloaded(res.body.submittalId as number);
    expect(fileName).toBe('Träger-ß.json');
    expect(download.status).toBe(200);
    expect(download.headers['content-disposition']).toBe(
      `attachment; filename="Tr_ger-_.json"; filename*=UTF-8''Tr%C3%A4ger-%C3%9F.json`,
    );
  });

  it('a filename* name (outside Latin-1) is stored and still downloads', async () => {
    const boundary = 'ligament-test-boundary';
    const body = Buffer.concat([
      Buffer.from(
        `--${boundary}\r\nContent-Disposition: form-data; name="title"\r\n\r\nStar name\r\n` +
          `--${boundary}\r\nContent-Disposition: form-data; name="files"; filename*=UTF-8''%E6%A2%81%20%281%29.json\r\n` +
          `Content-Type: application/json\r\n\r\n`,
      ),
      calcFile('SP-U2'),
      Buffer.from(`\r\n--${boundary}--\r\n`),
    ]);
    const res = await request(t.http)
      .post('/api/projects/1/submittals')
      .set(bearer(consultant))
      .set('Content-Type', `multipart/form-data; boundary=${boundary}`)
      .send(body);
    expect(res.status).toBe(201);
    const { fileName, download } = await storedAndDownloaded(res.body.submittalId as number);
    expect(fileName).toBe('梁 (1).json');
    expect(download.status).toBe(200);
    expect(download.headers['content-disposition']).toBe(
      `attachment; filename="_ (1).json"; filename*=UTF-8''%E6%A2%81%20%281%29.json`,
    );
    expect(JSON.parse(download.text)).toMatchObject({ members: [{ id: 'SP-U2' }] });
  });
});

describe('dimensions no plate could have', () => {
  it('width 1e308: 422 with file, pointer and rule maximum; nothing stored', async () => {
    const res = await upload(
      'huge.json',
      withMember('SP-HUGE', (m) => (m.width = 1e308)),
    );
    expect(res.status).toBe(422);
    expect(res.body).toEqual({
      statusCode: 422,
      error: 'Unprocessable Entity',
      message: '1 of 1 file(s) are invalid (1 error(s)); nothing was stored.',
      details: [
        {
          file: 'huge.json',
          pointer: '/members/0/width',
          line: expect.any(Number),
          column: expect.any(Number),
          rule: 'maximum',
          message: '/members/0/width: must be at most 100000 (rule maximum)',
        },
      ],
    });
  });

  it('stresses and forces past their bounds: one error each', async () => {
    const file = withMember('SP-HUGE', (m) => {
      m.material = { grade: 'A36', Fy: 1e308, Fu: 5000 };
      m.load = { directions: ['-x'], required: 1e9 };
    });
    const res = await upload('forces.json', file);
    expect(res.status).toBe(422);
    expect(
      (res.body.details as { pointer: string; rule: string; message: string }[]).map((d) => [
        d.pointer,
        d.rule,
        d.message,
      ]),
    ).toEqual([
      ['/members/0/material/Fy', 'maximum', '/members/0/material/Fy: must be at most 3000 (rule maximum)'],
      ['/members/0/material/Fu', 'maximum', '/members/0/material/Fu: must be at most 3000 (rule maximum)'],
      [
        '/members/0/load/required',
        'maximum',
        '/members/0/load/required: must be at most 1000000 (rule maximum)',
      ],
    ]);
  });

  it('a length string of six digits: 422 (rule pattern)', async () => {
    const res = await upload(
      'long-text.json',
      withMember('SP-HUGE', (m) => (m.thickness = '999999')),
    );
    expect(res.status).toBe(422);
    expect(res.body.details).toEqual([
      expect.objectContaining({ file: 'long-text.json', pointer: '/members/0/thickness', rule: 'pattern' }),
    ]);
  });
});
