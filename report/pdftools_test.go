package report

import (
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"
)

// The checks read the PDF back with the poppler tools, as a person's PDF
// viewer would; a machine without them skips these tests.

// needTool skips the test when a poppler tool is not installed.
func needTool(t *testing.T, name string) string {
	t.Helper()
	p, err := exec.LookPath(name)
	if err != nil {
		t.Skipf("%s not installed (poppler-utils): %v", name, err)
	}
	return p
}

// writeTemp writes a PDF into the test's temporary folder.
func writeTemp(t *testing.T, name string, pdf []byte) string {
	t.Helper()
	path := filepath.Join(t.TempDir(), name)
	if err := os.WriteFile(path, pdf, 0o644); err != nil {
		t.Fatal(err)
	}
	return path
}

// pdfText returns the text of a PDF with every run of white space made a
// single space, so that wrapped lines read as one. Raw mode keeps the
// drawing order, in which each table cell's lines come together.
func pdfText(t *testing.T, path string) string {
	t.Helper()
	out, err := exec.Command(needTool(t, "pdftotext"), "-enc", "UTF-8", "-raw", path, "-").Output()
	if err != nil {
		t.Fatalf("pdftotext %s: %v", path, err)
	}
	return strings.Join(strings.Fields(string(out)), " ")
}

// pdfInfo is what pdfinfo reports about a PDF.
type pdfInfo struct {
	pages           int
	width, height   float64 // points
	title, creator  string
	author, subject string
	creationDate    string
	raw             string
}

var pageSizeRE = regexp.MustCompile(`Page size:\s+([\d.]+) x ([\d.]+) pts`)

func readInfo(t *testing.T, path string) pdfInfo {
	t.Helper()
	out, err := exec.Command(needTool(t, "pdfinfo"), "-isodates", path).Output()
	if err != nil {
		t.Fatalf("pdfinfo %s: %v", path, err)
	}
	info := pdfInfo{raw: string(out)}
	for _, line := range strings.Split(string(out), "\n") {
		k, v, ok := strings.Cut(line, ":")
		if !ok {
			continue
		}
		v = strings.TrimSpace(v)
		switch k {
		case "Pages":
			info.pages, _ = strconv.Atoi(v)
		case "Title":
			info.title = v
		case "Creator":
			info.creator = v
		case "Author":
			info.author = v
		case "Subject":
			info.subject = v
		case "CreationDate":
			info.creationDate = v
		}
	}
	if m := pageSizeRE.FindStringSubmatch(string(out)); m != nil {
		info.width, _ = strconv.ParseFloat(m[1], 64)
		info.height, _ = strconv.ParseFloat(m[2], 64)
	}
	return info
}

// renderPages rasterises every page at a low resolution and returns how
// many images came out: a PDF the renderer cannot draw fails here.
func renderPages(t *testing.T, path string) int {
	t.Helper()
	dir := t.TempDir()
	if out, err := exec.Command(needTool(t, "pdftoppm"), "-r", "20", "-png", path, filepath.Join(dir, "page")).CombinedOutput(); err != nil {
		t.Fatalf("pdftoppm %s: %v\n%s", path, err, out)
	}
	names, err := filepath.Glob(filepath.Join(dir, "page*.png"))
	if err != nil {
		t.Fatal(err)
	}
	return len(names)
}
