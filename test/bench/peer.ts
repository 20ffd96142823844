// Talks to the numpy peer (test/bench/peers/numpy_peer.py, `--serve` mode):
// one request a line, one timed repetition per reply, so the bench can
// interleave the peer with the JavaScript it is compared with. The peer is
// optional: without python3, numpy or scipy, `startPeer` says why in words.
import { spawn, type ChildProcessWithoutNullStreams } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createInterface } from 'node:readline';
import { fileURLToPath } from 'node:url';

export const PEER_SCRIPT = fileURLToPath(new URL('./peers/numpy_peer.py', import.meta.url));

export interface Peer {
  /** "numpy X scipy Y", as the peer reports it. */
  readonly versions: string;
  /** Sends the depths (every bar 1/12 h); resolves with the peer's sum of them, mm. */
  load(depthsMm: ArrayLike<number>): Promise<number>;
  /** One timed loss pass at `rateMmH`: the peer's wall time and total excess. */
  pass(rateMmH: number): Promise<PeerTiming>;
  /** One timed brentq match of the rate to `targetMm`: wall time and the rate found. */
  phi(targetMm: number): Promise<PeerTiming>;
  close(): void;
}

/** One timed repetition, on either side. */
export interface Timing {
  /** Wall time, ms. */
  readonly ms: number;
  /** Minor page faults taken (fresh memory: slow on a virtual machine). */
  readonly faults: number;
  /** Processor time of the process, ms: what waiting for a core does not add to. */
  readonly cpu: number;
}

export interface PeerTiming extends Timing {
  /** The peer's answer: the total excess (pass) or the rate found (phi). */
  readonly value: number;
}

export type PeerStart = { ok: true; peer: Peer } | { ok: false; reason: string };

/** Starts the peer, or says in a sentence why it cannot run here. */
export async function startPeer(python = 'python3'): Promise<PeerStart> {
  let child: ChildProcessWithoutNullStreams;
  try {
    child = spawn(python, [PEER_SCRIPT, '--serve'], { stdio: ['pipe', 'pipe', 'pipe'] });
  } catch (error) {
    return { ok: false, reason: `${python} could not be started (${String(error)})` };
  }
  const lines = createInterface({ input: child.stdout })[Symbol.asyncIterator]();
  let stderr = '';
  child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
  const exited = new Promise<string>((resolve) => {
    child.on('error', (error: NodeJS.ErrnoException) =>
      resolve(error.code === 'ENOENT' ? `${python} was not found` : String(error)),
    );
    child.on('exit', (code) => resolve(`${python} exited with status ${code} ${stderr.trim()}`.trim()));
  });
  const next = async (): Promise<string> => {
    const line = await Promise.race([lines.next(), exited.then((reason) => ({ done: true, value: reason }))]);
    if (line.done) throw new Error(`the numpy peer stopped: ${String(line.value ?? (await exited))}`);
    return line.value;
  };
  let first: string;
  try {
    first = await next();
  } catch (error) {
    return { ok: false, reason: (error as Error).message.replace(/^the numpy peer stopped: /, '') };
  }
  if (first.startsWith('missing ')) {
    child.kill();
    return { ok: false, reason: `${python} has no ${first.slice('missing '.length)} (the peer needs numpy and scipy)` };
  }
  if (!first.startsWith('ready ')) {
    child.kill();
    return { ok: false, reason: `the peer answered "${first}" instead of "ready"` };
  }
  const ask = async (request: string): Promise<string[]> => {
    child.stdin.write(`${request}\n`);
    const reply = await next();
    if (reply.startsWith('error')) throw new Error(`the numpy peer refused "${request}": ${reply}`);
    return reply.split(' ');
  };
  const timed = async (request: string): Promise<PeerTiming> => {
    const [ms, value, faults, cpu] = await ask(request);
    return { ms: Number(ms), value: Number(value), faults: Number(faults), cpu: Number(cpu) };
  };
  const dir = mkdtempSync(join(tmpdir(), 'raincut-peer-'));
  return {
    ok: true,
    peer: {
      versions: first.slice('ready '.length),
      async load(depthsMm) {
        const path = join(dir, 'depths.f64');
        // Little-endian float64, as the peer reads it (every platform Node runs on here is little-endian).
        writeFileSync(path, new Uint8Array(Float64Array.from(depthsMm).buffer));
        const [, sum] = await ask(`load ${path} ${depthsMm.length}`);
        return Number(sum);
      },
      pass: (rateMmH) => timed(`pass ${rateMmH}`),
      phi: (targetMm) => timed(`phi ${targetMm}`),
      close() {
        child.stdin.end('quit\n');
        rmSync(dir, { recursive: true, force: true });
      },
    },
  };
}
