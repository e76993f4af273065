import { logger } from '../lib/logger.js';

/** Runs `task` every `intervalMs`, never overlapping itself; what it did and its errors are logged (the job's name on each line), never fatal. */
export function every(name: string, intervalMs: number, task: () => Promise<unknown>): () => Promise<void> {
  const log = logger.child({ job: name });
  let running: Promise<unknown> | null = null;
  let stopped = false;
  const timer = setInterval(() => {
    if (running || stopped) return;
    running = task()
      .then((result) => {
        if (didSomething(result)) log.info({ result }, `${name}: done`);
      })
      .catch((err) => log.error({ err }, `${name}: failed`))
      .finally(() => {
        running = null;
      });
  }, intervalMs);
  timer.unref();
  return async () => {
    stopped = true;
    clearInterval(timer);
    await running;
  };
}

/** A run that changed nothing (0, or counts that are all 0) is not worth a line every second. */
function didSomething(result: unknown): boolean {
  if (typeof result === 'number') return result > 0;
  if (result && typeof result === 'object') return Object.values(result).some((v) => typeof v === 'number' && v > 0);
  return false;
}
