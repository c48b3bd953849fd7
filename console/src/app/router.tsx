import { createBrowserRouter } from 'react-router-dom';
import { routes } from '@/app/routes';

export const router = createBrowserRouter(routes);
