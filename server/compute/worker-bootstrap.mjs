// Entry of a compute worker thread. Worker threads do not inherit tsx's loader, so this one
// plain-JavaScript file registers it and then hands piscina the TypeScript worker's job function.
import { register } from 'tsx/esm/api';

register();
const worker = await import('./compute-worker.ts');

export default worker.default;
