import { createBrowserRouter } from 'react-router-dom';
import { routes } from './routes.tsx';

// The server serves the console under /console/ (see vite.config.ts `base`).
export const router = createBrowserRouter(routes, { basename: '/console' });
