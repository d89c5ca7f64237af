package main

import (
	"io"
	"text/tabwriter"
)

// newTable returns a tabwriter for aligned text tables whose lines carry
// no trailing spaces.
func newTable(w io.Writer, flags uint) *tabwriter.Writer {
	return tabwriter.NewWriter(&trimmer{w: w}, 2, 4, 2, ' ', flags)
}

// trimmer removes spaces at the end of every line written through it.
type trimmer struct {
	w       io.Writer
	pending []byte // spaces not yet known to be trailing
}

func (t *trimmer) Write(p []byte) (int, error) {
	var out []byte
	for _, c := range p {
		switch c {
		case ' ':
			t.pending = append(t.pending, c)
		case '\n':
			t.pending = t.pending[:0]
			out = append(out, c)
		default:
			out = append(out, t.pending...)
			t.pending = t.pending[:0]
			out = append(out, c)
		}
	}
	if _, err := t.w.Write(out); err != nil {
		return 0, err
	}
	return len(p), nil
}
