import Link from "next/link";
import { Brand } from "@/components/brand";

export default function NotFound() {
  return (
    <div className="mx-auto flex min-h-dvh max-w-md flex-col items-center justify-center px-4 text-center">
      <Brand className="mb-6" />
      <h1 className="text-2xl font-semibold">Not found</h1>
      <p className="mt-2 text-sm text-ink-muted">This page does not exist, or it belongs to an organisation you are not in.</p>
      <Link href="/" className="mt-6 text-pine-700 underline">Back to the start</Link>
    </div>
  );
}
