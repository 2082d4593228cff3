/** Every job of the recording worker by kind (the worker serves these; tests serve them on a MessageChannel). */
import type { JobHandler } from './jobs.ts';
import {
  ADOPT_PENDING_JOB,
  GENERATE_JOB,
  LOAD_FILE_JOB,
  adoptPendingJob,
  generateJob,
  loadFileJob,
} from './loadJobs.ts';
import { OUTPUT_JOB, outputJob } from './outputJob.ts';
import { VIEW_JOB, viewJob } from './viewJob.ts';
import { INPUT_SPECTRUM_JOB, inputSpectrumJob } from './spectrumJob.ts';
import { EXPORT_JOB, exportJob } from './exportJob.ts';
import { LEVELS_JOB, levelsJob } from './levelsJob.ts';
import { FIXED_RUN_JOB, fixedRecordingJob } from './fixedRecordingJob.ts';

export const RECORDING_JOBS: Record<string, JobHandler> = {
  [LOAD_FILE_JOB]: loadFileJob as JobHandler,
  [ADOPT_PENDING_JOB]: adoptPendingJob as JobHandler,
  [GENERATE_JOB]: generateJob as JobHandler,
  [OUTPUT_JOB]: outputJob as JobHandler,
  [VIEW_JOB]: viewJob as JobHandler,
  [INPUT_SPECTRUM_JOB]: inputSpectrumJob as JobHandler,
  [EXPORT_JOB]: exportJob as JobHandler,
  [LEVELS_JOB]: levelsJob as JobHandler,
  [FIXED_RUN_JOB]: fixedRecordingJob as JobHandler,
};
