import { localizationTable, restriction } from '../src/reference/localization.js';
import { lrTable } from '../src/reference/lr-rule.js';
console.log(restriction('10','10').toString());
let t = Date.now();
for (let n = 1; n <= 6; n++) for (let k = 0; k <= n; k++) { const T = localizationTable(k, n); }
console.log('loc', Date.now() - t);
t = Date.now(); let c=0;
for (let n = 1; n <= 7; n++) for (let k = 0; k <= n; k++) { c+= lrTable(k, n).size; }
console.log('lr', Date.now() - t, c);
const T = localizationTable(2,4); for (const [k,v] of T) if (k.startsWith('0101,0101')) console.log(k, v.toString());
