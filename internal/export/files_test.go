//go:build unix

package export_test

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"
	"syscall"
	"testing"

	"arcwright/internal/export"
)

// out is an output that writes s.
func out(label, path, s string) export.Output {
	return export.Output{Label: label, Path: path, Write: writeString(s)}
}

// TestWriteFilesSamePath checks that an output that is an input, or the
// same file as another output, is refused (issue 10, item 2).
func TestWriteFilesSamePath(t *testing.T) {
	dir := t.TempDir()
	layout := filepath.Join(dir, "L.yaml")
	if err := os.WriteFile(layout, []byte("layout\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	if err := os.Symlink("L.yaml", filepath.Join(dir, "link.yaml")); err != nil {
		t.Fatal(err)
	}
	if err := os.Link(layout, filepath.Join(dir, "hard.yaml")); err != nil {
		t.Fatal(err)
	}
	ins := []export.Input{{Label: "the layout", Path: layout}}
	tests := []struct {
		name string
		outs []export.Output
	}{
		{"the layout", []export.Output{out("--csv", layout, "x")}},
		{"the layout by another name", []export.Output{out("--csv", filepath.Join(dir, ".", "sub", "..", "L.yaml"), "x")}},
		{"a link to the layout", []export.Output{out("--csv", filepath.Join(dir, "link.yaml"), "x")}},
		{"a hard link to the layout", []export.Output{out("--csv", filepath.Join(dir, "hard.yaml"), "x")}},
		{"two outputs", []export.Output{out("--pdf", filepath.Join(dir, "same.out"), "pdf"), out("--csv", filepath.Join(dir, "same.out"), "csv")}},
		{"two standard outputs", []export.Output{out("--pdf", "-", "pdf"), out("--csv", "-", "csv")}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			var stdout bytes.Buffer
			err := export.WriteFiles(tt.outs, ins, &stdout)
			if !errors.Is(err, export.ErrSamePath) {
				t.Fatalf("got %v, want ErrSamePath", err)
			}
			if got, _ := os.ReadFile(layout); string(got) != "layout\n" {
				t.Errorf("the layout now holds %q", got)
			}
			if _, err := os.Stat(filepath.Join(dir, "same.out")); err == nil || stdout.Len() > 0 {
				t.Errorf("an output was written")
			}
		})
	}
}

// TestWriteFilesAllOrNone checks that a run whose outputs cannot all be
// written writes none of them and leaves no temporary (issue 10, item 3).
func TestWriteFilesAllOrNone(t *testing.T) {
	dir := t.TempDir()
	okPath := filepath.Join(dir, "ok.pdf")
	for name, outs := range map[string][]export.Output{
		"missing directory": {out("--pdf", okPath, "pdf"), out("--csv", filepath.Join(dir, "nonexistent", "x.csv"), "csv")},
		"failing write": {out("--pdf", okPath, "pdf"), {Label: "--csv", Path: filepath.Join(dir, "x.csv"), Write: func(w io.Writer) error {
			_, _ = io.WriteString(w, "half")
			return errors.New("boom")
		}}},
	} {
		t.Run(name, func(t *testing.T) {
			if name == "missing directory" {
				if err := export.CheckOutputs(outs, nil); err == nil {
					t.Errorf("CheckOutputs: got nil, want the missing directory")
				}
			}
			if err := export.WriteFiles(outs, nil, nil); err == nil {
				t.Fatal("got nil, want an error")
			}
			if names := dirNames(t, dir); len(names) != 0 {
				t.Errorf("directory: got %v, want it empty", names)
			}
		})
	}
}

