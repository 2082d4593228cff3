/**
 * The worker that finds the zeros of an FIR's quantized taps (tapZerosJob.ts) for the plane and the magnitude
 * plot, so a long tap set's root finding does not hold up the page. It carries only the job protocol, the root
 * finder and the taps' arithmetic.
 */
import { serveJobs, type Endpoint, type JobHandler, type JobRequest, type JobResponse } from './jobs.ts';
import { TAP_ZEROS_JOB, tapZerosJob } from './tapZerosJob.ts';

serveJobs(self as unknown as Endpoint<JobRequest, JobResponse>, {
  [TAP_ZEROS_JOB]: tapZerosJob as JobHandler,
});
