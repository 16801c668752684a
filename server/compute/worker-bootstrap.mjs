// Entry of a compute worker thread. Worker threads do not inherit tsx's loader, so this one
// plain-JavaScript file registers it and then loads the TypeScript worker named in workerData.
import { workerData } from 'node:worker_threads';
import { register } from 'tsx/esm/api';

register();
await import(workerData.entry);
