import "server-only";
import { notFound } from "next/navigation";
import { getDb } from "@/db";
import { AppError } from "@/lib/errors";
import { getRig } from "@/lib/server/rigs/rigs-dal";
import { requireWorkContext } from "@/lib/server/work-context";

/** The rig for a page, or the 404 page (also for another organisation's rig). */
export async function loadRig(rigId: string, path: string) {
  const context = await requireWorkContext(path);
  try {
    return { ...context, saved: await getRig(getDb(), context.user, rigId) };
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}
