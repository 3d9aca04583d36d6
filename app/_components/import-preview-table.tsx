"use client";

import type { SampleRecord } from "@/lib/import/split-csv-sample";

/** The first rows of the chosen file as they will be split, header first (read in the browser, nothing uploaded). */
export function ImportPreviewTable({ header, rows, fileName }: { header: readonly string[]; rows: readonly SampleRecord[]; fileName: string }) {
  return (
    <div style={{ overflowX: "auto", maxHeight: "24rem" }}>
      <table className="grid">
        <caption className="subtle" style={{ textAlign: "left", padding: "0.3rem 0" }}>
          First {rows.length} rows of {fileName}, split with the detected delimiter (line numbers as in the file)
        </caption>
        <thead>
          <tr>
            <th scope="col" className="num">Line</th>
            {header.map((name, index) => (
              <th scope="col" key={index}>{name.trim() === "" ? `(column ${index + 1})` : name}</th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.line}>
              <td className="num">{row.line}</td>
              {header.map((_, index) => (
                <td key={index}>{row.fields[index] ?? ""}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
