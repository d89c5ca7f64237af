package export_test

import (
	"errors"
	"io"
	"io/fs"
	"os"
	"path/filepath"
	"testing"

	"arcwright/internal/export"
)

// dirNames returns the names in dir.
func dirNames(t *testing.T, dir string) []string {
	t.Helper()
	es, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	var names []string
	for _, e := range es {
		names = append(names, e.Name())
	}
	return names
}

func writeString(s string) func(io.Writer) error {
	return func(w io.Writer) error {
		_, err := io.WriteString(w, s)
		return err
	}
}

func TestWriteFile(t *testing.T) {
	errBoom := errors.New("boom")
	for _, c := range []struct {
		name     string
		old      string // content before, "" for no file
		write    func(io.Writer) error
		wantErr  error
		wantFile string // content after, "" for no file
	}{
		{"new file", "", writeString("station table\n"), nil, "station table\n"},
		{"replaces a file", "old content\n", writeString("new\n"), nil, "new\n"},
		{"empty output", "old\n", writeString(""), nil, ""},
		{"write fails, no file", "", func(w io.Writer) error {
			_, _ = io.WriteString(w, "half a file")
			return errBoom
		}, errBoom, ""},
		{"write fails, old file kept", "old content\n", func(w io.Writer) error {
			_, _ = io.WriteString(w, "half a file")
			return errBoom
		}, errBoom, "old content\n"},
	} {
		t.Run(c.name, func(t *testing.T) {
			dir := t.TempDir()
			path := filepath.Join(dir, "plan.csv")
			if c.old != "" {
				if err := os.WriteFile(path, []byte(c.old), 0o600); err != nil {
					t.Fatal(err)
				}
			}
			err := export.WriteFile(path, c.write)
			if !errors.Is(err, c.wantErr) || (c.wantErr == nil) != (err == nil) {
				t.Fatalf("got error %v, want %v", err, c.wantErr)
			}
			names := dirNames(t, dir)
			exists := c.old != "" || c.wantErr == nil
			if exists && (len(names) != 1 || names[0] != "plan.csv") {
				t.Fatalf("directory: got %v, want only plan.csv (no temporary file left)", names)
			}
			if !exists {
				if len(names) != 0 {
					t.Fatalf("directory: got %v, want it empty", names)
				}
				return
			}
			got, err := os.ReadFile(path)
			if err != nil {
				t.Fatal(err)
			}
			if string(got) != c.wantFile {
				t.Errorf("content: got %q, want %q", got, c.wantFile)
			}
			if c.wantErr != nil {
				return
			}
			fi, err := os.Stat(path)
			if err != nil {
				t.Fatal(err)
			}
			want := fs.FileMode(0o644) // a new file
			if c.old != "" {
				want = 0o600 // a replaced file keeps its mode
			}
			if got := fi.Mode().Perm(); got != want {
				t.Errorf("mode: got %v, want %v", got, want)
			}
		})
	}
}

func TestWriteFileMissingDirectory(t *testing.T) {
	dir := t.TempDir()
	called := false
	err := export.WriteFile(filepath.Join(dir, "no-such-dir", "plan.json"), func(io.Writer) error {
		called = true
		return nil
	})
	if !errors.Is(err, fs.ErrNotExist) {
		t.Errorf("got error %v, want one wrapping fs.ErrNotExist", err)
	}
	if called {
		t.Error("write was called, want no call when the file cannot be created")
	}
	if names := dirNames(t, dir); len(names) != 0 {
		t.Errorf("directory: got %v, want it empty", names)
	}
}

func TestWriteFileOntoDirectory(t *testing.T) {
	dir := t.TempDir()
	target := filepath.Join(dir, "out")
	if err := os.Mkdir(target, 0o755); err != nil {
		t.Fatal(err)
	}
	if err := export.WriteFile(target, writeString("x")); err == nil {
		t.Error("got no error, want one: the target is a directory")
	}
	if names := dirNames(t, dir); len(names) != 1 || names[0] != "out" {
		t.Errorf("directory: got %v, want only out (no temporary file left)", names)
	}
}

func TestWriteFileEmptyPath(t *testing.T) {
	if err := export.WriteFile("", writeString("x")); !errors.Is(err, export.ErrNoPath) {
		t.Errorf("got error %v, want ErrNoPath", err)
	}
}

// TestWriteFilePanic checks that a panicking write leaves no temporary file
// and that the panic reaches the caller.
func TestWriteFilePanic(t *testing.T) {
	dir := t.TempDir()
	func() {
		defer func() {
			if r := recover(); r != "write panicked" {
				t.Errorf("recovered %v, want the write function's panic", r)
			}
		}()
		_ = export.WriteFile(filepath.Join(dir, "plan.json"), func(io.Writer) error { panic("write panicked") })
	}()
	if names := dirNames(t, dir); len(names) != 0 {
		t.Errorf("directory: got %v, want it empty", names)
	}
}

func TestWriteFileNilWrite(t *testing.T) {
	defer func() {
		if recover() == nil {
			t.Error("got no panic, want one for a nil write function")
		}
	}()
	_ = export.WriteFile(filepath.Join(t.TempDir(), "x"), nil)
}
