import Link from 'next/link';
import { Suspense } from 'react';
import { AccountDeletedNotice } from '@/components/account/account-deleted-notice';
import { buttonClass } from '@/components/ui/button';
import { Mark } from '@/components/ui/mark';

const STORIES = [
  {
    who: 'Integrators',
    title: 'Pick the crossover for a sub pairing',
    text: 'Try candidate crossover points for a pair of main speakers and a subwoofer, ranked by how flat they sum, with the sub delay and polarity each one needs. Apply the best to the room and print a Settings sheet for the client and the next service call.',
  },
  {
    who: 'Trainers',
    title: 'Show a class why bass cancels',
    text: 'Build a Lesson of Steps — slopes, polarity, a metre of extra distance at 80 Hz — and run it in the Presenter view with large type, thick lines and animated sweeps. Students open any Step in their own editor.',
  },
  {
    who: 'Enthusiasts',
    title: 'Tune your own room and share it',
    text: 'Lay out your speakers against the recommended angles, predict the room modes at every seat, check headroom against reference level, save the System and send a read-only Share link.',
  },
];

export default function LandingPage() {
  return (
    <div className="mx-auto max-w-6xl px-4 py-10 sm:py-16">
      <Suspense fallback={null}>
        <AccountDeletedNotice />
      </Suspense>
      <div className="flex flex-col gap-6 sm:flex-row sm:items-center">
        <Mark size={72} title="" />
        <div>
          <h1 className="text-3xl font-semibold tracking-tight sm:text-5xl">Make the mains and the subs play as one.</h1>
          <p className="mt-3 max-w-3xl text-lg text-ink-soft">
            Seamline computes what a bass-managed system needs decided — crossover point and slope, sub delay and polarity, room modes and seat response,
            speaker angles and channel trims, headroom against reference level — and keeps each room as one saved System your team can share.
          </p>
        </div>
      </div>
      <div className="mt-8 flex flex-wrap gap-3">
        <Link href="/systems/new" className={buttonClass('primary', 'px-5 py-3 text-base')}>
          Open the editor without an account
        </Link>
        <Link href="/sign-in" className={buttonClass('secondary', 'px-5 py-3 text-base')}>
          Sign in to save and share
        </Link>
      </div>
      <div className="mt-12 grid gap-4 md:grid-cols-3">
        {STORIES.map((s) => (
          <section key={s.who} className="rounded-lg border border-line bg-white p-5">
            <p className="text-xs font-semibold uppercase tracking-wider text-mains">{s.who}</p>
            <h2 className="mt-1 text-lg font-semibold">{s.title}</h2>
            <p className="mt-2 text-sm leading-relaxed text-ink-soft">{s.text}</p>
          </section>
        ))}
      </div>
      <p className="mt-10 max-w-3xl text-xs text-ink-faint">
        Seamline predicts levels; it does not replace a calibrated measurement. Loud playback can damage hearing and equipment. Mounting speakers on walls or
        ceilings and any electrical work follow your local codes and are for licensed professionals.
      </p>
    </div>
  );
}
