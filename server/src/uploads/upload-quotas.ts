import { EntityManager } from '@mikro-orm/sqlite';
import { HttpException, HttpStatus, Injectable, PayloadTooLargeException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { APP_CONFIG, type AppConfig, type UploadLimits } from '../config/app-config';
import { UploadedFile } from './uploaded-file.entity';

/** An upload under way: who sends it and how many bytes it has written so far. */
export interface UploadTicket {
  userId: string;
  /** Bytes this upload may still write before the person's staged-bytes quota is reached. */
  budget: number;
  written: number;
  /** The 413 for this upload once it has written more than its budget. */
  overQuota(): PayloadTooLargeException;
  release(): void;
}

const MB = 1024 ** 2;
const mb = (bytes: number) => (bytes < MB ? `${bytes} bytes` : `${(bytes / MB).toFixed(1)} MB`);

/**
 * Per-person upload quotas, counted in this process: uploads at the same time
 * (UPLOAD_CONCURRENT_PER_PERSON) and bytes held in staged uploads plus those under way
 * (UPLOAD_STAGED_BYTES_PER_PERSON). Refusals are 429 / 413 with the numbers.
 */
@Injectable()
export class UploadQuotas {
  private readonly active = new Map<string, Set<UploadTicket>>();
  readonly limits: UploadLimits;

  constructor(private readonly em: EntityManager, config: ConfigService) {
    this.limits = config.getOrThrow<AppConfig>(APP_CONFIG).uploads;
  }

  /** Bytes of a person's staged uploads that nothing was imported from. */
  async stagedBytes(userId: string): Promise<number> {
    const rows = await this.em.find(UploadedFile, { uploadedBy: userId, importedAt: null }, { fields: ['size'] });
    return rows.reduce((sum, r) => sum + r.size, 0);
  }

  /** Takes a place for one more upload, or refuses with the numbers; `declaredBytes` is the request's Content-Length. */
  async begin(userId: string, declaredBytes: number | null): Promise<UploadTicket> {
    const mine = this.active.get(userId) ?? new Set<UploadTicket>();
    if (mine.size >= this.limits.concurrentPerPerson) {
      throw new HttpException(
        `you have ${mine.size} uploads under way; at most ${this.limits.concurrentPerPerson} may run at once (UPLOAD_CONCURRENT_PER_PERSON). Wait for one to finish`,
        HttpStatus.TOO_MANY_REQUESTS,
      );
    }
    const inFlight = [...mine].reduce((sum, t) => sum + t.written, 0);
    const staged = await this.stagedBytes(userId);
    const budget = this.limits.stagedBytesPerPerson - staged - inFlight;
    if (budget <= 0 || (declaredBytes !== null && declaredBytes > budget + 64 * 1024)) {
      throw new PayloadTooLargeException(this.quotaMessage(staged + inFlight, declaredBytes));
    }
    const ticket: UploadTicket = {
      userId,
      budget,
      written: 0,
      overQuota: () => new PayloadTooLargeException(this.quotaMessage(staged + inFlight, ticket.written)),
      release: () => {
        mine.delete(ticket);
        if (mine.size === 0) this.active.delete(userId);
      },
    };
    mine.add(ticket);
    this.active.set(userId, mine);
    return ticket;
  }

  /** The refusal when a person's staged uploads would pass the quota. */
  quotaMessage(heldBytes: number, wantedBytes: number | null): string {
    return `your staged uploads hold ${mb(heldBytes)}${wantedBytes !== null ? ` and this one is ${mb(wantedBytes)}` : ''}; at most ${mb(this.limits.stagedBytesPerPerson)} may wait to be imported (UPLOAD_STAGED_BYTES_PER_PERSON). Import or delete staged uploads first`;
  }
}
