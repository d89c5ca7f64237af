package main

import (
	"fmt"
	"io"
	"math"

	"github.com/spf13/cobra"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/export"
	"arcwright/internal/planner"
	"arcwright/internal/units"
)

func newCheckCommand(stdout io.Writer) *cobra.Command {
	var asBuilt, unitsName, format string
	c := &cobra.Command{
		Use:   "check LAYOUT",
		Short: "Check stations and crew positions and exit 3 if any station is blocked or anyone stands in a zone",
		Long: `Run every check of 'arcwright plan' on the layout's stations at fixed
positions and print each station's verdict. With --as-built, positions measured
after set-up replace the planned ones: a CSV file with a header row naming
the columns id, x, y, z (microphone, from the datum) and optionally base_x,
base_y (stand pole) — the station CSV that 'arcwright plan --csv' writes can
be edited into one; values take units, and a bare number is in the layout's
length unit. 'arcwright plan --as-built-template FILE' writes the form to
fill in: the station IDs and only the measured columns. A station the file
leaves out, or whose row is left empty, is listed as not measured (a
warning: only its planned place was checked). The microphone and the stand
base are checked separately: each as-built station shows how far its
microphone and its base are from their planned places, and a microphone
moved without its base (no base measured, or a base whose arm to the
microphone is not the stand's) is flagged. A height column (height_m or
height_ft, as the station CSV has) is read like z; the two must agree.
--format json prints the plan with the as-built positions.

A station is reported ok only if every check passed for every operating
point; a station that could not be evaluated is never ok.

The layout's crew positions are checked too: a crew position inside (or
within the margin of) a velocity or hot zone of any operating point is a
place where no one may stand during runs, and one past a noise limit needs
hearing protection chosen under the site's procedures; each is listed with
its worst operating point. The plan's warnings (collector capture, wall
jets, crew exposure, settings the layout gives but the site ignores) follow.

Exit status: 0 when every station was evaluated, none is blocked and no
crew position is inside a zone (warnings, and crew positions past a noise
limit only, allowed), 3 when any station is blocked or any crew position is
inside a zone, 1 on bad input, 2 on a bad command line.`,
		Args: oneLayout,
		RunE: func(cmd *cobra.Command, args []string) error {
			p, err := loadPlan(args[0], unitsName, asBuilt)
			if err != nil {
				return err
			}
			if format == "json" {
				if err := export.JSON(stdout, p); err != nil {
					return err
				}
			} else {
				checkText(stdout, p)
			}
			if p.Blocked > 0 || crewInZone(p) > 0 {
				return errBlocked
			}
			return nil
		},
	}
	formatFlag(c.Flags(), &format, "text", "json")
	c.Flags().StringVar(&asBuilt, "as-built", "", "CSV of measured positions (id, x, y, z[, base_x, base_y]) to check instead of the planned ones")
	unitsFlag(c.Flags(), &unitsName)
	return c
}

