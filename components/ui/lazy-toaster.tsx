"use client";
// The toast area, loaded after the page is interactive: in the root layout
// it put the whole toast library on every page's first load, while toasts
// only follow a person's action (pages that raise them load the library
// with their own code anyway). Its colours are Fourpatch's (./toaster).
import dynamic from "next/dynamic";

const Toaster = dynamic(() => import("./toaster").then((m) => m.AppToaster), { ssr: false });

export function LazyToaster() {
  return <Toaster />;
}
