import { createParamDecorator, type ExecutionContext, SetMetadata } from '@nestjs/common';

export const IS_PUBLIC = 'jarday:isPublic';
/** Opts a route out of the global sign-in guard. */
export const Public = () => SetMetadata(IS_PUBLIC, true);

/** Who a verified access token says the caller is. */
export interface AuthUser {
  id: string;
  email: string;
  name: string;
}

export interface AuthedRequest {
  user?: AuthUser;
  headers: Record<string, string | string[] | undefined>;
}

/** The signed-in user of the request (the global guard has set it). */
export const CurrentUser = createParamDecorator((_data: unknown, ctx: ExecutionContext): AuthUser => {
  const req = ctx.switchToHttp().getRequest<AuthedRequest>();
  if (!req.user) throw new Error('CurrentUser used on a public route');
  return req.user;
});
