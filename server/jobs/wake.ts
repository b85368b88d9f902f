// In-process signal from the code that queues jobs to this process's workers, so that an embedded
// worker starts at once instead of at its next poll. Other processes poll.
import { EventEmitter } from 'node:events';

export const localJobs = new EventEmitter();
export const JOBS_SENT = 'sent';
