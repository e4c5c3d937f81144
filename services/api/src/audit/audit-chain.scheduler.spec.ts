import type { Queue } from 'bull';
import { AuditChainJob } from './audit-chain-job';
import { AuditChainScheduler, SEAL_DEBOUNCE_MS } from './audit-chain.scheduler';

describe('AuditChainScheduler.sealSoon', () => {
  beforeEach(() => jest.useFakeTimers());
  afterEach(() => jest.useRealTimers());

  const schedulerWith = (add: jest.Mock) => new AuditChainScheduler({ add } as unknown as Queue);

  it('queues one seal for a burst of writes, and another for the next burst', () => {
    const add = jest.fn().mockResolvedValue({});
    const scheduler = schedulerWith(add);
    for (let i = 0; i < 5; i += 1) scheduler.sealSoon();
    expect(add).not.toHaveBeenCalled();
    jest.advanceTimersByTime(SEAL_DEBOUNCE_MS);
    expect(add).toHaveBeenCalledTimes(1);
    expect(add).toHaveBeenCalledWith(AuditChainJob.Seal, {}, expect.anything());

    scheduler.sealSoon();
    jest.advanceTimersByTime(SEAL_DEBOUNCE_MS);
    expect(add).toHaveBeenCalledTimes(2);
  });

  it('drops a pending seal when the module stops (the every-minute job catches up)', () => {
    const add = jest.fn().mockResolvedValue({});
    const scheduler = schedulerWith(add);
    scheduler.sealSoon();
    scheduler.onModuleDestroy();
    jest.advanceTimersByTime(SEAL_DEBOUNCE_MS * 2);
    expect(add).not.toHaveBeenCalled();
  });
});
