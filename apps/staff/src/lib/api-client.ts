export { api, ApiError, isApiError, errorMessage, fetchCurrentUser, putFieldErrors, shouldRetry } from '@fryline/ui/api-client';
