import { Injectable } from '@nestjs/common';
import type { Request, RequestHandler, Response } from 'express';
import { AppConfig } from '../../config/app-config.service';
import { createCsrfProtection, type CsrfProtection } from './csrf';

/** One CSRF protection per app, keyed by SESSION_SECRET. */
@Injectable()
export class CsrfService {
  private readonly protection: CsrfProtection;

  constructor(config: AppConfig) {
    this.protection = createCsrfProtection(config.get('SESSION_SECRET'), config.secureCookies);
  }

  issueToken(req: Request, res: Response): string {
    return this.protection.issueToken(req, res);
  }

  get middleware(): RequestHandler {
    return this.protection.middleware;
  }
}
