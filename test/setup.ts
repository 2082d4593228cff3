/**
 * Every test file starts as the command line does: with the full design reader installed (the page loads it
 * after its first paint; test/share/schema/reader.test.ts removes it to check the page's path).
 */
import * as fullReader from '../src/share/schema/full.ts';
import { installFullReader } from '../src/share/schema/reader.ts';

installFullReader(fullReader);
