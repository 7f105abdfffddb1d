import '@fontsource/source-sans-3/400.css';
import '@fontsource/source-sans-3/600.css';
import '@fontsource/source-sans-3/700.css';
import '@fontsource/roboto-mono/400.css';
import '@fontsource/roboto-mono/500.css';
import '@blueprintjs/core/lib/css/blueprint.css';
import '@blueprintjs/table/lib/css/table.css';
import '@/styles/app.css';

import { BlueprintProvider, FocusStyleManager } from '@blueprintjs/core';
import { QueryClientProvider } from '@tanstack/react-query';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import { queryClient } from '@/app/queryClient';
import { router } from '@/app/router';
import { AgeScaleProvider } from '@/modules/ages/components/AgeScaleProvider';

// Focus rings for keyboard users only.
FocusStyleManager.onlyShowFocusOnTabs();

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');

createRoot(root).render(
  <StrictMode>
    <BlueprintProvider>
      <QueryClientProvider client={queryClient}>
        <AgeScaleProvider>
          <RouterProvider router={router} />
        </AgeScaleProvider>
      </QueryClientProvider>
    </BlueprintProvider>
  </StrictMode>,
);
