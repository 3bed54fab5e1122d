import { useState } from 'react';
import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { AppProvider } from './provider';
import { createStudio } from './studio';

/** The whole studio client. */
export function App() {
  const [studio] = useState(() => createStudio((routes) => createBrowserRouter(routes)));
  return (
    <AppProvider queryClient={studio.queryClient}>
      <RouterProvider router={studio.router} />
    </AppProvider>
  );
}
