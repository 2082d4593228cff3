/**
 * The recording worker: the one recording on show lives here (see recordingKeys.ts) and every long
 * computation on it runs here as a sliced, cancellable job (see jobs.ts): reading or making it, filtering
 * it through the design, the spectrum and the tone levels, what the plot draws, the filtered file, the
 * fixed-point run. Further kinds of job register in recordingJobs.ts.
 */
import { serveJobs, type Endpoint, type JobHandler, type JobRequest, type JobResponse } from './jobs.ts';
import { RECORDING_JOBS } from './recordingJobs.ts';

serveJobs(self as unknown as Endpoint<JobRequest, JobResponse>, RECORDING_JOBS as Record<string, JobHandler>);
