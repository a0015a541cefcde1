"use client";

import { useInfiniteQuery, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/client/api";
import type { Page } from "@/lib/validation/common";
import type { BillingSettingsDto, MembershipDto, OfferDto, RevenueDto, SubscriberDto } from "@/lib/validation/billing";

// Memberships change outside this page (checkout, webhooks): always refetch when a view mounts.
const FRESH = { staleTime: 0, refetchOnMount: "always" } as const;

export const OFFERS_KEY = ["billing", "offers"] as const;
export const SUBSCRIBERS_KEY = ["billing", "subscribers"] as const;
export const REVENUE_KEY = ["billing", "revenue"] as const;
export const SETTINGS_KEY = ["billing", "settings"] as const;
export const MEMBERSHIP_KEY = ["billing", "membership"] as const;

export const useOffers = () => useQuery({ ...FRESH, queryKey: OFFERS_KEY, queryFn: async () => (await api<Page<OfferDto>>("/api/v1/offers")).items });
/** Memberships a page at a time (a club can have hundreds); "Show more" fetches the next. */
export const useSubscribers = () =>
  useInfiniteQuery({
    ...FRESH,
    queryKey: SUBSCRIBERS_KEY,
    queryFn: ({ pageParam }) =>
      api<Page<SubscriberDto>>(`/api/v1/billing/subscribers?${new URLSearchParams({ limit: "50", ...(pageParam ? { cursor: pageParam } : {}) })}`),
    initialPageParam: "",
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });
export const useRevenue = () => useQuery({ ...FRESH, queryKey: REVENUE_KEY, queryFn: () => api<RevenueDto>("/api/v1/billing/revenue") });
export const useBillingSettings = () => useQuery({ ...FRESH, queryKey: SETTINGS_KEY, queryFn: () => api<BillingSettingsDto>("/api/v1/billing/settings") });
export const useMembership = () => useQuery({ ...FRESH, queryKey: MEMBERSHIP_KEY, queryFn: () => api<MembershipDto>("/api/v1/billing/membership") });
