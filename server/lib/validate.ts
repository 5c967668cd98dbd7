import type { Request } from 'express';
import type { z } from 'zod';

/** Parses a part of the request with a shared zod schema; a failure becomes a 400 through the error middleware. */
export const parseBody = <S extends z.ZodType>(schema: S, req: Request): z.infer<S> => schema.parse(req.body ?? {});
export const parseQuery = <S extends z.ZodType>(schema: S, req: Request): z.infer<S> => schema.parse(req.query ?? {});
export const parseParams = <S extends z.ZodType>(schema: S, req: Request): z.infer<S> => schema.parse(req.params ?? {});
