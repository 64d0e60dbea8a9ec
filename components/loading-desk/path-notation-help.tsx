/** The path notation, documented where it is typed. */
export function PathNotationHelp() {
  return (
    <details className="rounded-md border border-glaze-line bg-white/70 px-3 py-2 text-sm">
      <summary className="cursor-pointer font-medium">How to write a path</summary>
      <div className="mt-2 space-y-2 text-ink-soft">
        <p>
          One leg per line: the targets reached at the end of the leg, then <code>over</code> and
          the number of increments. Targets move linearly from where the previous leg ended.
        </p>
        <ul className="list-disc space-y-0.5 pl-5">
          <li>
            <code>e11</code>, <code>e22</code>, <code>g12</code> prescribe a strain (mm/mm;{" "}
            <code>g12</code> is the engineering shear strain, 2·e12). A <code>%</code> after the
            number means per cent: <code>ε11=1%</code> is 0.01.
          </li>
          <li>
            <code>s11</code>, <code>s22</code>, <code>s12</code> prescribe a stress in MPa.
          </li>
          <li>A direction you leave out is held at zero stress (free).</li>
          <li>
            <code>repeat N</code> … <code>end</code> runs the legs between N times;{" "}
            <code>grow G</code> scales cycle k (from 0) by 1 + G·k.
          </li>
          <li>
            <code>#</code> starts a note that runs to the end of the line.
          </li>
        </ul>
        <pre className="overflow-x-auto rounded bg-glaze-deep/60 p-2 font-mono text-xs text-ink">
          {`# tension, unload to zero stress, compression
ε11=1% over 100
σ11=0 over 50
ε11=-0.5% over 100

# growing cycles: peaks 0.2 %, 0.4 %, 0.6 %
repeat 3 grow 1
  ε11=0.2% over 60
  σ11=0 over 60
end

# shear with a constant tension of 20 MPa along 11
σ11=20 γ12=1.5% over 200`}
        </pre>
      </div>
    </details>
  );
}
