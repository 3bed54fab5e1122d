import { AppProvider } from './provider';
import { AppRouter } from './router';

/** The whole studio client. */
export function App() {
  return (
    <AppProvider>
      <AppRouter />
    </AppProvider>
  );
}
