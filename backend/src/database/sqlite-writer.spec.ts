import { DatabaseBusyError, WriterQueue } from './sqlite-writer';

const tick = () => new Promise<void>((resolve) => setImmediate(resolve));

describe('WriterQueue', () => {
  it('runs one writer at a time, in the order they asked', async () => {
    const queue = new WriterQueue();
    const events: string[] = [];
    let running = 0;
    let mostAtOnce = 0;
    const writer = (name: string) =>
      queue.run(async () => {
        running += 1;
        mostAtOnce = Math.max(mostAtOnce, running);
        events.push(`start ${name}`);
        await tick();
        await tick();
        events.push(`end ${name}`);
        running -= 1;
        return name;
      });
    const results = await Promise.all(['a', 'b', 'c', 'd'].map(writer));
    expect(results).toEqual(['a', 'b', 'c', 'd']);
    expect(mostAtOnce).toBe(1);
    expect(events).toEqual(['start a', 'end a', 'start b', 'end b', 'start c', 'end c', 'start d', 'end d']);
  });

  it('lets the next writer in after one that failed', async () => {
    const queue = new WriterQueue();
    const failed = queue.run(async () => {
      throw new Error('constraint');
    });
    const next = queue.run(async () => 'next');
    await expect(failed).rejects.toThrow('constraint');
    await expect(next).resolves.toBe('next');
  });

  it('gives up waiting with DatabaseBusyError, and the writers behind still get their turn', async () => {
    jest.useFakeTimers();
    try {
      const queue = new WriterQueue(1000);
      const holder = await queue.acquire();
      const waiting = queue.acquire();
      const behind = queue.acquire();
      jest.advanceTimersByTime(1000);
      await expect(waiting).rejects.toBeInstanceOf(DatabaseBusyError);
      // `behind` also timed out (it waited as long); a fresh writer after the holder releases gets in.
      await expect(behind).rejects.toBeInstanceOf(DatabaseBusyError);
      holder();
      const fresh = queue.acquire();
      jest.advanceTimersByTime(0);
      const release = await fresh;
      expect(typeof release).toBe('function');
      release();
    } finally {
      jest.useRealTimers();
    }
  });
});
