// shpjs's CommonJS bundle reads the browser global `self` when it loads; Node has none, so alias it.
const scope = globalThis as { self?: unknown };
scope.self ??= globalThis;
