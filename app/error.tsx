"use client";

import { Button } from "@/components/ui/button";

export default function ErrorPage({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div className="mx-auto flex min-h-[60dvh] max-w-md flex-col items-center justify-center px-4 text-center">
      <h1 className="text-2xl font-semibold">Something went wrong</h1>
      <p className="mt-2 text-sm text-ink-muted">
        Fadeline could not show this page. Nothing you saved was lost. Try again in a moment.
      </p>
      <Button className="mt-6" onClick={reset}>Try again</Button>
    </div>
  );
}
