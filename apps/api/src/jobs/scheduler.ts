/** Runs `task` every `intervalMs`, never overlapping itself; errors are logged, not fatal. */
export function every(name: string, intervalMs: number, task: () => Promise<unknown>): () => Promise<void> {
  let running: Promise<unknown> | null = null;
  let stopped = false;
  const timer = setInterval(() => {
    if (running || stopped) return;
    running = task()
      .catch((err) => console.error(`[job ${name}]`, (err as Error).message))
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
