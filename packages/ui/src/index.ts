// The React pieces both front ends share. The API client, the formatters,
// sign-in links and the page-change helper have sub-path exports of their
// own (`@fryline/ui/api-client`, …), so a module that needs no React pulls none.
export { AppShell, BrandLink } from './app-shell';
export { Caution } from './caution';
export { ConfirmDialog } from './confirm-dialog';
export { FieldShell, fieldAria, type FieldInputProps } from './field-shell';
export { ModalDialog } from './modal-dialog';
export { createQueryClient, mountApp, QueryProvider } from './mount';
export { PageErrorBoundary } from './page-error-boundary';
export { SignOutButton } from './sign-out-button';
export { ErrorState, LoadingState, Notice } from './status';
export { MenuPhoto } from './menu-photo';
export { shopQuery, shopQueryRoot, useCurrency, useCurrencyName, useCurrencySign, useMoney, useShop } from './shop';
