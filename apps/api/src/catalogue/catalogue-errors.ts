import { DomainError } from '@tressury/domain';
import { type FieldProblem, ValidationFailedError } from '../common/validation-failed.error.js';

export const levelNotFound = () => new DomainError('level.not_found', 'No such level.', 'not_found');

export const levelNameTaken = (name: string) =>
  new DomainError('level.name_taken', `A level called "${name}" already exists in this organisation.`, 'conflict', 'name');

export const serviceNotFound = () => new DomainError('service.not_found', 'No such service.', 'not_found');

export const serviceNameTaken = (name: string) =>
  new DomainError('service.name_taken', `A service called "${name}" is already on the menu.`, 'conflict', 'name');

export const productNotFound = () => new DomainError('product.not_found', 'No such product.', 'not_found');

export const productCodeTaken = (code: string) =>
  new DomainError('product.code_taken', `Another product already has the code "${code}".`, 'conflict', 'code');

/** A problem with the file as a whole (its headings), before any row is looked at. */
export const importFileProblem = (message: string) => new DomainError('catalogue.import_file', message, 'invalid', 'file');

export type RowProblem = FieldProblem & { row: number };

/** A committed upload with bad rows: nothing is written, and every bad cell is listed with its row. */
export class ImportRejectedError extends ValidationFailedError {
  constructor(problems: RowProblem[], totalRows: number) {
    super(problems);
    const rows = [...new Set(problems.map((p) => p.row))];
    this.message = `Nothing was saved: ${rows.length} of ${totalRows} rows have errors (row${rows.length === 1 ? '' : 's'} ${rows.join(', ')}).`;
  }
}
