import type { Request } from 'express';
import { z } from 'zod';
import { idSchema } from '@vatside/contracts/workbench-common';
import type { MeasureSystem } from '@vatside/dye-kit';
import { authorizeStudio } from '../auth/authorize.ts';
import type { Database } from '@vatside/db/client';
import { parseInput } from '../http/validate.ts';

// The workbench's two role checks and its id parameters, shared by its routers.

/** Moderators and the host may read the workbench. */
export const workbenchReader = (db: Database, req: Request<{ slug: string }>) =>
  authorizeStudio(db, req, req.params.slug, 'workbench:read');

/** Only the studio's host changes it. */
export const workbenchEditor = (db: Database, req: Request<{ slug: string }>) =>
  authorizeStudio(db, req, req.params.slug, 'workbench:edit');

/** A uuid path parameter; anything else is a 400 naming it. */
export function idParam(req: Request, name: string): string {
  const parsed = parseInput(z.object({ [name]: idSchema }), req.params, 'address');
  return parsed[name] as string;
}

/** Units for computed amounts: the query's choice, else the asker's profile, else US. */
export function measureSystem(req: Request, chosen: MeasureSystem | undefined): MeasureSystem {
  if (chosen) return chosen;
  return req.user?.unitSystem === 'metric' ? 'metric' : 'us';
}
