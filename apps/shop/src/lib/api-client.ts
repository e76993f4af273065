export {
  api,
  ApiError,
  isApiError,
  detailString,
  errorMessage,
  fetchCurrentUser,
  putFieldErrors,
  shouldRetry,
} from '@fryline/ui/api-client';
