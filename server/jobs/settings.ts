// Job settings from the environment, read when a queue or worker starts. Defaults suit one machine.
export type JobSettings = {
  /** Target patch-steps per shard: a shard is one replicate's run of whole 4,096-patch blocks. */
  shardPatchSteps: number;
  /** Least expiry of a shard job; longer shards get more (see shardExpirySeconds). */
  minExpirySeconds: number;
  /** How often a worker looks for jobs when idle. */
  pollSeconds: number;
  /** How often pg-boss fails expired jobs (retry or dead letter). */
  maintenanceSeconds: number;
  /** Shards one process runs at once, each on its own thread. */
  concurrency: number;
  /** Test only: extra milliseconds each shard takes, to make a worker observably busy. */
  testShardDelayMs: number;
};

const numberFrom = (value: string | undefined, fallback: number): number => (value && Number.isFinite(Number(value)) ? Number(value) : fallback);

export function loadJobSettings(env: NodeJS.ProcessEnv = process.env): JobSettings {
  return {
    shardPatchSteps: numberFrom(env.PATCHCAST_SHARD_PATCH_STEPS, 25_000_000),
    minExpirySeconds: numberFrom(env.PATCHCAST_SHARD_EXPIRY_SECONDS, 120),
    pollSeconds: numberFrom(env.PATCHCAST_JOB_POLL_SECONDS, 0.5),
    maintenanceSeconds: numberFrom(env.PATCHCAST_JOB_MAINTENANCE_SECONDS, 20),
    concurrency: Math.max(1, Math.floor(numberFrom(env.PATCHCAST_WORKER_CONCURRENCY, 1))),
    testShardDelayMs: env.NODE_ENV === 'production' ? 0 : numberFrom(env.PATCHCAST_TEST_SHARD_DELAY_MS, 0),
  };
}

/** Slowest kernel speed we plan for (patch-steps per second), some 50–100× below the measured one (tests/bench). */
const SLOWEST_PATCH_STEPS_PER_SECOND = 1_000_000;

/** Expiry of a shard job: well above its worst time, so only a dead worker's shard is taken again. */
export function shardExpirySeconds(settings: JobSettings, patchSteps: number): number {
  return Math.ceil(Math.max(settings.minExpirySeconds, patchSteps / SLOWEST_PATCH_STEPS_PER_SECOND) + settings.testShardDelayMs / 1000);
}
