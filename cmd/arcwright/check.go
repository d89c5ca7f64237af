package main

import (
	"fmt"
	"io"
	"text/tabwriter"

	"github.com/spf13/cobra"
)

func newCheckCommand(stdout io.Writer) *cobra.Command {
	var asBuilt, unitsName string
	c := &cobra.Command{
		Use:   "check LAYOUT",
		Short: "Check stations at fixed positions and exit 3 if any is blocked",
		Long: `Run every check of 'arcwright plan' on the layout's stations at fixed
positions and print each station's verdict. With --as-built, positions measured
after set-up replace the planned ones: a CSV file with a header row naming
the columns id, x, y, z (microphone, from the datum) and optionally base_x,
base_y (stand pole); values take units, and a bare number is in the layout's
length unit.

A station is reported ok only if every check passed for every operating
point; a station that could not be evaluated is never ok.

Exit status: 0 when every station was evaluated and none is blocked (warnings
allowed), 3 when any station is blocked, 1 on bad input, 2 on a bad command
line.`,
		Args: cobra.ExactArgs(1),
		RunE: func(cmd *cobra.Command, args []string) error {
			p, err := loadPlan(args[0], unitsName, asBuilt)
			if err != nil {
				return err
			}
			tw := tabwriter.NewWriter(stdout, 2, 4, 2, ' ', 0)
			for _, s := range p.Stations {
				reason := ""
				if len(s.Reasons) > 0 {
					reason = s.Reasons[0]
					if len(s.Reasons) > 1 {
						reason += fmt.Sprintf(" (+%d more)", len(s.Reasons)-1)
					}
				}
				fmt.Fprintf(tw, "%s\t%s\t%s\t%s\t\n", s.ID, s.Status, s.Governing, reason)
			}
			tw.Flush()
			fmt.Fprintf(stdout, "%d stations: %d ok, %d warn, %d blocked\n", len(p.Stations), p.OK, p.Warn, p.Blocked)
			if p.Blocked > 0 {
				return errBlocked
			}
			return nil
		},
	}
	c.Flags().StringVar(&asBuilt, "as-built", "", "CSV of measured positions (id, x, y, z[, base_x, base_y]) to check instead of the planned ones")
	unitsFlag(c.Flags(), &unitsName)
	return c
}
