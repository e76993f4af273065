import { BrowserRouter } from 'react-router-dom';
import { Providers } from './providers';
import { StaffGate } from './staff-gate';
import { AppRoutes } from './router';

export function App() {
  return (
    <Providers>
      <StaffGate>
        <BrowserRouter basename="/staff">
          <AppRoutes />
        </BrowserRouter>
      </StaffGate>
    </Providers>
  );
}
