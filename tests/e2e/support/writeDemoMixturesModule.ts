import fs from 'node:fs';
import { MODULE_PATH, demoMixturesModuleText } from './demoMixturesModule';

fs.writeFileSync(MODULE_PATH, demoMixturesModuleText());
console.log(`wrote ${MODULE_PATH}`);
