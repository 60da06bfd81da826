/**
 * What the long-running CLI commands (sweep, merge-shards) read and write,
 * behind one small interface so tests can run them in process. A file output
 * is written under `<name>.partial` and renamed when complete, so a process
 * killed half-way (a batch pod evicted) never leaves a file that looks whole.
 */
import { createReadStream, createWriteStream, readFileSync, renameSync, rmSync, type WriteStream } from 'node:fs';
import { once } from 'node:events';
import { createInterface } from 'node:readline';

export interface OutputSink {
  write(text: string): Promise<void>;
  /** All written: close and put the file in place. */
  commit(): Promise<void>;
  /** Failed: close and remove what was written. */
  abort(): Promise<void>;
}

export interface CliIo {
  /** Whole text of a file ('-' = standard input). */
  readText(path: string): string;
  /** Lines of a file, streamed. */
  readLines(path: string): AsyncIterable<string>;
  /** A sink for an output ('-' = standard output). */
  output(path: string): OutputSink;
  stderr: { write(text: string): void; isTTY?: boolean };
  env: NodeJS.ProcessEnv;
}

function streamSink(stream: NodeJS.WritableStream | WriteStream, close: () => Promise<void>, remove: () => Promise<void>): OutputSink {
  return {
    async write(text) {
      if (!stream.write(text)) await once(stream, 'drain');
    },
    commit: close,
    abort: remove,
  };
}

export function nodeIo(): CliIo {
  return {
    readText: (path) => readFileSync(path === '-' ? 0 : path, 'utf8'),
    readLines: (path) => createInterface({ input: path === '-' ? process.stdin : createReadStream(path, 'utf8'), crlfDelay: Infinity }),
    output(path) {
      if (path === '-') return streamSink(process.stdout, async () => {}, async () => {});
      const partial = `${path}.partial`;
      const file = createWriteStream(partial);
      const closed = async () => {
        if (!file.closed) {
          file.end();
          await once(file, 'close');
        }
      };
      return streamSink(
        file,
        async () => {
          await closed();
          renameSync(partial, path);
        },
        async () => {
          await closed();
          rmSync(partial, { force: true });
        },
      );
    },
    stderr: process.stderr,
    env: process.env,
  };
}
