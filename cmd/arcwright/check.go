package main

import (
	"fmt"
	"io"

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
		Short: "Check stations at fixed positions and exit 3 if any is blocked",
		Long: `Run every check of 'arcwright plan' on the layout's stations at fixed
positions and print each station's verdict. With --as-built, positions measured
after set-up replace the planned ones: a CSV file with a header row naming
the columns id, x, y, z (microphone, from the datum) and optionally base_x,
base_y (stand pole) — the station CSV that 'arcwright plan --csv' writes can
be edited into one; values take units, and a bare number is in the layout's
length unit. Each as-built station shows how far it is from its planned
place. --format json prints the plan with the as-built positions.

A station is reported ok only if every check passed for every operating
point; a station that could not be evaluated is never ok.

Exit status: 0 when every station was evaluated and none is blocked (warnings
allowed), 3 when any station is blocked, 1 on bad input, 2 on a bad command
line.`,
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
			if p.Blocked > 0 {
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
	for _, s := range p.Stations {
		reason := ""
		if len(s.Reasons) > 0 {
			reason = s.Reasons[0]
			if len(s.Reasons) > 1 {
				reason += fmt.Sprintf(" (+%d more)", len(s.Reasons)-1)
			}
		}
		pos := "as planned"
		if s.Planned != nil {
			pos = "as built, " + units.FormatLengthApprox(r3.Norm(r3.Sub(s.Mic, *s.Planned)), sys) + " from plan"
		}
		fmt.Fprintf(tw, "%s\t%s\t%s\t%s\t%s\t\n", s.ID, s.Status, s.Governing, pos, reason)
	}
	tw.Flush()
	fmt.Fprintf(w, "%d stations: %d ok, %d warn, %d blocked\n", len(p.Stations), p.OK, p.Warn, p.Blocked)
}
