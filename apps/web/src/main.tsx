import '@blueprintjs/core/lib/css/blueprint.css';
import './theme/fonts';
import './theme/theme';
import './theme/tokens.css';
import './theme/base.css';
import './app/app.css';
import { FocusStyleManager } from '@blueprintjs/core';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { createBrowserRouter } from 'react-router';
import { App } from './app/app';
import { createRoutes } from './app/routes';
import { createQueryClient } from './lib/query-client';

// Focus rings for keyboard users only; a mouse click leaves no outline behind.
FocusStyleManager.onlyShowFocusOnTabs();

const queryClient = createQueryClient();
const router = createBrowserRouter(createRoutes(queryClient));

createRoot(document.getElementById('root') as HTMLElement).render(
  <StrictMode>
    <App queryClient={queryClient} router={router} />
  </StrictMode>,
);
