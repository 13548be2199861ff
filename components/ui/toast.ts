// Toasts follow a person's action, and the toast area (lazy-toaster.tsx)
// loads the toast library after the page is interactive: pages raise toasts
// through this module, which reaches the same library when a toast is raised,
// so it is not part of their first load (DEVELOPERS.md, "Page weight").
import type { toast as libraryToast } from "sonner";

type Args = Parameters<typeof libraryToast.success>;
const load = () => import("sonner");

export const toast = {
  success: (...args: Args) => void load().then((m) => m.toast.success(...args)),
  error: (...args: Args) => void load().then((m) => m.toast.error(...args)),
};
