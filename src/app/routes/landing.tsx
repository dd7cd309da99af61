import { Link } from 'react-router';
import { paths, roleHome } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';

const steps = [
  {
    title: 'Tell us about the site',
    text: 'Your address, the road, the entrance you want and a few photos of where it goes. It takes about ten minutes and saves as you go.',
  },
  {
    title: 'We visit and survey',
    text: 'The office books a visit, measures the ground along the new driveway, the ditch and how far a driver can see each way.',
  },
  {
    title: 'We check it against the road rules',
    text: 'Every road authority limits how steep the entrance may be next to the road, the culvert under it and the sight distance. You see the result in plain words.',
  },
  {
    title: 'Permit, then the crew builds it',
    text: 'We file the access permit. Once the road authority grants it, a crew schedules the work, builds to the checked grades and measures the result.',
  },
];

export function Component() {
  const me = useMe().data;
  return (
    <div className="space-y-10">
      <section className="grid gap-8 rounded-xl bg-pine-800 px-6 py-10 text-white md:grid-cols-[3fr_2fr] md:px-10">
        <div>
          <h1 className="text-3xl font-bold leading-tight sm:text-4xl">
            A new driveway entrance onto a county or town road, done right the first time.
          </h1>
          <p className="mt-4 max-w-xl text-pine-100">
            Before anyone digs where your driveway meets a public road, the road authority has to grant an access
            permit, and its rules decide how steep the entrance may be, what culvert goes under it and whether drivers
            can see you pulling out. Gradepass is how our office takes your request from a few photos to a permitted,
            built and measured entrance, and keeps you posted at every step.
          </p>
          <div className="mt-6 flex flex-wrap gap-3">
            {me ? (
              <Link to={roleHome(me.role)} className="rounded-md bg-tape px-5 py-3 font-semibold text-pine-900">
                Go to my work
              </Link>
            ) : (
              <Link to={paths.signIn.getHref()} className="rounded-md bg-tape px-5 py-3 font-semibold text-pine-900">
                Sign in to start a request
              </Link>
            )}
          </div>
        </div>
        <ProfileSketch />
      </section>
      <section aria-labelledby="how">
        <h2 id="how" className="text-2xl font-bold text-pine-900">
          How it works
        </h2>
        <ol className="mt-4 grid gap-4 md:grid-cols-4">
          {steps.map((step, index) => (
            <li key={step.title} className="rounded-lg border border-stone-200 bg-white p-4">
              <p className="font-mono text-sm font-bold text-clay">Step {index + 1}</p>
              <h3 className="mt-1 font-bold text-pine-900">{step.title}</h3>
              <p className="mt-2 text-sm text-stone-700">{step.text}</p>
            </li>
          ))}
        </ol>
      </section>
      <section className="rounded-lg border border-tape bg-amber-50 p-5 text-sm text-amber-950">
        <h2 className="text-lg font-bold">Safety comes first</h2>
        <p className="mt-1">
          Buried utilities are located before any digging, trenches follow trench-safety rules, and work in the road
          right-of-way has traffic control. Our grade check supports, and never replaces, the road authority’s review,
          local codes and a licensed engineer where one is required.
        </p>
      </section>
    </div>
  );
}

/** A small drawing of the idea: a gentle landing next to the road, then the climb to the house. */
function ProfileSketch() {
  return (
    <svg
      viewBox="0 0 320 180"
      role="img"
      aria-label="Sketch of a driveway profile: a flat landing next to the road, then a steady climb"
      className="w-full"
    >
      <rect x="0" y="0" width="320" height="180" rx="10" fill="#0e2a1f" />
      <path d="M10 140 H70" stroke="#9ca3af" strokeWidth="6" />
      <text x="18" y="160" fill="#b8d3c1" fontSize="11">
        road
      </text>
      <path d="M70 140 L130 136 L300 60" stroke="#f2b33d" strokeWidth="4" fill="none" />
      <path d="M70 150 L70 128 M130 146 L130 124" stroke="#b8d3c1" strokeDasharray="3 3" />
      <text x="78" y="122" fill="#b8d3c1" fontSize="11">
        landing
      </text>
      <text x="190" y="86" fill="#b8d3c1" fontSize="11" transform="rotate(-24 190 86)">
        driveway grade
      </text>
      <ellipse cx="100" cy="150" rx="9" ry="7" fill="none" stroke="#e9efe9" strokeWidth="2" />
      <text x="88" y="172" fill="#b8d3c1" fontSize="10">
        culvert
      </text>
    </svg>
  );
}
