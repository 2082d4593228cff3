/** Reading and writing files in chunks through Node streams and file handles, with messages a user can act on. */
import { createReadStream } from 'node:fs';
import { open, type FileHandle } from 'node:fs/promises';
import { UsageError } from '../args.ts';

/** Bytes per read: 256 KiB keeps memory small and the per-chunk overhead negligible. */
export const STREAM_CHUNK_BYTES = 1 << 18;

function reason(e: unknown): string {
  return (e as NodeJS.ErrnoException).code ?? (e as Error).message;
}

/** The file's bytes as a sequence of chunks of at most chunkBytes. */
export async function* fileChunks(path: string, chunkBytes = STREAM_CHUNK_BYTES): AsyncGenerator<Uint8Array> {
  const stream = createReadStream(path, { highWaterMark: chunkBytes });
  try {
    for await (const chunk of stream) yield chunk as Buffer;
  } catch (e) {
    throw new UsageError(`Cannot read the input file ${path}: ${reason(e)}`);
  } finally {
    stream.destroy();
  }
}

/** The file's text as a sequence of UTF-8 chunks (a character split across chunks is kept whole). */
export async function* textChunks(path: string, chunkBytes = STREAM_CHUNK_BYTES): AsyncGenerator<string> {
  const decoder = new TextDecoder('utf-8');
  for await (const chunk of fileChunks(path, chunkBytes)) yield decoder.decode(chunk, { stream: true });
  const rest = decoder.decode();
  if (rest) yield rest;
}

/** Opens a file for writing, truncating it, with a usage error naming the path when that fails. */
export async function openForWriting(path: string): Promise<FileHandle> {
  try {
    return await open(path, 'w');
  } catch (e) {
    throw new UsageError(`Cannot write the output file ${path}: ${reason(e)}`);
  }
}