// TestWriteFilesDestinations checks links, devices, pipes, directories and
// standard output as destinations (issue 10, item 4).
func TestWriteFilesDestinations(t *testing.T) {
	dir := t.TempDir()
	target := filepath.Join(dir, "target.csv")
	if err := os.WriteFile(target, []byte("old"), 0o600); err != nil {
		t.Fatal(err)
	}
	link := filepath.Join(dir, "link.csv")
	dangling := filepath.Join(dir, "dangling.csv")
	fifo := filepath.Join(dir, "fifo")
	for _, err := range []error{os.Symlink("target.csv", link), os.Symlink("new.csv", dangling), syscall.Mkfifo(fifo, 0o600)} {
		if err != nil {
			t.Fatal(err)
		}
	}

	// a link is kept and its target written, keeping its mode
	if err := export.WriteFile(link, writeString("new")); err != nil {
		t.Fatal(err)
	}
	if fi, err := os.Lstat(link); err != nil || fi.Mode()&os.ModeSymlink == 0 {
		t.Errorf("the link was replaced: %v", err)
	}
	if got, _ := os.ReadFile(target); string(got) != "new" {
		t.Errorf("target: got %q, want %q", got, "new")
	}
	if fi, _ := os.Stat(target); fi.Mode().Perm() != 0o600 {
		t.Errorf("target mode: got %v, want -rw-------", fi.Mode().Perm())
	}
	// a dangling link gets its target created
	if err := export.WriteFile(dangling, writeString("made")); err != nil {
		t.Fatal(err)
	}
	if got, _ := os.ReadFile(filepath.Join(dir, "new.csv")); string(got) != "made" {
		t.Errorf("dangling link's target: got %q, want %q", got, "made")
	}
	if fi, err := os.Lstat(dangling); err != nil || fi.Mode()&os.ModeSymlink == 0 {
		t.Errorf("the dangling link was replaced: %v", err)
	}

	// the null device is left as it is
	if err := export.WriteFile(os.DevNull, writeString("x")); err != nil {
		t.Errorf("null device: %v", err)
	}
	if fi, err := os.Stat(os.DevNull); err != nil || fi.Mode()&os.ModeCharDevice == 0 {
		t.Errorf("the null device is no longer a device: %v", err)
	}
	// other devices and directories are refused
	for _, p := range []string{"/dev/zero", dir} {
		if err := export.WriteFile(p, writeString("x")); !errors.Is(err, export.ErrNotRegular) {
			t.Errorf("%s: got %v, want ErrNotRegular", p, err)
		}
	}
	// a named pipe with no reader is refused at once, not waited on
	if err := export.WriteFile(fifo, writeString("piped")); !errors.Is(err, export.ErrNoReader) {
		t.Errorf("pipe without a reader: got %v, want ErrNoReader", err)
	}
	// a named pipe with a reader is written through (the reader opens
	// first, without waiting for a writer; the text fits the pipe's buffer)
	r, err := os.OpenFile(fifo, os.O_RDONLY|syscall.O_NONBLOCK, 0)
	if err != nil {
		t.Fatal(err)
	}
	defer r.Close()
	if err := export.WriteFile(fifo, writeString("piped")); err != nil {
		t.Fatal(err)
	}
	if b, err := io.ReadAll(r); err != nil || string(b) != "piped" {
		t.Errorf("pipe: got %q, %v, want %q", b, err, "piped")
	}
	// an anonymous pipe named by /dev/fd/N (a shell's process
	// substitution) is written through too
	pr, pw, err := os.Pipe()
	if err != nil {
		t.Fatal(err)
	}
	defer pr.Close()
	if err := export.WriteFile(fmt.Sprintf("/dev/fd/%d", pw.Fd()), writeString("substituted")); err != nil {
		t.Errorf("/dev/fd pipe: %v", err)
	}
	pw.Close()
	if b, _ := io.ReadAll(pr); string(b) != "substituted" {
		t.Errorf("/dev/fd pipe: got %q, want %q", b, "substituted")
	}
	// "-" is standard output
	var stdout bytes.Buffer
	if err := export.WriteFiles([]export.Output{out("--csv", "-", "to stdout")}, nil, &stdout); err != nil || stdout.String() != "to stdout" {
		t.Errorf("stdout: got %q, %v", stdout.String(), err)
	}
	if err := export.WriteFile("-", writeString("x")); err == nil || !strings.Contains(err.Error(), "standard output") {
		t.Errorf("WriteFile -: got %v, want an error", err)
	}
	for _, n := range dirNames(t, dir) {
		if strings.Contains(n, ".tmp-") {
			t.Errorf("temporary file left: %s", n)
		}
	}
}
