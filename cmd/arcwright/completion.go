package main

import (
	"sort"
	"strconv"

	"github.com/spf13/cobra"
	"github.com/spf13/pflag"

	"arcwright/internal/layout"
	"arcwright/internal/sheet"
)

// addCompletions gives the shell completion (the completion command) the
// values of every flag that takes a word from a list — --format, --units,
// --nozzle, --paper, --scale — the operating points of the layout named
// by --layout for --point, and layout, as-built and output files by their
// extensions, instead of every file name.
func addCompletions(root *cobra.Command) {
	for _, c := range root.Commands() {
		fs := c.Flags()
		fs.VisitAll(func(f *pflag.Flag) {
			if ch, ok := f.Value.(*choiceFlag); ok {
				_ = c.RegisterFlagCompletionFunc(f.Name, cobra.FixedCompletions(ch.choices, cobra.ShellCompDirectiveNoFileComp))
			}
		})
		if fs.Lookup("paper") != nil {
			var names []string
			for _, p := range sheet.Papers() {
				names = append(names, p.Name)
			}
			_ = c.RegisterFlagCompletionFunc("paper", cobra.FixedCompletions(names, cobra.ShellCompDirectiveNoFileComp))
		}
		if fs.Lookup("scale") != nil {
			_ = c.RegisterFlagCompletionFunc("scale", cobra.FixedCompletions(scaleNames(), cobra.ShellCompDirectiveNoFileComp))
		}
		if fs.Lookup("point") != nil {
			_ = c.RegisterFlagCompletionFunc("point", completePoints)
		}
		for flag, exts := range map[string][]string{
			"layout": {"yaml", "yml"}, "as-built": {"csv", "txt"},
			"pdf": {"pdf"}, "csv": {"csv"}, "json": {"json"}, "geojson": {"geojson", "json"},
		} {
			if fs.Lookup(flag) != nil {
				_ = c.MarkFlagFilename(flag, exts...)
			}
		}
		switch c.Name() {
		case "plan", "validate", "check", "air":
			c.ValidArgsFunction = completeLayout
		}
	}
}

// scaleNames returns the standard scales as "1:N".
func scaleNames() []string {
	seen := map[int]bool{}
	var out []string
	dens := sheet.StandardScales()
	sort.Ints(dens)
	for _, d := range dens {
		if !seen[d] {
			seen[d] = true
			out = append(out, "1:"+strconv.Itoa(d))
		}
	}
	return out
}

// completePoints completes --point with the operating points of the
// layout given by --layout, or with nothing before --layout is given.
func completePoints(cmd *cobra.Command, _ []string, _ string) ([]string, cobra.ShellCompDirective) {
	path, err := cmd.Flags().GetString("layout")
	if err != nil || path == "" {
		return nil, cobra.ShellCompDirectiveNoFileComp
	}
	req, _, err := layout.Load(path)
	if err != nil {
		return nil, cobra.ShellCompDirectiveNoFileComp
	}
	names := make([]string, len(req.Points))
	for i, c := range req.Points {
		names[i] = c.Name
	}
	return names, cobra.ShellCompDirectiveNoFileComp
}

// completeLayout completes the one layout argument with YAML files.
func completeLayout(_ *cobra.Command, args []string, _ string) ([]string, cobra.ShellCompDirective) {
	if len(args) > 0 {
		return nil, cobra.ShellCompDirectiveNoFileComp
	}
	return []string{"yaml", "yml"}, cobra.ShellCompDirectiveFilterFileExt
}