// checkText prints one line per station: its verdict, the governing
// operating point, how far an as-built station is from its planned place,
// and its first reason.
func checkText(w io.Writer, p *planner.Plan) {
	tw := newTable(w, 0)
	fmt.Fprintln(tw, "station\tstatus\tpoint\tposition\tfirst reason\t")
	sys := p.Request.System()
	unmeasured := 0
	for _, s := range p.Stations {
		reason := ""
		if len(s.Reasons) > 0 {
			reason = s.Reasons[0]
			if len(s.Reasons) > 1 {
				reason += fmt.Sprintf(" (+%d more)", len(s.Reasons)-1)
			}
		}
		pos := "as planned"
		switch s.Measurement {
		case planner.NotMeasured:
			pos = "not measured"
			unmeasured++
		case planner.Measured:
			pos = "as built, mic " + units.FormatLengthApprox(r3.Norm(r3.Sub(s.Mic, *s.Planned)), sys)
			if s.Stand != nil && s.BaseMeasured {
				pos += ", base " + units.FormatLengthApprox(math.Hypot(s.Base[0]-s.PlannedBase[0], s.Base[1]-s.PlannedBase[1]), sys)
			} else if s.Stand != nil {
				pos += ", base not measured"
			}
			pos += " from plan"
		}
		fmt.Fprintf(tw, "%s\t%s\t%s\t%s\t%s\t\n", s.ID, s.Status, s.Governing, pos, reason)
	}
	tw.Flush()
	fmt.Fprintf(w, "%d stations: %d ok, %d warn, %d blocked\n", len(p.Stations), p.OK, p.Warn, p.Blocked)
	if unmeasured > 0 {
		fmt.Fprintf(w, "%d %s not measured: the as-built file leaves %s out or empty, so %s checked at %s planned %s only\n",
			unmeasured, plural(unmeasured, "station", "stations"), plural(unmeasured, "it", "them"),
			plural(unmeasured, "it was", "they were"), plural(unmeasured, "its", "their"), plural(unmeasured, "place", "places"))
	}
	checkCrewText(w, p)
	if len(p.Warnings) > 0 {
		fmt.Fprintln(w, "\nWarnings")
		for _, s := range p.Warnings {
			fmt.Fprintln(w, "  - "+s)
		}
	}
}

// crewWorst returns, for each crew position in layout order, its worst
// entry of p.Crew: inside a zone first, then blocked, then warn, then the
// loudest.
func crewWorst(p *planner.Plan) []planner.CrewExposure {
	var out []planner.CrewExposure
	rank := func(e *planner.CrewExposure) int {
		switch {
		case e.InZone:
			return 3
		case e.Status == planner.Blocked:
			return 2
		case e.Status == planner.Warn:
			return 1
		}
		return 0
	}
	for i := 0; i < len(p.Crew); {
		j, w := i, i
		for ; j < len(p.Crew) && p.Crew[j].Name == p.Crew[i].Name; j++ {
			e, b := &p.Crew[j], &p.Crew[w]
			if r, rb := rank(e), rank(b); r > rb || r == rb && !(e.AWeighted <= b.AWeighted) && !math.IsNaN(b.AWeighted) {
				w = j
			}
		}
		out = append(out, p.Crew[w])
		i = j
	}
	return out
}

// crewInZone counts the crew positions inside a zone of some point.
func crewInZone(p *planner.Plan) int {
	n := 0
	for _, e := range crewWorst(p) {
		if e.InZone {
			n++
		}
	}
	return n
}

// checkCrewText lists the crew positions that are not ok, each at its
// worst operating point, and a summary line; the reasons in full are among
// the warnings.
func checkCrewText(w io.Writer, p *planner.Plan) {
	worst := crewWorst(p)
	if len(worst) == 0 {
		return
	}
	var zone, loud, action int
	fmt.Fprintln(w)
	tw := newTable(w, 0)
	head := false
	for _, e := range worst {
		status := ""
		switch {
		case e.InZone:
			zone++
			status = "blocked: in a zone, no one may stand here during runs"
		case e.Status == planner.Blocked:
			loud++
			status = "blocked: past a noise limit without hearing protection"
		case e.Status == planner.Warn:
			action++
			status = "warn: above a noise action value"
		default:
			continue
		}
		if !head {
			fmt.Fprintln(tw, "crew position\tstatus\tpoint\tdB(A)\thours\tNIOSH allows\t")
			head = true
		}
		fmt.Fprintf(tw, "%s\t%s\t%s\t%.0f\t%.3g h\t%s\t\n", e.Name, status, e.Point, e.AWeighted, e.Hours, units.FormatHours(e.AllowedHours))
	}
	tw.Flush()
	fmt.Fprintf(w, "%d crew %s: %d in a zone, %d past a noise limit, %d above an action value\n",
		len(worst), plural(len(worst), "position", "positions"), zone, loud, action)
	if zone > 0 {
		fmt.Fprintf(w, "%d crew %s in a zone: no one may stand there during runs; move %s out of the zones (exit status 3)\n",
			zone, plural(zone, "position", "positions"), plural(zone, "it", "them"))
	}
}
