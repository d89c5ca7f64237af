package main

import (
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"

	"github.com/spf13/cobra"

	"arcwright/internal/export"
	"arcwright/internal/layout"
)

func newInitCommand(stdout io.Writer) *cobra.Command {
	var force bool
	c := &cobra.Command{
		Use:   "init [FILE]",
		Short: "Write a commented starter layout",
		Long: `Write a complete, commented starter layout to FILE (default layout.yaml): an
imaginary anechoic chamber with a model jet, two operating points, and one
array of each kind (an arc with an automatic radius, a sideline, a near-field
line, a ring, single points and a probe stand). Every key is explained in its
comment; edit it for your cell and test, then run 'arcwright validate FILE'.

An existing file is not overwritten unless --force is given (it then keeps
its permissions); a symbolic link is kept and its target written. FILE "-"
writes the starter to standard output.

Exit status: 0 on success, 1 if the file exists or cannot be written, 2 on a
bad command line.`,
		Args: atMostOne("file name"),
		RunE: func(cmd *cobra.Command, args []string) error {
			path := "layout.yaml"
			if len(args) == 1 {
				path = args[0]
			}
			if fi, err := os.Stat(path); err == nil && fi.Mode().IsRegular() && !force {
				return fmt.Errorf("%s already exists; use --force to overwrite it", path)
			} else if err != nil && !errors.Is(err, fs.ErrNotExist) {
				return err
			}
			out := export.Output{Label: "init", Path: path, Write: func(w io.Writer) error {
				_, err := w.Write(layout.Starter())
				return err
			}}
			if err := checkOutputs([]export.Output{out}, nil); err != nil {
				return err
			}
			if err := export.WriteFiles([]export.Output{out}, nil, stdout); err != nil {
				if errors.Is(err, export.ErrNoReader) {
					return usageError{err} // a destination of the command line, as for plan
				}
				return err
			}
			if path != export.Stdout {
				fmt.Fprintf(stdout, "wrote %s: edit it, then run 'arcwright validate %s'\n", path, path)
			}
			return nil
		},
	}
	c.Flags().BoolVar(&force, "force", false, "overwrite an existing file")
	return c
}
