import { describe, expect, it } from 'vitest';
import { backgroundWork } from './background';

describe('work after the answer', () => {
  it('logs a failure instead of throwing, and idle() waits for every task', async () => {
    const logged: string[] = [];
    const work = backgroundWork((message) => logged.push(message));
    let finished = false;
    work.run('Slow mail', () => new Promise((resolve) => setTimeout(() => resolve((finished = true)), 50)));
    work.run('Broken mail', async () => {
      throw new Error('SMTP down');
    });
    await work.idle();
    expect(finished).toBe(true);
    expect(logged).toEqual(['Broken mail failed']);
  });
});
