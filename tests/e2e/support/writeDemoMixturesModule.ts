import fs from 'node:fs';
import { MODULE_PATH, SPECTRA_MODULE_PATH, demoMixturesModuleText, demoSpectraModuleText } from './demoMixturesModule';

fs.writeFileSync(MODULE_PATH, demoMixturesModuleText());
console.log(`wrote ${MODULE_PATH}`);
fs.writeFileSync(SPECTRA_MODULE_PATH, demoSpectraModuleText());
console.log(`wrote ${SPECTRA_MODULE_PATH}`);
