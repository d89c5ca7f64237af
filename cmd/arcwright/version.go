package main

import (
	"fmt"
	"io"
	"runtime/debug"

	"github.com/spf13/cobra"
)

func newVersionCommand(stdout io.Writer) *cobra.Command {
	return &cobra.Command{
		Use:   "version",
		Short: "Print the version, the module and the commit it was built from",
		Long: `Print the program's version, its Go module and version, the commit it was
built from (with its time, and whether the checkout had changes not
committed) and the Go version, as the build recorded them. Quote it when
you report a problem.

Exit status: 0, or 2 on a bad command line.`,
		Args: noArgs,
		RunE: func(cmd *cobra.Command, args []string) error {
			info, _ := debug.ReadBuildInfo()
			versionText(stdout, info)
			return nil
		},
	}
}

// versionText prints what info records of the build; info may be nil (a
// binary built without module support).
func versionText(w io.Writer, info *debug.BuildInfo) {
	fmt.Fprintf(w, "arcwright %s\n", version)
	if info == nil {
		fmt.Fprintln(w, "build information: not recorded in this binary")
		return
	}
	fmt.Fprintf(w, "module %s %s\n", info.Main.Path, info.Main.Version)
	var rev, when, modified string
	for _, s := range info.Settings {
		switch s.Key {
		case "vcs.revision":
			rev = s.Value
		case "vcs.time":
			when = s.Value
		case "vcs.modified":
			modified = s.Value
		}
	}
	switch {
	case rev == "":
		fmt.Fprintln(w, "commit not recorded (built outside a git checkout, or with -buildvcs=false)")
	default:
		if modified == "true" {
			rev += " with uncommitted changes"
		}
		if when != "" {
			rev += ", committed " + when
		}
		fmt.Fprintf(w, "commit %s\n", rev)
	}
	fmt.Fprintf(w, "built with %s\n", info.GoVersion)
}
