// The React pieces both front ends share. The API client, the formatters,
// sign-in links and the page-change helper have sub-path exports of their
// own (`@fryline/ui/api-client`, …), so a module that needs no React pulls none.
export { ConfirmDialog } from './confirm-dialog';
export { FieldShell, fieldAria } from './field-shell';
export { ModalDialog } from './modal-dialog';
export { PageErrorBoundary } from './page-error-boundary';
export { ErrorState, LoadingState, Notice } from './status';
export { MenuPhoto } from './menu-photo';
