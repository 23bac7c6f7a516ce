import { Button, NonIdealState } from '@blueprintjs/core';
import { ErrorIcon, LockIcon, SearchIcon } from '@blueprintjs/icons';
import { isRouteErrorResponse, useNavigate, useRevalidator, useRouteError } from 'react-router';
import { ApiError } from '../lib/api-error';
import { routePaths } from '../lib/route-paths';

function describe(error: unknown): { status: number; message: string } {
  if (isRouteErrorResponse(error)) {
    const message = typeof error.data?.message === 'string' ? error.data.message : error.statusText;
    return { status: error.status, message: message || 'This page could not be shown.' };
  }
  if (error instanceof ApiError) return { status: error.status, message: error.message };
  return { status: 500, message: 'Something went wrong while showing this page.' };
}

/** The error state of every page: the server's own words, and a way to try again. */
export function RouteError() {
  const { status, message } = describe(useRouteError());
  const revalidator = useRevalidator();
  const navigate = useNavigate();
  const toOverview = <Button text="Go to the overview" onClick={() => void navigate(routePaths.overview)} />;

  if (status === 403) return <NonIdealState icon={<LockIcon />} title="Not part of your role" description={message} action={toOverview} />;
  if (status === 404) return <NonIdealState icon={<SearchIcon />} title="Nothing here" description={message} action={toOverview} />;
  return (
    <NonIdealState
      icon={<ErrorIcon />}
      title="This page could not be shown"
      description={message}
      action={<Button text="Try again" loading={revalidator.state === 'loading'} onClick={() => void revalidator.revalidate()} />}
    />
  );
}

export function NotFound() {
  const navigate = useNavigate();
  return (
    <NonIdealState
      icon={<SearchIcon />}
      title="Nothing here"
      description="There is no page at this address."
      action={<Button text="Go to the overview" onClick={() => void navigate(routePaths.overview)} />}
    />
  );
}
