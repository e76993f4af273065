import { useCallback } from 'react';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api as contract, currencyName, currencySymbol, formatCents, SHOP_CURRENCY, type PublicShopView } from '@fryline/schemas';
import { api } from './api-client';

/** The first element of the shop's query key: invalidate it after the owner changes the settings or the logo. */
export const shopQueryRoot = ['shop'] as const;

/** The business the storefront belongs to: its name, logo, currency and terms (`GET /api/shop`), for both apps. */
export const shopQuery = () =>
  queryOptions({ queryKey: [...shopQueryRoot, 'info'] as const, queryFn: () => api.get<PublicShopView>(contract.getShop.path), staleTime: 10 * 60_000 });

/** The shop's public settings, or null while they load (or could not be loaded). */
export function useShop(): PublicShopView | null {
  return useQuery(shopQuery()).data ?? null;
}

/** The shop's currency (ISO 4217); the default one until the settings have loaded. */
export function useCurrency(): string {
  return useShop()?.currency ?? SHOP_CURRENCY;
}

/**
 * Integer cents as text through the one formatter (formatCents in @fryline/schemas): in
 * `currency` when given (an order's own, which it was paid in), else in the shop's.
 */
export function useMoney(currency?: string): (cents: number) => string {
  const shopCurrency = useCurrency();
  currency ??= shopCurrency;
  return useCallback((cents: number) => formatCents(cents, currency), [currency]);
}

/** The shop currency's name in the plural ("dollars", "euros"), to label an amount input in words. */
export function useCurrencyName(): string {
  return currencyName(useCurrency());
}

/** The shop currency's sign ("$", "€", "£", "CA$"), to label an amount input. */
export function useCurrencySign(): string {
  return currencySymbol(useCurrency());
}
