import { localizationTable, restrictionTable } from '../src/reference/localization.js';
let t = Date.now();
restrictionTable(3,6); console.log('res36', Date.now()-t); t=Date.now();
localizationTable(3,6); console.log('loc36', Date.now()-t); t=Date.now();
localizationTable(2,6); console.log('loc26', Date.now()-t);
