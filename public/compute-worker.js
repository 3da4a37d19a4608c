// Dampbook: the entry of the page's compute worker (src/components/client/off-thread.ts).
// The page's first message names the bundled chunk to load (off-thread-worker.ts), so the worker
// runs the page's own calculator and core code; jobs that arrive while it loads wait for it. A
// plain file, not a blob: the pages' Content-Security-Policy allows scripts from 'self' only.
const early = [];
self.onmessage = (e) => {
  if (e.data && typeof e.data.load === 'string') {
    import(e.data.load).then(
      (m) => { m.serve(self); for (const x of early.splice(0)) self.onmessage(x); },
      (err) => { setTimeout(() => { throw err; }); }, // an error event: the page computes on its own thread
    );
  } else early.push(e);
};
