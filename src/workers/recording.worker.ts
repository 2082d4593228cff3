/**
 * The recording worker: long computations on a loaded recording, run as sliced, cancellable jobs (see
 * jobs.ts). Register further kinds of job here.
 */
import { serveJobs, type Endpoint, type JobRequest, type JobResponse } from './jobs.ts';
import { FIXED_RUN_JOB, fixedRecordingJob } from './fixedRecordingJob.ts';

serveJobs(self as unknown as Endpoint<JobRequest, JobResponse>, {
  [FIXED_RUN_JOB]: fixedRecordingJob as never,
});
