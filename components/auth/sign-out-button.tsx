"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { api } from "@/lib/client/query";

/** Ends the session on the server, forgets cached data, and goes to the sign-in page. */
export function SignOutButton() {
  const router = useRouter();
  const queryClient = useQueryClient();
  const signOut = useMutation({
    mutationFn: () => api("/api/auth/sign-out", { method: "POST" }),
    // A 401 means the session had ended already: the outcome is the same.
    onSettled: () => {
      queryClient.clear();
      router.replace("/sign-in");
      router.refresh();
    },
  });
  return (
    <Button variant="secondary" pending={signOut.isPending} onClick={() => signOut.mutate()}>
      Sign out
    </Button>
  );
}
