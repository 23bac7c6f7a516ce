import { DomainError } from '@tressury/domain';
import ExcelJS from 'exceljs';
import { readSpreadsheet, SPREADSHEET_MAX_ROWS, type UploadedSpreadsheet } from './spreadsheet-reader.js';

const XLSX_MIME = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

const csv = (text: string | Buffer, name = 'menu.csv', mimetype = 'text/csv'): UploadedSpreadsheet => {
  const buffer = typeof text === 'string' ? Buffer.from(text, 'utf8') : text;
  return { originalname: name, mimetype, size: buffer.length, buffer };
};

async function xlsx(rows: ExcelJS.CellValue[][], name = 'menu.xlsx', mimetype = XLSX_MIME): Promise<UploadedSpreadsheet> {
  const workbook = new ExcelJS.Workbook();
  const sheet = workbook.addWorksheet('Products');
  for (const row of rows) sheet.addRow(row);
  const buffer = Buffer.from(await workbook.xlsx.writeBuffer());
  return { originalname: name, mimetype, size: buffer.length, buffer };
}

async function refusal(file: UploadedSpreadsheet | undefined): Promise<DomainError> {
  const error = await readSpreadsheet(file).then(
    () => null,
    (caught: unknown) => caught,
  );
  expect(error).toBeInstanceOf(DomainError);
  expect(error).toMatchObject({ kind: 'invalid', field: 'file' });
  return error as DomainError;
}

describe('readSpreadsheet', () => {
  describe('CSV', () => {
    it('gives every cell as the text typed, numbered as the spreadsheet numbers its rows', async () => {
      const sheet = await readSpreadsheet(csv('\uFEFFcode,name,container_cost\nTW-100, Velvet Ash ,8.00\n\nTW-101,"Copper, Warm",0012.50\n'));
      expect(sheet.headers).toEqual(['code', 'name', 'container_cost']);
      expect(sheet.rows).toEqual([
        { row: 2, cells: ['TW-100', 'Velvet Ash', '8.00'] },
        { row: 4, cells: ['TW-101', 'Copper, Warm', '0012.50'] },
      ]);
    });

    // OWASP, "CSV Injection": cells beginning with = + - @ are formulas to a spreadsheet program.
    it('keeps cells that begin with = + - @ as text and evaluates nothing', async () => {
      const sheet = await readSpreadsheet(csv('code,name,cost\n"=1+2",@SUM(A1:A2),+7\n-3,=HYPERLINK("x"),x\n'));
      expect(sheet.rows.map((r) => r.cells)).toEqual([
        ['=1+2', '@SUM(A1:A2)', '+7'],
        ['-3', '=HYPERLINK("x")', 'x'],
      ]);
    });

    it('pads short rows to the width of the sheet', async () => {
      const sheet = await readSpreadsheet(csv('a,b,c\n1\n'));
      expect(sheet.rows).toEqual([{ row: 2, cells: ['1', '', ''] }]);
    });

    it('refuses text that is not UTF-8, naming the file', async () => {
      const error = await refusal(csv(Buffer.from([0x63, 0x6f, 0x64, 0x65, 0x0a, 0x43, 0x61, 0x66, 0xe9, 0x0a])));
      expect(error.message).toMatch(/UTF-8/);
    });
  });

  describe('XLSX', () => {
    it('reads numbers to the 15 digits Excel keeps, dates as ISO dates and rich text as its text', async () => {
      const sheet = await readSpreadsheet(
        await xlsx([
          ['code', 'cost', 'since', 'name'],
          ['TW-1', 0.1 + 0.2, new Date(Date.UTC(2026, 0, 5)), { richText: [{ text: 'Bond ' }, { text: 'Mender' }] }],
          ['TW-2', 12, null, 'Plain'],
        ]),
      );
      expect(sheet.rows).toEqual([
        { row: 2, cells: ['TW-1', '0.3', '2026-01-05', 'Bond Mender'] },
        { row: 3, cells: ['TW-2', '12', '', 'Plain'] },
      ]);
    });

    it('reads a formula cell as its formula text, never its cached result', async () => {
      const sheet = await readSpreadsheet(
        await xlsx([
          ['code', 'cost'],
          ['TW-1', { formula: 'B3*2', result: 16 }],
        ]),
      );
      expect(sheet.rows[0]!.cells).toEqual(['TW-1', '=B3*2']);
    });
  });

  describe('what it refuses, always naming the field "file"', () => {
    it('a missing or empty file', async () => {
      await refusal(undefined);
      await refusal(csv(''));
    });

    it('other file types, and names that do not match the content or the declared type', async () => {
      expect((await refusal(csv('a,b\n1,2\n', 'menu.xls'))).message).toBe('Upload a .csv or .xlsx file.');
      await refusal(csv('a,b\n1,2\n', 'menu.csv', 'image/png'));
      await refusal(csv('a,b\n1,2\n', 'menu.xlsx', XLSX_MIME));
      const workbook = await xlsx([['a'], ['1']]);
      await refusal({ ...workbook, originalname: 'menu.csv', mimetype: 'text/csv' });
    });

    it('a sheet without headings in row 1, or without rows', async () => {
      await refusal(csv('\ncode,name\nA,B\n'));
      await refusal(csv('code,name\n'));
    });

    it(`more than ${SPREADSHEET_MAX_ROWS} rows`, async () => {
      const rows = Array.from({ length: SPREADSHEET_MAX_ROWS + 1 }, (_, i) => `C${i},Name ${i}`).join('\n');
      expect((await refusal(csv(`code,name\n${rows}\n`))).message).toMatch(String(SPREADSHEET_MAX_ROWS));
    });
  });
});
