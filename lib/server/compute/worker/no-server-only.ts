// Stands in for the `server-only` package inside the compute worker bundle: a worker thread is
// server code by construction, and the real package throws outside Next's server bundle.
export {};
