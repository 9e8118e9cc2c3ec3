import { BadRequestException, Injectable, PayloadTooLargeException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { plainToInstance } from 'class-transformer';
import { validate } from 'class-validator';
import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import type { FieldError, ImportResult, Language } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { User } from '../users/user.entity';
import { Species } from '../species/species.entity';
import { Animal } from './animal.entity';
import { lastMoltOf } from './animals.mapper';
import { AnimalsService } from './animals.service';
import { CreateAnimalDto } from './dto/create-animal.dto';
import { resolveAnimalInput, type AnimalValues } from './animal-input';
import { neutraliseCell, restoreCell } from '../common/csv/formula-cells';
import { CSV_COLUMNS, CSV_FIELDS, CSV_MAX_BYTES, CSV_MAX_ROWS } from './animals-csv.columns';
import { refusal, say, type RefusalKey, type RefusalValues } from '../common/refusal';
import { flatten } from '../common/filters/validation-exception.factory';

interface ParsedRow {
  line: number;
  record: Record<string, string>;
}

/**
 * A refused line's problems, said in the reader's language here: the detail's field is the line
 * ("line 5", which the client reads), so the column goes into the sentence and no key is left for
 * the filter. A sentence without a key (a DTO's own) stays as written.
 */
class LineProblems {
  readonly found: { line: number; message: string }[] = [];
  constructor(private readonly lng: Language) {}

  /** A problem in one column of the line. */
  add(line: number, column: string, key: RefusalKey, values?: RefusalValues): void {
    this.addFields(line, [{ field: column, ...refusal(key, values) }]);
  }

  /** Field errors of one line (class-validator's, keyed by the validation factory, or the animal rules'), each with its column. */
  addFields(line: number, errors: FieldError[]): void {
    for (const e of errors) {
      const said = (key: string, values?: FieldError['values']) => this.found.push({ line, message: say(this.lng, key, values) });
      if (e.key === 'refusal.field.notAccepted') said('refusal.csv.unknownColumn', { column: e.field });
      else said('refusal.csv.inColumn', { column: e.field, problem: e.key ? say(this.lng, e.key, e.values) : e.message });
    }
  }

  refusal(): BadRequestException {
    const lines = [...new Set(this.found.map((e) => e.line))];
    const summary = lines.length === 1 ? refusal('csv.problemsOne', { line: lines[0]! }) : refusal('csv.problemsMany', { count: lines.length });
    return new BadRequestException({ ...summary, details: this.found.map((e) => ({ field: `line ${e.line}`, message: e.message })) });
  }
}

@Injectable()
export class AnimalsCsvService {
  constructor(
    private readonly em: EntityManager,
    private readonly animals: AnimalsService,
  ) {}

  /**
   * RFC 4180: header row, CRLF line ends, quotes where needed; UTF-8 with a BOM so spreadsheets read
   * accents. Text a spreadsheet would run as a formula gets an apostrophe, which the import removes.
   */
  async export(viewer: AuthUser): Promise<string> {
    const animals = await this.em.find(Animal, { recordedBy: viewer.id }, { populate: ['species'], orderBy: { label: 'asc' } });
    const rows = animals.map((a) => ({
      ...Object.fromEntries(CSV_FIELDS.map((f) => [f, f === 'speciesId' ? a.species.id : (a[f as keyof Animal] ?? '')])),
      species: a.species.scientificName,
      lastMoltOn: lastMoltOf(a) ?? '',
    }));
    return stringify(rows, {
      header: true,
      columns: [...CSV_COLUMNS],
      record_delimiter: 'windows',
      bom: true,
      cast: { number: String, string: neutraliseCell },
    });
  }

  /** Checks every row like the create route does, then imports all of them in one transaction, or none. */
  async import(viewer: AuthUser, text: string, lng: Language): Promise<ImportResult> {
    if (Buffer.byteLength(text) > CSV_MAX_BYTES) throw new PayloadTooLargeException(refusal('csv.tooLarge'));
    const rows = this.parse(text);
    const today = this.animals.today(viewer);
    const problems = new LineProblems(lng);
    const ready: AnimalValues[] = [];
    const labels = new Map<string, number>();
    const speciesByName = await this.speciesNames();

    for (const { line, record } of rows) {
      const plain: Record<string, string> = {};
      let speciesReported = false;
      for (const [k, v] of Object.entries(record)) if (v !== '' && k !== 'lastMoltOn') plain[k] = v;
      if (plain.species !== undefined) {
        const id = speciesByName.get(plain.species.trim().toLowerCase());
        speciesReported = !id || (plain.speciesId !== undefined && plain.speciesId !== id);
        if (!id) problems.add(line, 'species', 'csv.unknownSpecies', { species: plain.species });
        else if (speciesReported) problems.add(line, 'species', 'csv.speciesMismatch', { species: plain.species });
        else plain.speciesId = id;
        delete plain.species;
      }
      const dto = plainToInstance(CreateAnimalDto, plain);
      const invalid = (await validate(dto, { whitelist: true, forbidNonWhitelisted: true })).filter((e) => !(speciesReported && e.property === 'speciesId'));
      if (invalid.length || speciesReported) {
        problems.addFields(line, flatten(invalid));
        continue;
      }
      const { errors: ruleErrors, values } = await resolveAnimalInput(this.em, viewer, dto, null, today);
      const first = labels.get(dto.label);
      labels.set(dto.label, first ?? line);
      problems.addFields(line, ruleErrors);
      if (first !== undefined) problems.add(line, 'label', 'csv.labelRepeated', { label: dto.label, first });
      if (!ruleErrors.length && first === undefined) ready.push(values);
    }
    if (problems.found.length) throw problems.refusal();
    if (!ready.length) throw new BadRequestException(refusal('csv.noAnimals'));

    await this.em.transactional(async (tx) => {
      const recorder = tx.getReference(User, viewer.id);
      for (const values of ready) tx.create(Animal, { ...values, recordedBy: recorder } as never);
    });
    return { imported: ready.length };
  }

  private parse(text: string): ParsedRow[] {
    let parsed: { record: Record<string, string>; info: { bytes: number } }[];
    try {
      parsed = parse(text, {
        bom: true,
        columns: (header: string[]) => header.map((h) => h.trim()),
        skip_empty_lines: true,
        info: true,
        relax_column_count: false,
        cast: (value, context) => (context.header ? value : restoreCell(value)),
      });
    } catch (e) {
      const err = e as { message?: string; lines?: number };
      throw new BadRequestException(
        err.lines
          ? refusal('csv.notCsvAt', { line: err.lines, why: err.message ?? 'unreadable' })
          : refusal('csv.notCsv', { why: err.message ?? 'unreadable' }),
      );
    }
    if (parsed.length > CSV_MAX_ROWS) throw new PayloadTooLargeException(refusal('csv.tooManyRows', { max: CSV_MAX_ROWS }));
    return numberLines(Buffer.from(text, 'utf8'), parsed);
  }

  private async speciesNames(): Promise<Map<string, string>> {
    const all = await this.em.find(Species, {});
    const map = new Map<string, string>();
    for (const s of all) for (const n of [...s.formerNames, ...s.commonNames]) map.set(n.toLowerCase(), s.id);
    // current names win over a former name that happens to match
    for (const s of all) map.set(s.scientificName.toLowerCase(), s.id);
    return map;
  }
}

const CR = 0x0d;
const LF = 0x0a;

/**
 * The line each record starts on, as an editor shows it (header = line 1), so a quoted field that
 * spans lines or a blank line between records does not shift the count. csv-parse's `info.bytes`
 * is where each record (with its line end) stops.
 */
function numberLines(bytes: Buffer, parsed: { record: Record<string, string>; info: { bytes: number } }[]): ParsedRow[] {
  let pos = bytes.indexOf(LF) + 1;
  let line = 2;
  const out: ParsedRow[] = [];
  for (const { record, info } of parsed) {
    // skip blank lines before the record
    while (pos < bytes.length && (bytes[pos] === CR || bytes[pos] === LF)) {
      if (bytes[pos] === LF || bytes[pos + 1] !== LF) line += 1;
      pos += 1;
    }
    out.push({ line, record });
    for (; pos < info.bytes; pos++) if (bytes[pos] === LF || (bytes[pos] === CR && bytes[pos + 1] !== LF)) line += 1;
  }
  return out;
}
