import { Route, Routes } from 'react-router-dom';
import { sections } from '../config/sections';
import { StaffLayout } from './layout/staff-layout';
import { HomeRoute } from './routes/home-route';
import { SectionRoute } from './routes/section-route';
import { NotFoundRoute } from './routes/not-found-route';
import { BakeDayOrdersRoute } from './routes/bake-day-orders-route';
import { RoleGuard } from './session/role-guard';
import { AnnounceBakeDayPage } from '../features/bake-days/components/announce-bake-day-page';
import { EditBakeDayRoute } from './routes/edit-bake-day-route';

/** Every section's route exists for every role; the guard explains when one is not theirs. */
export function AppRoutes() {
  return (
    <Routes>
      <Route element={<StaffLayout />}>
        <Route index element={<HomeRoute />} />
        {sections.map((section) => (
          <Route key={section.path} path={section.path} element={<SectionRoute section={section} />} />
        ))}
        <Route
          path="bake-days/new"
          element={
            <RoleGuard minRole="owner">
              <AnnounceBakeDayPage />
            </RoleGuard>
          }
        />
        <Route path="bake-days/:bakeDayId" element={<BakeDayOrdersRoute />} />
        <Route path="bake-days/:bakeDayId/edit" element={<EditBakeDayRoute />} />
        <Route path="*" element={<NotFoundRoute />} />
      </Route>
    </Routes>
  );
}
