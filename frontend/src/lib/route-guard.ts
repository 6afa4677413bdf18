import type { LoaderFunctionArgs } from 'react-router';

import type { Role } from '@tracewright/shared';

export type Loader = (args: LoaderFunctionArgs) => Promise<unknown>;

/** Wraps a page loader so the role check runs first (built by app/routes.tsx, used by features). */
export type Guard = (roles: readonly Role[], loader: Loader) => Loader;
