import type { ReactNode } from 'react';

/** The frame around sign-in and account pages: the brand on the left, the form on the right. */
export function AuthFrame({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="grid min-h-screen md:grid-cols-[2fr_3fr]">
      <div className="flex flex-col justify-between bg-cellar-800 p-8 text-white">
        <div className="flex items-center gap-3">
          <img src="/kettle.svg" alt="" className="h-10 w-10" />
          <span className="text-2xl font-bold tracking-tight">Kettlewright</span>
        </div>
        <p className="mt-8 max-w-sm text-lg text-cellar-100">
          Recipes that scale, brew days on record, and beer the taproom can talk about.
        </p>
      </div>
      <main className="flex items-center justify-center p-6">
        <div className="w-full max-w-md">
          <h1 className="mb-6 text-3xl font-bold tracking-tight">{title}</h1>
          {children}
        </div>
      </main>
    </div>
  );
}
