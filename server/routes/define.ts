import type { Request, RequestHandler, Response } from 'express'
import type { User } from 'lucia'
import type { ZodType } from 'zod'
import type { Role } from '../../shared/schema/api/common'
import type { AppDeps } from '../deps'

export type HttpMethod = 'get' | 'post' | 'put' | 'patch' | 'delete'

/** Who may call a route: anyone, any signed-in user, or signed-in users with one of the roles. */
export type Access = 'public' | 'signed-in' | readonly Role[]

export interface RouteContext<A extends Access, P, Q, B> {
  req: Request
  res: Response
  deps: AppDeps
  /** The signed-in user; never null unless the route is public. */
  user: A extends 'public' ? User | null : User
  params: P
  query: Q
  body: B
}

/**
 * One API route: method, path (Express 5 syntax), who may call it, zod schemas for params /
 * query / body (validated before `handle` runs; failures are 400s naming the field), optional
 * extra middleware (`before`, e.g. a rate limiter or multer), and the handler, which writes the
 * response with `ctx.res`.
 */
export interface RouteDef<A extends Access = Access, P = unknown, Q = unknown, B = unknown> {
  method: HttpMethod
  path: string
  access: A
  /** One line for docs and the route list. */
  summary: string
  params?: ZodType<P>
  query?: ZodType<Q>
  body?: ZodType<B>
  /** Middleware run after the access check and before validation, given the app's deps. */
  before?: (deps: AppDeps) => RequestHandler[]
  handle: (ctx: RouteContext<A, P, Q, B>) => Promise<void> | void
}

/** Identity helper that infers the schema types into `handle`'s context. */
export function defineRoute<const A extends Access, P = Record<string, never>, Q = Record<string, never>, B = undefined>(
  def: RouteDef<A, P, Q, B>,
): RouteDef<A, P, Q, B> {
  return def
}

// Routes of many shapes live in one list; their own types are checked where they are defined.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type AnyRoute = RouteDef<any, any, any, any>
