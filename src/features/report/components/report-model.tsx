const MODEL = [
  'Each simulated particle takes a Monte-Carlo random walk: turbulent (eddy) and Brownian diffusion as random steps, plus drift from gravitational settling, the suction of each hood and the background draft.',
  'Walls and ceiling reflect particles; the floor keeps those that settle onto it; general ventilation removes particles from the room by a probability per time step set by the air changes per hour.',
  'A particle counts towards the breathing-zone concentration while it is within the breathing-zone radius of the worker’s nose and mouth; the 8-h TWA spreads the task’s dose over the shift.',
  'The 95 % confidence intervals come from the spread between independent batches of particles; the seed makes every run reproducible.',
];

const LIMITS = [
  'The worker’s body is not in the air: there is no body wake and no shielding of the breathing zone.',
  'No thermal plumes: warm work pieces, motors and people do not lift the dust.',
  'The hood field is an engineering approximation (air drawn toward the face centre at the published centre-line speed); it is exact only on the hood’s centre line, and the real field falls faster off the axis and far from the face.',
  'The draft is uniform and steady; doors, passing traffic and supply jets are not modelled.',
  'Particles do not collide, grow, break up or re-enter the air once settled.',
];

const LISTS = [
  ['How the estimate is made', MODEL],
  ['What the model leaves out', LIMITS],
] as const;

export function ReportModel() {
  return (
    <section aria-labelledby="report-model" className="report-section mt-8 break-inside-avoid">
      <h2 id="report-model">2. Assumptions, the model and its limits</h2>
      <div className="mt-3 grid gap-4 text-sm md:grid-cols-2 print:grid-cols-2">
        {LISTS.map(([title, items]) => (
          <div key={title}>
            <h3 className="mb-1 font-semibold">{title}</h3>
            <ul className="list-disc space-y-1 pl-5">
              {items.map((t) => (
                <li key={t}>{t}</li>
              ))}
            </ul>
          </div>
        ))}
      </div>
    </section>
  );
}
