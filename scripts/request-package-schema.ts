// npm run schema:request-package: writes the design request package's JSON Schema from its zod schema.
import { writeFileSync } from 'node:fs';
import { requestPackageJsonSchema } from '@/shared/schemas/requests/package';

const target = 'docs/design-request-package.schema.json';
writeFileSync(target, `${JSON.stringify(requestPackageJsonSchema(), null, 2)}\n`);
console.log(`Wrote ${target}`);
