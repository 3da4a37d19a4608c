/**
 * The batch progress bar: drawn on stderr only when stderr is a terminal (never into a pipe, a
 * file or the CSV on stdout), at most ten times a second, and erased when the run ends.
 */
export interface Progress {
  update(done: number): void;
  end(): void;
}

const WIDTH = 30;

export function progressBar(total: number, stream: NodeJS.WriteStream = process.stderr): Progress {
  if (!stream.isTTY || total === 0) return { update() {}, end() {} };
  let last = 0;
  const draw = (done: number) => {
    const filled = Math.round((done / total) * WIDTH);
    stream.write(`\r[${'#'.repeat(filled)}${'.'.repeat(WIDTH - filled)}] ${done}/${total} rows`);
  };
  return {
    update(done) {
      const now = Date.now();
      if (now - last < 100 && done < total) return;
      last = now;
      draw(done);
    },
    end() { stream.write(`\r${' '.repeat(WIDTH + 2 * String(total).length + 10)}\r`); },
  };
}
