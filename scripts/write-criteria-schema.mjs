// Rewrite criteria/schema.json from the zod schema. Run after `npm run build`:
//   node scripts/write-criteria-schema.mjs
import { writeFileSync } from 'node:fs';
import { criteriaJsonSchema } from '../dist/criteria/json-schema.js';

const target = new URL('../criteria/schema.json', import.meta.url);
writeFileSync(target, `${JSON.stringify(criteriaJsonSchema(), null, 2)}\n`);
console.log(`wrote ${target.pathname}`);
