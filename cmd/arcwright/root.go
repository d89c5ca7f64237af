package main

import (
	"errors"
	"fmt"
	"io"
	"strings"

	"github.com/spf13/cobra"

	"arcwright/internal/layout"
)

// version is the program's version; release builds set it with
// -ldflags "-X main.version=…".
var version = "0.1.0-dev"

// Exit statuses.
const (
	exitOK      = 0 // done; for check: every station evaluated and none blocked
	exitError   = 1 // bad input, unreadable layout, a failed write
	exitUsage   = 2 // an unknown command or flag
	exitBlocked = 3 // check: at least one station is blocked, or a crew position is inside a zone
)

// errBlocked is returned by check when a station is blocked or a crew
// position is inside a zone.
var errBlocked = errors.New("at least one station is blocked or crew position is inside a zone")

// usageError marks an error in the command line itself.
type usageError struct{ err error }

func (e usageError) Error() string { return e.err.Error() }
func (e usageError) Unwrap() error { return e.err }

// run executes the command line args and returns the exit status. It is the
// only place that maps errors to statuses.
func run(args []string, stdout, stderr io.Writer) int {
	root := newRootCommand(stdout, stderr)
	root.SetArgs(args)
	err := root.Execute()
	switch {
	case err == nil:
		return exitOK
	case errors.Is(err, errBlocked):
		return exitBlocked
	}
	var le layout.Errors
	if errors.As(err, &le) {
		for _, e := range le {
			fmt.Fprintln(stderr, e)
		}
		n := le.Total()
		fmt.Fprintf(stderr, "arcwright: %d %s found; fix %s and run again\n", n, plural(n, "problem", "problems"), plural(n, "it", "them"))
		return exitError
	}
	fmt.Fprintln(stderr, "arcwright: "+err.Error())
	var ue usageError
	if errors.As(err, &ue) || strings.HasPrefix(err.Error(), "unknown command") || strings.HasPrefix(err.Error(), "unknown flag") || strings.HasPrefix(err.Error(), "unknown shorthand flag") {
		fmt.Fprintln(stderr, "Run 'arcwright help' for usage.")
		return exitUsage
	}
	return exitError
}

// oneLayout accepts exactly one argument, the layout file.
func oneLayout(cmd *cobra.Command, args []string) error {
	switch {
	case len(args) == 0:
		return usageError{fmt.Errorf("%s needs the layout file, e.g. '%s layouts/anechoic-model-jet.yaml'", cmd.CommandPath(), cmd.CommandPath())}
	case len(args) > 1:
		return usageError{fmt.Errorf("%s takes one layout file, got %d arguments: %s", cmd.CommandPath(), len(args), strings.Join(args, " "))}
	case args[0] == "":
		return usageError{fmt.Errorf("%s: the layout file name is empty", cmd.CommandPath())}
	}
	return nil
}

// fileFlags are the flags that name a file to read or write.
var fileFlags = []string{"layout", "as-built", "pdf", "csv", "json", "geojson", "as-built-template"}

// emptyFileFlags refuses a file flag given with an empty name (a shell
// variable that was not set, say): it is never "not given", which would
// check the planned positions or write nothing without a word.
func emptyFileFlags(cmd *cobra.Command, _ []string) error {
	for _, name := range fileFlags {
		if f := cmd.Flags().Lookup(name); f != nil && f.Changed && f.Value.String() == "" {
			return usageError{fmt.Errorf("--%s: the file name is empty; give a file name (or leave the flag out)", name)}
		}
	}
	return nil
}

// atMostOne accepts no argument or one.
func atMostOne(what string) cobra.PositionalArgs {
	return func(cmd *cobra.Command, args []string) error {
		if len(args) > 1 {
			return usageError{fmt.Errorf("%s takes at most one %s, got %d arguments: %s", cmd.CommandPath(), what, len(args), strings.Join(args, " "))}
		}
		if len(args) == 1 && args[0] == "" {
			return usageError{fmt.Errorf("%s: the %s is empty", cmd.CommandPath(), what)}
		}
		return nil
	}
}

// noArgs accepts no argument.
func noArgs(cmd *cobra.Command, args []string) error {
	if len(args) > 0 {
		return usageError{fmt.Errorf("%s takes no arguments, got %s (quantities go with flags, e.g. --diameter 50.8mm)", cmd.CommandPath(), strings.Join(args, " "))}
	}
	return nil
}

func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}

func newRootCommand(stdout, stderr io.Writer) *cobra.Command {
	root := &cobra.Command{
		Use:   "arcwright",
		Short: "Plan microphone stations around a jet exhaust and print the floor layout sheet",
		Long: `arcwright plans the microphones of a jet-noise or exhaust-noise test from one
layout file: it predicts the plume for every operating point of the test matrix
(exit state, potential core, shear layer, velocity and temperature decay), places
polar arcs, sidelines, near-field lines, rings and single stations, checks each
one for clearance from the fast and hot exhaust, from walls, wedges, stands and
obstacles, for line of sight and for the acoustic far field, and writes a
to-scale PDF floor layout sheet with the cautions, plus CSV, GeoJSON and JSON.

Start with 'arcwright init' for a commented starter layout, 'arcwright validate'
to check it, and 'arcwright plan' to place and check the stations.

The zones are predictions from published correlations with conservative
margins, not measurements. Follow your facility's safety procedures, local
codes and licensed practice.`,
		Version:       version,
		SilenceErrors: true,
		SilenceUsage:  true,
	}
	root.SetOut(stdout)
	root.SetErr(stderr)
	root.SetFlagErrorFunc(func(c *cobra.Command, err error) error {
		return usageError{fmt.Errorf("%s: %w", strings.TrimPrefix(c.CommandPath(), "arcwright "), err)}
	})
	root.PersistentPreRunE = emptyFileFlags
	root.SetVersionTemplate("arcwright {{.Version}}\n")
	root.AddCommand(
		newPlumeCommand(stdout),
		newNoiseCommand(stdout, stderr),
		newAirCommand(stdout),
		newValidateCommand(stdout),
		newInitCommand(stdout),
		newPlanCommand(stdout),
		newCheckCommand(stdout),
		newServeCommand(stdout, stderr),
		newVersionCommand(stdout),
	)
	addCompletions(root)
	return root
}
