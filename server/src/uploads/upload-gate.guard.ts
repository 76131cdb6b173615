import { BadRequestException, Injectable, RequestTimeoutException, type CanActivate, type ExecutionContext } from '@nestjs/common';
import type { Request, Response } from 'express';
import { GroupPolicy } from '../groups/group.policy';
import type { User } from '../users/user.entity';
import { UploadQuotas, type UploadTicket } from './upload-quotas';

/** The request of an upload that passed the gate, with its quota ticket. */
export type GatedRequest = Request & { user: User; uploadTicket?: UploadTicket };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * Runs before Multer reads a byte of the body (guards run before interceptors): the person must
 * be allowed to upload to the group in the URL, and within their quotas. It also replaces a total
 * time limit with an idle one: an upload that sends nothing for UPLOAD_IDLE_TIMEOUT_SECONDS is cut
 * with a 408, one that keeps sending may take as long as it needs.
 */
@Injectable()
export class UploadGateGuard implements CanActivate {
  constructor(private readonly groups: GroupPolicy, private readonly quotas: UploadQuotas) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const http = context.switchToHttp();
    const req = http.getRequest<GatedRequest>();
    const res = http.getResponse<Response>();
    const groupId = req.params.groupId;
    let ticket: UploadTicket;
    try {
      if (typeof groupId !== 'string' || !UUID.test(groupId)) throw new BadRequestException('groupId must be a UUID');
      await this.groups.authorize(req.user, groupId, 'upload-series');
      const length = Number(req.headers['content-length']);
      ticket = await this.quotas.begin(req.user.id, Number.isFinite(length) ? length : null);
    } catch (refusal) {
      // The body is never read: close the connection after the answer rather than drain what is still coming.
      res.setHeader('Connection', 'close');
      throw refusal;
    }
    req.uploadTicket = ticket;
    res.on('close', () => ticket.release());
    const idleMs = this.quotas.limits.idleTimeoutMs;
    req.setTimeout(idleMs, () => {
      if (res.headersSent) return void req.destroy();
      const error = new RequestTimeoutException(`the upload sent nothing for ${idleMs / 1000} s (UPLOAD_IDLE_TIMEOUT_SECONDS) and was cut`);
      res.setHeader('Connection', 'close');
      res.status(408).json(error.getResponse());
      // Multer stops for a destroyed request and removes the part file it was writing.
      res.once('finish', () => req.destroy());
    });
    // Once the body is in, reading and previewing it may take a while without any bytes on the wire.
    req.once('end', () => req.setTimeout(0));
    return true;
  }
}
