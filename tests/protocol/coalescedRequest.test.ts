/** One refresh request per pause, and one more after an unanswered one: never a pile. */
import { describe, expect, it } from 'vitest';
import { coalescedRequest } from '../../server/src/coalescedRequest';

const sleep = (ms: number): Promise<void> => new Promise((r) => setTimeout(r, ms));

describe('a coalesced request', () => {
  it('sends asks made within the pause as one request', async () => {
    let sent = 0;
    const ask = coalescedRequest(() => (sent++, Promise.resolve()), 30);
    for (let i = 0; i < 50; i++) ask();
    await sleep(100);
    expect(sent).toBe(1);
  });

  it('turns asks made while a request is unanswered into one more request after it', async () => {
    let sent = 0;
    let answer: () => void = () => undefined;
    const ask = coalescedRequest(() => (sent++, new Promise<void>((r) => (answer = r))), 10);
    ask();
    await sleep(40);
    expect(sent).toBe(1);
    for (let i = 0; i < 20; i++) ask();
    await sleep(40);
    expect(sent).toBe(1); // still unanswered: nothing more goes out
    answer();
    await sleep(40);
    expect(sent).toBe(2);
    answer();
    await sleep(40);
    expect(sent).toBe(2);
  });

  it('keeps working after a request fails', async () => {
    let sent = 0;
    const ask = coalescedRequest(() => (sent++, Promise.reject(new Error('client gone'))), 10);
    ask();
    await sleep(40);
    ask();
    await sleep(40);
    expect(sent).toBe(2);
  });
});
