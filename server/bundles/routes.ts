// Rollout bundles, admin only: preview what goes in, start a build, stream it (the first time it releases
// the plans; later it is fetched again byte for byte), poll its progress, list a site's past bundles.
import { Router } from 'express';
import { bundleIdParams, bundleListQuery, bundlePreviewQuery, createBundleSchema } from '@/db/requests/bundles';
import type { AppContext } from '../context';
import { currentUser } from '../http/require-role';
import { body, params, query } from '../http/validate';
import { createBundleService } from './service';

export function bundlesRouter(ctx: AppContext): Router {
  const r = Router();
  const bundles = createBundleService(ctx);
  const admin = ctx.requireRole('admin');

  r.get('/bundles/preview', admin, (req, res) => {
    const q = query(req, bundlePreviewQuery);
    res.json(bundles.preview(q.siteId, q.stations ?? null));
  });

  r.get('/bundles', admin, (req, res) => {
    res.json({ items: bundles.list(query(req, bundleListQuery).siteId) });
  });

  r.post('/bundles', admin, (req, res) => {
    res.status(201).json(bundles.create(currentUser(req), body(req, createBundleSchema)));
  });

  r.get('/bundles/:id', admin, (req, res) => {
    res.json(bundles.get(params(req, bundleIdParams).id));
  });

  r.get('/bundles/:id/progress', admin, (req, res) => {
    res.json(bundles.progress(params(req, bundleIdParams).id));
  });

  // A GET, so a plain link or a fetch both work; the first stream of a record is its one download.
  r.get('/bundles/:id/zip', admin, async (req, res) => {
    await bundles.download(currentUser(req), params(req, bundleIdParams).id, res);
  });

  return r;
}
