import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { computePay, DomainError, type PayInput } from '@tressury/domain';

function fail(message: string): never {
  process.stderr.write(`${message}\n`);
  process.exit(1);
}

const [file] = process.argv.slice(2);
if (!file) fail('usage: npm run pay -- <pay-input.json>');

// npm runs scripts from the repository root; resolve the path from where the user typed the command.
const path = resolve(process.env.INIT_CWD ?? process.cwd(), file);
let input: unknown;
try {
  input = JSON.parse(readFileSync(path, 'utf8'));
} catch (error) {
  fail(`cannot read ${path}: ${error instanceof Error ? error.message : String(error)}`);
}

try {
  process.stdout.write(`${JSON.stringify(computePay(input as PayInput), null, 2)}\n`);
} catch (error) {
  if (error instanceof DomainError) fail(`invalid pay input at ${error.field ?? '(the input itself)'} [${error.code}]: ${error.message}`);
  throw error;
}
