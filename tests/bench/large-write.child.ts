/** Writes a large benchmark project file: `node --import tsx tests/bench/large-write.child.ts <candidates> <file>`. */
import { writeFileSync } from 'node:fs';
import { largeProject } from './large-project.ts';

writeFileSync(process.argv[3] as string, JSON.stringify(largeProject({ candidates: Number(process.argv[2]) })));
