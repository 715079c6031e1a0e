"use client";

import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { toast } from "sonner";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { api } from "@/lib/client/api";

export function LeaveCard({ organisationId, organisationName, userId }: { organisationId: string; organisationName: string; userId: string }) {
  const router = useRouter();
  const [asking, setAsking] = useState(false);
  const leave = useMutation({
    mutationFn: () => api(`/api/organisations/${organisationId}/members/${userId}`, { method: "DELETE" }),
    onSuccess: () => {
      toast.success(`You left ${organisationName}.`);
      router.replace("/plans");
      router.refresh();
    },
    onError: (e) => {
      setAsking(false);
      toast.error(e.message);
    },
  });
  return (
    <Card>
      <CardHeader title="Leave" description="You lose access to this organisation's routes, rigs and plans." />
      <div className="flex flex-wrap items-center gap-3 p-5">
        {asking ? (
          <>
            <span className="text-sm">Leave {organisationName}?</span>
            <Button variant="danger" busy={leave.isPending} onClick={() => leave.mutate()}>Leave</Button>
            <Button variant="ghost" onClick={() => setAsking(false)}>Cancel</Button>
          </>
        ) : (
          <Button variant="secondary" onClick={() => setAsking(true)}>Leave this organisation</Button>
        )}
      </div>
    </Card>
  );
}
