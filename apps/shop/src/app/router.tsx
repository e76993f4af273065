import { lazy } from 'react';
import { Route, Routes } from 'react-router-dom';
import { AppLayout } from './layout/app-layout';
import { HomeRoute } from './routes/home-route';
import { NotFoundRoute } from './routes/not-found-route';
import { SignInPage } from '../features/auth/components/sign-in-page';

// Pages past the front page load on first visit, so the front page stays light.
const BakeDayRoute = lazy(() => import('./routes/bake-day-route').then((m) => ({ default: m.BakeDayRoute })));
const ClaimRoute = lazy(() => import('./routes/claim-route').then((m) => ({ default: m.ClaimRoute })));
const OrderRoute = lazy(() => import('./routes/order-route').then((m) => ({ default: m.OrderRoute })));
const ConfirmNewsPage = lazy(() => import('../features/announcements/components/confirm-news-page').then((m) => ({ default: m.ConfirmNewsPage })));
const UnsubscribePage = lazy(() => import('../features/announcements/components/unsubscribe-page').then((m) => ({ default: m.UnsubscribePage })));
const MyOrdersRoute = lazy(() => import('./routes/my-orders-route').then((m) => ({ default: m.MyOrdersRoute })));

/**
 * The shop's pages. A plain <Routes> tree: the pages fetch their own data
 * with React Query, so the router's data layer would only add weight.
 */
export function AppRoutes() {
  return (
    <Routes>
      <Route element={<AppLayout />}>
        <Route index element={<HomeRoute />} />
        <Route path="days/:id" element={<BakeDayRoute />} />
        <Route path="orders" element={<MyOrdersRoute />} />
        <Route path="orders/:id" element={<OrderRoute />} />
        <Route path="claim/:token" element={<ClaimRoute />} />
        <Route path="news/confirm" element={<ConfirmNewsPage />} />
        <Route path="news/unsubscribe" element={<UnsubscribePage />} />
        <Route path="signin" element={<SignInPage />} />
        <Route path="*" element={<NotFoundRoute />} />
      </Route>
    </Routes>
  );
}
