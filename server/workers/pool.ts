import { availableParallelism } from 'node:os';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { createRequire } from 'node:module';
import { Piscina } from 'piscina';
import { InputError } from '@shared/errors';
import { HttpError } from '../errors';
import type { HeavyResult, HeavyTask } from './heavy.worker';

// One bounded pool of worker threads for the whole process, and a bounded queue in front of it: past the queue
// a request gets 503 with Retry-After at once instead of everyone waiting longer.

export interface WorkerPoolOptions {
  threads: number;
  queue: number;
}

const require = createRequire(import.meta.url);
// The workers load TypeScript the way the server does (tsx), whatever loader started this process.
const TSX = pathToFileURL(require.resolve('tsx')).href;

export function defaultPoolOptions(): WorkerPoolOptions {
  // One core stays with the event loop where there are several; at least two workers so one long plan does not
  // hold every PDF back.
  return { threads: Math.max(2, Math.min(4, availableParallelism() - 1)), queue: 16 };
}

export class WorkerPool {
  private readonly piscina: Piscina;
  private cancelled = 0;

  constructor(readonly options: WorkerPoolOptions = defaultPoolOptions()) {
    this.piscina = new Piscina({
      filename: fileURLToPath(new URL('./heavy.worker.ts', import.meta.url)),
      execArgv: ['--import', TSX],
      minThreads: 1,
      maxThreads: options.threads,
      maxQueue: options.queue,
      idleTimeout: 60_000,
      // A task that runs away with memory ends its worker, never the server.
      resourceLimits: { maxOldGenerationSizeMb: 768 },
    });
  }

  /** Runs a task; aborting `signal` (the client left) ends it. InputError comes back as 422, a full queue as 503. */
  async run<T>(task: HeavyTask, signal?: AbortSignal): Promise<T> {
    if (this.piscina.queueSize >= this.options.queue) throw busy();
    let result: HeavyResult<T>;
    try {
      result = (await this.piscina.run(task, { signal })) as HeavyResult<T>;
    } catch (err) {
      if (err instanceof Error && /queue is at limit/i.test(err.message)) throw busy();
      if (signal?.aborted) this.cancelled++;
      throw err;
    }
    if (!result.ok) throw new InputError(result.field, result.message);
    return result.value;
  }

  get stats(): { queued: number; threadIds: number[]; cancelled: number } {
    return { queued: this.piscina.queueSize, threadIds: this.piscina.threads.map((t) => t.threadId), cancelled: this.cancelled };
  }

  close(): Promise<void> {
    return this.piscina.destroy();
  }
}

function busy(): HttpError {
  const err = new HttpError('unavailable', 'The server is busy with other plans and documents; try again in a few seconds');
  err.retryAfterS = 5;
  return err;
}

/** An AbortSignal that fires when the client goes away before the response is sent. */
export function clientGone(res: { on(event: 'close', fn: () => void): unknown; writableEnded: boolean }): AbortSignal {
  const stop = new AbortController();
  res.on('close', () => {
    if (!res.writableEnded) stop.abort();
  });
  return stop.signal;
}
