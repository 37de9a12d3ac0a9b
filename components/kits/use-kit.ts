"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { ApiError, apiJson } from "@/lib/http/client";
import type { KitJson } from "@/lib/kits/answers";

// The kit a builder screen shows, shared by every section of the page through react-query:
// any section that changes the kit puts the API's answer (the whole kit, check included)
// back into the cache, and every other section (the verdict, a deck picture) follows.

export const kitKey = (id: string) => ["kit", id] as const;

/** The live kit; the page seeds it with the server's answer, so there is no first fetch. */
export function useKit(id: string, initial?: KitJson) {
  return useQuery({ queryKey: kitKey(id), queryFn: () => apiJson<KitJson>(`/api/v1/kits/${id}`), initialData: initial, staleTime: 30_000 });
}

/**
 * A change to the kit through the API. The answer is either the kit itself or an object
 * holding it (`{ kit, … }`); either way the cache takes the new kit.
 */
export function useKitChange<V, R = KitJson>(id: string, send: (vars: V) => Promise<R>) {
  const client = useQueryClient();
  return useMutation<R, ApiError, V>({
    mutationFn: send,
    onSuccess: (answer) => {
      const kit = (answer as { kit?: KitJson }).kit ?? (answer as KitJson);
      if (kit && (kit as KitJson).id === id) client.setQueryData(kitKey(id), kit);
    },
  });
}

export { ApiError, apiJson };
