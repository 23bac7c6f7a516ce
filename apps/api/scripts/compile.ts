// Compiles the API with tsc plus @nestjs/swagger's compiler plugin, which reads the DTO and
// controller types and writes their OpenAPI metadata (the job the Nest CLI would otherwise do).
import { before as swaggerPlugin } from '@nestjs/swagger/plugin';
import ts from 'typescript';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const configPath = resolve(root, 'tsconfig.build.json');
const config = ts.getParsedCommandLineOfConfigFile(configPath, {}, { ...ts.sys, onUnRecoverableConfigFileDiagnostic: (d) => { throw new Error(ts.flattenDiagnosticMessageText(d.messageText, '\n')); } });
if (!config) throw new Error(`cannot read ${configPath}`);

const program = ts.createProgram({ rootNames: config.fileNames, options: config.options, projectReferences: config.projectReferences });
const plugin = swaggerPlugin({ introspectComments: true, classValidatorShim: true, dtoFileNameSuffix: ['.dto.ts', '.view.ts'] }, program);
const result = program.emit(undefined, undefined, undefined, false, { before: [plugin] });
const diagnostics = [...ts.getPreEmitDiagnostics(program), ...result.diagnostics];
if (diagnostics.length > 0) {
  process.stderr.write(ts.formatDiagnosticsWithColorAndContext(diagnostics, { getCanonicalFileName: (f) => f, getCurrentDirectory: () => root, getNewLine: () => '\n' }));
  process.exit(1);
}
