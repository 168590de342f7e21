import type { Response } from 'supertest';
import { errorEnvelopeSchema } from '../../../shared/errors';
import type { SignedIn } from '../../helpers/test-app';
import type { Method, RequestSpec } from './route-table';

type Parser = (res: NodeJS.ReadableStream & { destroy(): void }, done: (error: Error | null, body: unknown) => void) => void;

/** For an event stream: the status and first bytes are enough; a JSON error body is still read whole. */
const firstChunk: Parser = (res, done) => {
  const chunks: Buffer[] = [];
  let finished = false;
  const finish = () => {
    if (finished) return;
    finished = true;
    const text = Buffer.concat(chunks).toString('utf8');
    done(null, text.startsWith('{') ? JSON.parse(text) : text);
  };
  res.on('data', (chunk: Buffer) => {
    chunks.push(chunk);
    if (!chunk.toString('utf8').startsWith('{')) {
      finish();
      res.destroy();
    }
  });
  res.on('end', finish);
};

export interface SendOptions {
  csrf?: boolean;
  headers?: Record<string, string>;
}

/** One request as the table or the fuzzer describes it, on a signed-in (or signed-out) agent. */
export async function send(who: SignedIn, method: Method, spec: RequestSpec, options: SendOptions = {}): Promise<Response> {
  let req = who.agent[method.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete'](spec.url);
  if (options.csrf !== false) req = req.set('x-csrf-token', who.csrf);
  for (const [name, value] of Object.entries(options.headers ?? {})) req = req.set(name, value);
  if (spec.form) {
    for (const [name, value] of Object.entries(spec.form.fields)) req = req.field(name, value);
    if (spec.form.file) req = req.attach('file', spec.form.file.content, spec.form.file.name);
  } else if (spec.body !== undefined) {
    req = req.send(spec.body as object);
  }
  if (spec.stream) req = req.buffer(true).parse(firstChunk as never);
  return req;
}

/** What an error body must look like: the envelope, and nothing of the server's insides. */
export function errorBodyProblems(res: Response): string[] {
  const problems: string[] = [];
  if (res.status >= 400 && !errorEnvelopeSchema.safeParse(res.body).success) problems.push(`not the error envelope: ${String(res.text).slice(0, 200)}`);
  const text = typeof res.text === 'string' ? res.text : JSON.stringify(res.body ?? '');
  if (res.status >= 400 && leaksInternals(text)) problems.push(`leaks internals: ${text.slice(0, 300)}`);
  return problems;
}

/** A stack frame, a file path of this machine or of a package, or an error class name. */
export function leaksInternals(text: string): boolean {
  return /\bat [\w.<>]+ \(|\bat (file:\/\/)?\/|\/work\/|node_modules|\.ts:\d+|\.js:\d+|QueryFailedError|TypeError|SqliteError|ZodError/.test(text);
}
