import express, { Router, type ErrorRequestHandler, type Response } from 'express';
import { AppError } from '../../errors/app-error';
import { toAppError } from '../../errors/error-handler';
import { fieldIssues } from '../../errors/validate';
import { counterForm, type ProposalPurpose } from '../../../shared/schemas/proposals';
import { text } from '../../../shared/schemas/common';
import type { GrowerAnswer } from './proposal-emails';
import { isWellFormedToken } from './proposal-tokens';
import { ProposalsService, type ProposalDeps } from './proposals.service';
import {
  answeredPage,
  gonePage,
  proposalPage,
  respondCss,
  troublePage,
  unknownLinkPage,
  type CounterDraft,
} from './respond-pages';

const noteField = text(2000).optional();

/** A counter form that does not parse: shown again with its problems, nothing written. */
class FormProblem extends Error {
  constructor(
    readonly problems: string[],
    readonly draft: CounterDraft,
  ) {
    super('form problem');
  }
}

/** Reads the posted form for the link's purpose. */
function readForm(purpose: ProposalPurpose, body: Record<string, unknown>): GrowerAnswer {
  const draft: CounterDraft = {
    deliveryStartOn: typeof body.deliveryStartOn === 'string' ? body.deliveryStartOn : undefined,
    deliveryEndOn: typeof body.deliveryEndOn === 'string' ? body.deliveryEndOn : undefined,
    colonies: typeof body.colonies === 'string' ? body.colonies : undefined,
    note: typeof body.note === 'string' ? body.note : undefined,
  };
  if (purpose !== 'counter') {
    const note = noteField.safeParse(body.note === '' ? undefined : body.note);
    if (!note.success) throw new FormProblem(['The note is too long or not plain text.'], draft);
    return { kind: purpose, note: note.data?.trim() ?? '' };
  }
  const parsed = counterForm.safeParse({ ...draft, note: draft.note || undefined });
  if (!parsed.success)
    throw new FormProblem(
      fieldIssues(parsed.error).map((i) => `${labels[i.field] ?? i.field}: ${i.message}`),
      draft,
    );
  return {
    kind: 'counter',
    deliveryStartOn: parsed.data.deliveryStartOn,
    deliveryEndOn: parsed.data.deliveryEndOn,
    colonies: parsed.data.colonies ?? null,
    note: parsed.data.note?.trim() ?? '',
  };
}

const labels: Record<string, string> = {
  deliveryStartOn: 'First day',
  deliveryEndOn: 'Last day',
  colonies: 'Colonies',
  note: 'Note',
};

/**
 * /respond: the pages behind e-mailed proposal links. Public (the token is the secret), so it is
 * mounted outside /api: no session is read or created, no CSRF token applies. Opening a link
 * only shows the page; the answer is the form's POST. Pages are never cached or referred.
 */
export function respondRouter(deps: ProposalDeps & { log?: (error: unknown) => void }) {
  const service = new ProposalsService(deps);
  const router = Router();

  router.get('/assets/respond.css', (_req, res) => {
    res.type('text/css').set('Cache-Control', 'public, max-age=3600').send(respondCss);
  });

  router.use((_req, res, next) => {
    res.set({
      'Referrer-Policy': 'no-referrer',
      'Cache-Control': 'no-store',
      'X-Robots-Tag': 'noindex, nofollow',
    });
    next();
  });

  router.get('/:token', async (req, res) => {
    const token = String(req.params.token);
    if (!isWellFormedToken(token)) throw AppError.notFound('Link');
    const { purpose, facts } = await service.viewByLink(token);
    sendPage(res, 200, proposalPage(`/respond/${token}`, purpose, facts));
  });

  router.post(
    '/:token',
    express.urlencoded({ extended: false, limit: '16kb', parameterLimit: 10 }),
    async (req, res) => {
      const token = String(req.params.token);
      if (!isWellFormedToken(token)) throw AppError.notFound('Link');
      const body = (req.body ?? {}) as Record<string, unknown>;
      try {
        const { purpose, facts } = await service.answerByLink(token, (p) => readForm(p, body));
        sendPage(res, 200, answeredPage(purpose, facts));
      } catch (error) {
        if (!(error instanceof FormProblem)) throw error;
        const { purpose, facts } = await service.viewByLink(token);
        sendPage(
          res,
          400,
          proposalPage(`/respond/${token}`, purpose, facts, error.draft, error.problems),
        );
      }
    },
  );

  // Errors here are pages, not JSON; the token never reaches a log line.
  const pages: ErrorRequestHandler = (error, _req, res, next) => {
    if (res.headersSent) return next(error);
    const appError = toAppError(error);
    if (appError.status >= 500 && appError.status !== 503) (deps.log ?? console.error)(error);
    const body =
      appError.status === 404
        ? unknownLinkPage()
        : appError.status === 410
          ? gonePage()
          : troublePage(appError.status);
    sendPage(res.set(appError.headers), appError.status, body);
  };
  router.use(pages);
  return router;
}

function sendPage(res: Response, status: number, body: string) {
  res.status(status).type('html').send(body);
}
