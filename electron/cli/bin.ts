import { cliMain } from './main';

await cliMain();
