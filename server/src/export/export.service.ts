import { Injectable } from '@nestjs/common';
import { IsolationLevel } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/postgresql';
import { Readable } from 'node:stream';
import { ZipFile } from 'yazl';
import { PhotoStorageService } from '../photos/photo-storage.service';
import { asJsonArray, bindings, EXPORT_QUERIES, type ExportKind } from './export-queries';

interface KindRows {
  kind: ExportKind;
  count: number;
  json: string;
}

/** What `manifest.json` in the archive says. */
export interface ExportManifest {
  format: 'broodsilk-export';
  version: 1;
  exportedAt: string;
  keeperId: string;
  /** Rows per file, e.g. `{ "animals.json": 12 }`. */
  counts: Record<string, number>;
  photoFiles: number;
}

@Injectable()
export class ExportService {
  constructor(
    private readonly em: EntityManager,
    private readonly photos: PhotoStorageService,
  ) {}

  /**
   * The keeper's data as a zip stream. Every kind is read first, in one read-only snapshot (so the
   * files agree with each other); the photo files are then fetched one at a time while the archive
   * streams out, so memory holds one photo, not all of them.
   */
  async archive(userId: string): Promise<Readable> {
    const kinds = await this.em.transactional((tx) => this.readAll(tx, userId), { isolationLevel: IsolationLevel.REPEATABLE_READ, readOnly: true });
    const photoFiles = (JSON.parse(kinds.find((k) => k.kind === 'photos')!.json) as { file: string }[]).map((p) => p.file);
    const manifest: ExportManifest = {
      format: 'broodsilk-export',
      version: 1,
      exportedAt: new Date().toISOString(),
      keeperId: userId,
      counts: Object.fromEntries(kinds.map((k) => [`${k.kind}.json`, k.count])),
      photoFiles: photoFiles.length,
    };
    const zip = new ZipFile();
    zip.addBuffer(Buffer.from(JSON.stringify(manifest, null, 2)), 'manifest.json');
    for (const k of kinds) zip.addBuffer(Buffer.from(k.json), `${k.kind}.json`);
    // JPEGs do not shrink under deflate: stored as they are.
    for (const file of photoFiles)
      zip.addReadStreamLazy(file, { compress: false }, (done) => {
        this.photos.get(file).then(
          (body) => done(null, Readable.from([body])),
          (e: unknown) => done(e, Readable.from([])),
        );
      });
    zip.end();
    return zip.outputStream as Readable;
  }

  private async readAll(tx: EntityManager, userId: string): Promise<KindRows[]> {
    const out: KindRows[] = [];
    for (const [kind, query] of Object.entries(EXPORT_QUERIES) as [ExportKind, string][]) {
      const [row] = await tx.getConnection().execute<{ count: number; json: string }[]>(asJsonArray(query), bindings(query, userId));
      out.push({ kind, count: row.count, json: row.json });
    }
    return out;
  }
}
