//go:build unix

package export

import (
	"errors"
	"io"
	"os"
	"path/filepath"
	"syscall"
	"testing"
	"time"
)

// TestWriteFilesSignal checks that SIGTERM during the writing removes the
// temporary files, leaves the targets as they were, and is delivered again
// (issue 10, item 4: a killed run left .NAME.tmp-* behind).
func TestWriteFilesSignal(t *testing.T) {
	raised := make(chan os.Signal, 1)
	old := raise
	raise = func(sig os.Signal) { raised <- sig }
	defer func() { raise = old }()

	dir := t.TempDir()
	first := filepath.Join(dir, "first.csv")
	outs := []Output{
		{Label: "--csv", Path: first, Write: func(w io.Writer) error { _, err := io.WriteString(w, "csv"); return err }},
		{Label: "--json", Path: filepath.Join(dir, "second.json"), Write: func(w io.Writer) error {
			if err := syscall.Kill(os.Getpid(), syscall.SIGTERM); err != nil {
				return err
			}
			select { // the handler removes the temporaries, then raises
			case sig := <-raised:
				raised <- sig
			case <-time.After(5 * time.Second):
				return errors.New("no signal")
			}
			_, err := io.WriteString(w, "{}")
			return err
		}},
	}
	if err := WriteFiles(outs, nil, nil); err == nil {
		t.Errorf("got nil, want an error: the run was interrupted")
	}
	if sig := <-raised; sig != syscall.SIGTERM {
		t.Errorf("raised %v, want SIGTERM", sig)
	}
	es, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	for _, e := range es {
		t.Errorf("left behind: %s", e.Name())
	}
}
