<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="de">
<context>
    <name>AgreementReportText</name>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="39"/>
        <source>beyond a double</source>
        <translation>jenseits des Double-Wertebereichs</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="85"/>
        <location filename="../core/agreement/agreement_report.cpp" line="103"/>
        <location filename="../core/agreement/agreement_report.cpp" line="277"/>
        <location filename="../core/agreement/agreement_report.cpp" line="305"/>
        <source>undefined</source>
        <translation>nicht definiert</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="105"/>
        <source>reliable (≥ 0.800)</source>
        <translation>reliabel (≥ 0.800)</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="107"/>
        <source>tentative conclusions only (0.667–0.800)</source>
        <translation>nur vorläufige Schlüsse (0.667–0.800)</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="111"/>
        <source>unreliable (&lt; 0.667)</source>
        <translation>nicht reliabel (&lt; 0.667)</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="241"/>
        <source>Coders        %1 (%2)</source>
        <translation>Codierende    %1 (%2)</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="244"/>
        <source>Units         %1; pairable units %2; pairable values %3</source>
        <translation>Einheiten     %1; paarbare Einheiten %2; paarbare Werte %3</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="249"/>
        <source>Alpha (%1)  %2</source>
        <translation>Alpha (%1)  %2</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="266"/>
        <source>  95% CI      [%1, %2]  %3, %4 replicates, seed %5</source>
        <translation>  95%-KI      [%1, %2]  %3, %4 Replikationen, Seed %5</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="273"/>
        <source>Percent agreement  %1</source>
        <translation>Prozentuale Übereinstimmung  %1</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="281"/>
        <source>, linear weights</source>
        <translation>, lineare Gewichte</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="282"/>
        <source>, quadratic weights</source>
        <translation>, quadratische Gewichte</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="284"/>
        <source>Cohen&apos;s kappa %1  (SE %2, 95% CI [%3, %4]%5)</source>
        <translation>Cohens Kappa  %1  (SE %2, 95%-KI [%3, %4]%5)</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="289"/>
        <source>Scott&apos;s pi    %1</source>
        <translation>Scotts Pi     %1</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="291"/>
        <source>Bennett&apos;s S   %1</source>
        <translation>Bennetts S    %1</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="293"/>
        <source>Fleiss&apos; kappa %1</source>
        <translation>Fleiss&apos; Kappa %1</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="295"/>
        <source>Light&apos;s kappa %1</source>
        <translation>Lights Kappa  %1</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="297"/>
        <source>Pairs</source>
        <translation>Paare</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="299"/>
        <source>  %1 × %2  units %3  agreement %4  kappa %5</source>
        <translation>  %1 × %2  Einheiten %3  Übereinstimmung %4  Kappa %5</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="309"/>
        <source>Sample size   %1 pairable values; Krippendorff&apos;s minimum for alpha ≥ %2 at p = 0.05 with the rarest value at %3%: %4</source>
        <translation>Stichprobe    %1 paarbare Werte; Krippendorffs Minimum für Alpha ≥ %2 bei p = 0.05, wenn der seltenste Wert %3% ausmacht: %4</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="317"/>
        <source> — the sample is too small</source>
        <translation> — die Stichprobe ist zu klein</translation>
    </message>
</context>
<context>
    <name>AgreementRunText</name>
    <message>
        <location filename="../core/agreement/agreement_run.cpp" line="158"/>
        <source>The continuum is compared with unitizing alpha, not as a table of units.</source>
        <translation>Das Kontinuum wird mit Unitizing-Alpha verglichen, nicht als Tabelle von Einheiten.</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_run.cpp" line="197"/>
        <source>The continuum could not be compared.</source>
        <translation>Das Kontinuum konnte nicht verglichen werden.</translation>
    </message>
</context>
<context>
    <name>AnnotationEditsText</name>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="29"/>
        <source>The span [%1, %2) does not lie inside the article&apos;s text of %3 characters.</source>
        <translation>Die Textstelle [%1, %2) liegt nicht innerhalb des Artikeltexts von %3 Zeichen.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="44"/>
        <source>Annotation #%1 has been deleted.</source>
        <translation>Annotation #%1 wurde gelöscht.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="62"/>
        <source>A confidence must lie between 0 and 1.</source>
        <translation>Eine Konfidenz muss zwischen 0 und 1 liegen.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="83"/>
        <source>Add %1 span</source>
        <translation>%1-Textstelle hinzufügen</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="100"/>
        <source>The span could not be added: its article or coder does not exist.</source>
        <translation>Die Textstelle konnte nicht hinzugefügt werden: Ihr Artikel oder ihre codierende Person existiert nicht.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="123"/>
        <source>Change %1 span</source>
        <translation>%1-Textstelle ändern</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="145"/>
        <location filename="../core/project/annotation_edits.cpp" line="178"/>
        <location filename="../core/project/annotation_edits.cpp" line="358"/>
        <source>An edit that was never applied cannot be undone.</source>
        <translation>Eine Änderung, die nie ausgeführt wurde, kann nicht rückgängig gemacht werden.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="157"/>
        <source>Delete %1 span</source>
        <translation>%1-Textstelle löschen</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="158"/>
        <source>Delete span</source>
        <translation>Textstelle löschen</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="195"/>
        <source>Link spans (%1)</source>
        <translation>Textstellen verknüpfen (%1)</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="202"/>
        <source>A span cannot be linked to itself.</source>
        <translation>Eine Textstelle kann nicht mit sich selbst verknüpft werden.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="204"/>
        <source>A link needs a type.</source>
        <translation>Eine Verknüpfung braucht einen Typ.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="213"/>
        <source>Only spans of the same article can be linked.</source>
        <translation>Nur Textstellen desselben Artikels können verknüpft werden.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="233"/>
        <source>Remove link (%1)</source>
        <translation>Verknüpfung entfernen (%1)</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="242"/>
        <source>The link was removed already.</source>
        <translation>Die Verknüpfung wurde bereits entfernt.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="268"/>
        <source>Answer &quot;%1&quot;</source>
        <translation>Antwort „%1“</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="302"/>
        <source>The answer could not be stored: its article or coder does not exist.</source>
        <translation>Die Antwort konnte nicht gespeichert werden: Ihr Artikel oder ihre codierende Person existiert nicht.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="331"/>
        <source>Withdraw answer &quot;%1&quot;</source>
        <translation>Antwort „%1“ zurückziehen</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="345"/>
        <source>There is no answer to &quot;%1&quot; to withdraw.</source>
        <translation>Es gibt keine Antwort auf „%1“, die zurückgezogen werden könnte.</translation>
    </message>
</context>
<context>
    <name>AnnotationTable</name>
    <message>
        <location filename="../core/store/annotation_table.cpp" line="60"/>
        <source>There is no %1 #%2 in the project.</source>
        <translation>Im Projekt gibt es kein %1 #%2.</translation>
    </message>
    <message>
        <location filename="../core/store/annotation_table.cpp" line="154"/>
        <source>There is no annotation #%1 in the project.</source>
        <translation>Im Projekt gibt es keine Annotation #%1.</translation>
    </message>
    <message>
        <location filename="../core/store/annotation_table.cpp" line="273"/>
        <source>There is no link #%1 in the project.</source>
        <translation>Im Projekt gibt es keine Verknüpfung #%1.</translation>
    </message>
</context>
<context>
    <name>ArticleReader</name>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="144"/>
        <source>a double quote inside a field that does not begin with one; enclose the field in double quotes and write the inner quote twice (RFC 4180)</source>
        <translation>ein doppeltes Anführungszeichen in einem Feld, das nicht mit einem beginnt; setzen Sie das Feld in doppelte Anführungszeichen und schreiben Sie das innere Anführungszeichen doppelt (RFC 4180)</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="169"/>
        <source>unexpected character after the closing double quote of a field (opened at line %1, column %2); a double quote inside a quoted field must be written twice (RFC 4180)</source>
        <translation>unerwartetes Zeichen nach dem schließenden doppelten Anführungszeichen eines Felds (geöffnet in Zeile %1, Spalte %2); ein doppeltes Anführungszeichen in einem Feld in Anführungszeichen muss doppelt geschrieben werden (RFC 4180)</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="204"/>
        <source>the quoted field that begins here is never closed: a closing double quote is missing</source>
        <translation>das hier beginnende Feld in Anführungszeichen wird nie geschlossen: ein schließendes doppeltes Anführungszeichen fehlt</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="231"/>
        <source>column %1 of the header has no name</source>
        <translation>Spalte %1 der Kopfzeile hat keinen Namen</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="237"/>
        <source>the header names column &quot;%1&quot; twice (columns %2 and %3)</source>
        <translation>die Kopfzeile nennt die Spalte „%1“ zweimal (Spalten %2 und %3)</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="258"/>
        <source>the header has no column &quot;%1&quot; (the column for the field &quot;%2&quot;); it has %3</source>
        <translation>die Kopfzeile hat keine Spalte „%1“ (die Spalte für das Feld „%2“); sie hat %3</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="262"/>
        <source>the header has no column &quot;%1&quot;, which is required; it has %2</source>
        <translation>die Kopfzeile hat keine Spalte „%1“, die aber erforderlich ist; sie hat %2</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="270"/>
        <source>The header seems to be separated by &quot;%1&quot;; only commas separate fields (RFC 4180).</source>
        <translation>Die Kopfzeile scheint durch „%1“ getrennt zu sein; nur Kommas trennen Felder (RFC 4180).</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="298"/>
        <source>unknown field &quot;%1&quot; in the CSV column mapping; the fields are id, title, text, outlet, published and language</source>
        <translation>unbekanntes Feld „%1“ in der CSV-Spaltenzuordnung; die Felder sind id, title, text, outlet, published und language</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="318"/>
        <source>the record has %1 fields but the header has %2</source>
        <translation>der Datensatz hat %1 Felder, die Kopfzeile aber %2</translation>
    </message>
    <message>
        <location filename="../core/io/html_reader.cpp" line="444"/>
        <source>the page is too large for the HTML parser once its CDATA sections are escaped</source>
        <translation>die Seite ist für den HTML-Parser zu groß, sobald ihre CDATA-Abschnitte maskiert sind</translation>
    </message>
    <message>
        <location filename="../core/io/html_reader.cpp" line="449"/>
        <source>the HTML parser could not be started</source>
        <translation>der HTML-Parser konnte nicht gestartet werden</translation>
    </message>
    <message>
        <location filename="../core/io/html_reader.cpp" line="461"/>
        <source>the HTML parser stopped before the end of the page</source>
        <translation>der HTML-Parser hat vor dem Ende der Seite angehalten</translation>
    </message>
    <message>
        <location filename="../core/io/html_reader.cpp" line="482"/>
        <source>The page declares the character set &quot;%1&quot;; convert it to UTF-8 first.</source>
        <translation>Die Seite gibt den Zeichensatz „%1“ an; wandeln Sie sie zuerst in UTF-8 um.</translation>
    </message>
    <message>
        <location filename="../core/io/html_reader.cpp" line="497"/>
        <source>the file contains no articles: the page holds no text</source>
        <translation>die Datei enthält keine Artikel: die Seite enthält keinen Text</translation>
    </message>
    <message>
        <location filename="../core/io/html_reader.cpp" line="545"/>
        <source>the file contains no articles: the page holds no text outside scripts, styles, navigation, forms and other dropped elements</source>
        <translation>die Datei enthält keine Artikel: die Seite enthält keinen Text außerhalb von Skripten, Stilen, Navigation, Formularen und anderen verworfenen Elementen</translation>
    </message>
    <message>
        <location filename="../core/io/html_reader.cpp" line="570"/>
        <source>the HTML parser stopped before the end of the element&apos;s HTML</source>
        <translation>der HTML-Parser hat vor dem Ende des HTML des Elements angehalten</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="51"/>
        <source>the line is longer than %1 MiB; a line may be at most %1 MiB</source>
        <translation>die Zeile ist länger als %1 MiB; eine Zeile darf höchstens %1 MiB lang sein</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="84"/>
        <source>unknown field %1; the fields are &quot;id&quot;, &quot;title&quot;, &quot;text&quot;, &quot;outlet&quot;, &quot;published&quot;, &quot;language&quot; and &quot;meta&quot; (put further data inside &quot;meta&quot;)</source>
        <translation>unbekanntes Feld %1; die Felder sind „id“, „title“, „text“, „outlet“, „published“, „language“ und „meta“ (weitere Daten gehören in „meta“)</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="90"/>
        <source>unknown fields %1; the fields are &quot;id&quot;, &quot;title&quot;, &quot;text&quot;, &quot;outlet&quot;, &quot;published&quot;, &quot;language&quot; and &quot;meta&quot; (put further data inside &quot;meta&quot;)</source>
        <translation>unbekannte Felder %1; die Felder sind „id“, „title“, „text“, „outlet“, „published“, „language“ und „meta“ (weitere Daten gehören in „meta“)</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="114"/>
        <source>missing required field &quot;%1&quot;</source>
        <translation>erforderliches Feld „%1“ fehlt</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="120"/>
        <source>field &quot;%1&quot; must be a string, got %2</source>
        <translation>Feld „%1“ muss eine Zeichenkette sein, ist aber %2</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="122"/>
        <source>field &quot;%1&quot; must be a string or null, got %2</source>
        <translation>Feld „%1“ muss eine Zeichenkette oder null sein, ist aber %2</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="131"/>
        <source>field &quot;%1&quot; holds an unpaired surrogate escape (such as \ud800), which is not a character (RFC 8259, section 8.2)</source>
        <translation>Feld „%1“ enthält ein ungepaartes Surrogat-Escape (etwa \ud800), das kein Zeichen ist (RFC 8259, Abschnitt 8.2)</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="144"/>
        <source>field &quot;%1&quot; must be an object or null, got %2</source>
        <translation>Feld „%1“ muss ein Objekt oder null sein, ist aber %2</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="172"/>
        <source>the last line is truncated: the JSON ends before the object is complete (%1) and the file does not end with a line break</source>
        <translation>die letzte Zeile ist abgeschnitten: das JSON endet, bevor das Objekt vollständig ist (%1), und die Datei endet nicht mit einem Zeilenumbruch</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="180"/>
        <location filename="../core/io/jsonl_reader.cpp" line="189"/>
        <source>expected a JSON object, got %1</source>
        <translation>JSON-Objekt erwartet, erhalten: %1</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="184"/>
        <source>invalid JSON: %1</source>
        <translation>ungültiges JSON: %1</translation>
    </message>
    <message>
        <location filename="../core/io/office_metadata.cpp" line="76"/>
        <source>the document holds no text: it contains no articles</source>
        <translation>das Dokument enthält keinen Text: es enthält keine Artikel</translation>
    </message>
    <message>
        <location filename="../core/io/text_reader.cpp" line="36"/>
        <source>the file contains no articles: it holds no text</source>
        <translation>die Datei enthält keine Artikel: sie enthält keinen Text</translation>
    </message>
</context>
<context>
    <name>ArticleReaderText</name>
    <message>
        <location filename="../core/io/article_reader.cpp" line="36"/>
        <source>the file contains no articles</source>
        <translation>die Datei enthält keine Artikel</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="88"/>
        <source>the article has no id</source>
        <translation>der Artikel hat keine ID</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="95"/>
        <source>the id &quot;%1&quot; holds a control character (U+%2); ids are one line of printable text</source>
        <translation>die ID „%1“ enthält ein Steuerzeichen (U+%2); IDs sind eine Zeile druckbaren Texts</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="113"/>
        <source>the %1 of the article &quot;%2&quot; holds a NUL character (U+0000), which no text holds</source>
        <translation>%1 des Artikels „%2“ enthält ein NUL-Zeichen (U+0000), das in keinem Text vorkommt</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="119"/>
        <source>the article &quot;%1&quot; has no text</source>
        <translation>der Artikel „%1“ hat keinen Text</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="124"/>
        <source>duplicate id &quot;%1&quot; (first seen on line %2)</source>
        <translation>doppelte ID „%1“ (zuerst in Zeile %2)</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="157"/>
        <source>the XML root element &lt;%1&gt; is neither a feed&apos;s (&lt;rss&gt;, Atom&apos;s &lt;feed&gt;) nor a news item&apos;s (&lt;nitf&gt;, NewsML-G2&apos;s &lt;newsItem&gt; or &lt;newsMessage&gt;)</source>
        <translation>das XML-Wurzelelement &lt;%1&gt; gehört weder zu einem Feed (&lt;rss&gt;, Atoms &lt;feed&gt;) noch zu einer Nachrichtenmeldung (&lt;nitf&gt;, &lt;newsItem&gt; oder &lt;newsMessage&gt; von NewsML-G2)</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="196"/>
        <source>the file is a zip archive but not a DOCX, ODT or EPUB document; choose the format if it is one</source>
        <translation>die Datei ist ein ZIP-Archiv, aber kein DOCX-, ODT- oder EPUB-Dokument; wählen Sie das Format, wenn sie eines ist</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="211"/>
        <source>the file is %1 MiB long; a file may be at most %2 MiB</source>
        <translation>die Datei ist %1 MiB groß; eine Datei darf höchstens %2 MiB groß sein</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="220"/>
        <source>the file is empty: it contains no articles</source>
        <translation>die Datei ist leer: sie enthält keine Artikel</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="255"/>
        <source>the format cannot be told from the file name or its content; name the file .txt, .html, .jsonl, .csv, .rss, .atom, .docx, .odt, .pdf, .epub or .xml, or choose the format</source>
        <translation>das Format lässt sich weder am Dateinamen noch am Inhalt erkennen; benennen Sie die Datei .txt, .html, .jsonl, .csv, .rss, .atom, .docx, .odt, .pdf, .epub oder .xml, oder wählen Sie das Format</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="321"/>
        <source>the folder contains no .txt files</source>
        <translation>der Ordner enthält keine .txt-Dateien</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="342"/>
        <source>duplicate id &quot;%1&quot; (first seen in %2)</source>
        <translation>doppelte ID „%1“ (zuerst in %2)</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="362"/>
        <source>a split pattern cuts plain text, DOCX, ODT and PDF documents (told by their suffix); this file is %1</source>
        <translation>ein Trennmuster teilt reinen Text sowie DOCX-, ODT- und PDF-Dokumente (erkannt an ihrer Endung); diese Datei ist %1</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="364"/>
        <source>of another kind</source>
        <translation>von anderer Art</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="450"/>
        <source>a folder can only be read as plain text (its .txt files)</source>
        <translation>ein Ordner kann nur als reiner Text gelesen werden (seine .txt-Dateien)</translation>
    </message>
    <message>
        <location filename="../core/io/chunked_input.cpp" line="26"/>
        <source>the file does not exist</source>
        <translation>die Datei existiert nicht</translation>
    </message>
    <message>
        <location filename="../core/io/chunked_input.cpp" line="35"/>
        <source>the file cannot be opened for reading</source>
        <translation>die Datei kann nicht zum Lesen geöffnet werden</translation>
    </message>
    <message>
        <location filename="../core/io/chunked_input.cpp" line="60"/>
        <source>the file cannot be read</source>
        <translation>die Datei kann nicht gelesen werden</translation>
    </message>
    <message>
        <location filename="../core/io/csv_record_stream.cpp" line="119"/>
        <source>the record is longer than %1 MiB; a record may be at most %1 MiB</source>
        <translation>der Datensatz ist länger als %1 MiB; ein Datensatz darf höchstens %1 MiB lang sein</translation>
    </message>
    <message>
        <location filename="../core/io/csv_record_stream.cpp" line="124"/>
        <source>the quoted field that begins here is not closed within %1 MiB, the most a record may hold: a closing double quote is missing</source>
        <translation>das hier beginnende Feld in Anführungszeichen wird nicht innerhalb von %1 MiB geschlossen, dem Höchstmaß eines Datensatzes: ein schließendes doppeltes Anführungszeichen fehlt</translation>
    </message>
    <message>
        <location filename="../core/io/docx_reader.cpp" line="264"/>
        <source>the footnote %1 is referred to but %2 does not hold it</source>
        <translation>auf die Fußnote %1 wird verwiesen, aber %2 enthält sie nicht</translation>
    </message>
    <message>
        <location filename="../core/io/docx_reader.cpp" line="266"/>
        <source>the endnote %1 is referred to but %2 does not hold it</source>
        <translation>auf die Endnote %1 wird verwiesen, aber %2 enthält sie nicht</translation>
    </message>
    <message>
        <location filename="../core/io/docx_reader.cpp" line="303"/>
        <source>the file is an OLE compound file, not a zip package: a password-protected (encrypted) Office document or an old binary .doc; save it as .docx without a password first</source>
        <translation>die Datei ist eine OLE-Verbunddatei, kein ZIP-Paket: ein passwortgeschütztes (verschlüsseltes) Office-Dokument oder eine alte binäre .doc-Datei; speichern Sie sie zuerst ohne Passwort als .docx</translation>
    </message>
    <message>
        <location filename="../core/io/docx_reader.cpp" line="321"/>
        <source>the archive holds no %1: it is not a word-processing document (DOCX)</source>
        <translation>das Archiv enthält kein %1: es ist kein Textverarbeitungsdokument (DOCX)</translation>
    </message>
    <message>
        <location filename="../core/io/docx_reader.cpp" line="330"/>
        <source>the root element is &lt;%1&gt;, not WordprocessingML&apos;s &lt;w:document&gt;: the file is not a word-processing document</source>
        <translation>das Wurzelelement ist &lt;%1&gt;, nicht &lt;w:document&gt; von WordprocessingML: die Datei ist kein Textverarbeitungsdokument</translation>
    </message>
    <message>
        <location filename="../core/io/docx_reader.cpp" line="337"/>
        <source>the document has no &lt;w:body&gt;</source>
        <translation>das Dokument hat kein &lt;w:body&gt;</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="47"/>
        <source>the archive holds no META-INF/container.xml: it is not an EPUB publication</source>
        <translation>das Archiv enthält kein META-INF/container.xml: es ist keine EPUB-Publikation</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="61"/>
        <source>it names no package document (&lt;rootfile media-type=&quot;application/oebps-package+xml&quot;&gt;)</source>
        <translation>es nennt kein Paketdokument (&lt;rootfile media-type=&quot;application/oebps-package+xml&quot;&gt;)</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="113"/>
        <source>the package is of the type &quot;%1&quot;, not an EPUB publication (%2)</source>
        <translation>das Paket hat den Typ „%1“, ist also keine EPUB-Publikation (%2)</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="122"/>
        <source>the archive holds no %1, the package document META-INF/container.xml names</source>
        <translation>das Archiv enthält nicht %1, das Paketdokument, das META-INF/container.xml nennt</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="134"/>
        <source>the root element is &lt;%1&gt;, not &lt;package&gt;</source>
        <translation>das Wurzelelement ist &lt;%1&gt;, nicht &lt;package&gt;</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="174"/>
        <source>the package has no &lt;spine&gt;</source>
        <translation>das Paket hat kein &lt;spine&gt;</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="187"/>
        <source>the spine refers to &quot;%1&quot;, which the manifest does not hold</source>
        <translation>der Spine verweist auf „%1“, das im Manifest fehlt</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="195"/>
        <source>the spine&apos;s document %1 is not in the archive</source>
        <translation>das Dokument %1 des Spines ist nicht im Archiv</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="198"/>
        <source>the chapter %1 is encrypted (DRM); Fourfold reads only books without it</source>
        <translation>das Kapitel %1 ist verschlüsselt (DRM); Fourfold liest nur Bücher ohne DRM</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="265"/>
        <source>the book holds no text: it contains no articles</source>
        <translation>das Buch enthält keinen Text: es enthält keine Artikel</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="145"/>
        <source>the pubDate &quot;%1&quot; is not an RFC 822 date (such as &quot;Sat, 07 Sep 2002 09:42:31 GMT&quot;)</source>
        <translation>das pubDate „%1“ ist kein Datum nach RFC 822 (etwa „Sat, 07 Sep 2002 09:42:31 GMT“)</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="160"/>
        <source>&lt;%1&gt; is not an element of an RSS 2.0 item</source>
        <translation>&lt;%1&gt; ist kein Element eines RSS-2.0-Items</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="167"/>
        <source>the item has neither a guid nor a link to take its id from</source>
        <translation>das Item hat weder eine guid noch einen link, aus dem seine ID genommen werden kann</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="171"/>
        <source>the item &quot;%1&quot; has neither a description nor a content:encoded</source>
        <translation>das Item „%1“ hat weder eine description noch ein content:encoded</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="188"/>
        <source>the RSS version is &quot;%1&quot;; Fourfold reads RSS 2.0 (&lt;rss version=&quot;2.0&quot;&gt;)</source>
        <translation>die RSS-Version ist „%1“; Fourfold liest RSS 2.0 (&lt;rss version=&quot;2.0&quot;&gt;)</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="197"/>
        <source>&lt;%1&gt; is not an element of &lt;rss&gt;</source>
        <translation>&lt;%1&gt; ist kein Element von &lt;rss&gt;</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="202"/>
        <source>&lt;rss&gt; holds %1 channels; an RSS 2.0 feed has exactly one</source>
        <translation>&lt;rss&gt; enthält %1 Channels; ein RSS-2.0-Feed hat genau einen</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="214"/>
        <source>&lt;%1&gt; is not an element of an RSS 2.0 channel</source>
        <translation>&lt;%1&gt; ist kein Element eines RSS-2.0-Channels</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="225"/>
        <source>the feed holds no items: it contains no articles</source>
        <translation>der Feed enthält keine Items: er enthält keine Artikel</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="245"/>
        <source>&lt;%1 type=&quot;xhtml&quot;&gt; must hold one XHTML &lt;div&gt; (RFC 4287 §3.1.1.3)</source>
        <translation>&lt;%1 type=&quot;xhtml&quot;&gt; muss genau ein XHTML-&lt;div&gt; enthalten (RFC 4287 §3.1.1.3)</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="251"/>
        <source>&lt;%1&gt; has the type &quot;%2&quot;; Fourfold reads text, html, xhtml and text/* content</source>
        <translation>&lt;%1&gt; hat den Typ „%2“; Fourfold liest Inhalte vom Typ text, html, xhtml und text/*</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="275"/>
        <source>&lt;%1&gt; &quot;%2&quot; is not an RFC 3339 date-time (such as &quot;2003-12-13T18:30:02Z&quot;)</source>
        <translation>&lt;%1&gt; „%2“ ist keine Datum-Uhrzeit-Angabe nach RFC 3339 (etwa „2003-12-13T18:30:02Z“)</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="306"/>
        <source>&lt;%1&gt; is not an element of an Atom entry</source>
        <translation>&lt;%1&gt; ist kein Element eines Atom-Eintrags</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="346"/>
        <source>the entry has no &lt;id&gt; (RFC 4287 §4.1.2 requires one)</source>
        <translation>der Eintrag hat keine &lt;id&gt; (RFC 4287 §4.1.2 verlangt eine)</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="356"/>
        <source>the entry &quot;%1&quot; has neither a content held in the feed nor a summary</source>
        <translation>der Eintrag „%1“ hat weder einen im Feed enthaltenen Inhalt noch eine Zusammenfassung</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="376"/>
        <source>&lt;%1&gt; is not an element of an Atom feed</source>
        <translation>&lt;%1&gt; ist kein Element eines Atom-Feeds</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="389"/>
        <source>the feed holds no entries: it contains no articles</source>
        <translation>der Feed enthält keine Einträge: er enthält keine Artikel</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="411"/>
        <source>the root element &lt;%1&gt; is not a feed&apos;s (&lt;rss&gt; or Atom&apos;s &lt;feed&gt;)</source>
        <translation>das Wurzelelement &lt;%1&gt; gehört zu keinem Feed (&lt;rss&gt; oder Atoms &lt;feed&gt;)</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="88"/>
        <source>the NITF document has no &lt;body.content&gt;</source>
        <translation>das NITF-Dokument hat kein &lt;body.content&gt;</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="162"/>
        <source>the newsItem has no &lt;contentSet&gt;</source>
        <translation>das newsItem hat kein &lt;contentSet&gt;</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="169"/>
        <source>&lt;inlineData&gt; of type &quot;%1&quot; cannot be read; Fourfold reads text/plain</source>
        <translation>&lt;inlineData&gt; vom Typ „%1“ kann nicht gelesen werden; Fourfold liest text/plain</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="179"/>
        <source>&lt;inlineXML&gt; must hold one element (NITF or XHTML)</source>
        <translation>&lt;inlineXML&gt; muss genau ein Element enthalten (NITF oder XHTML)</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="188"/>
        <source>&lt;inlineXML&gt; holds &lt;%1&gt;; Fourfold reads NITF and XHTML</source>
        <translation>&lt;inlineXML&gt; enthält &lt;%1&gt;; Fourfold liest NITF und XHTML</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="192"/>
        <source>the newsItem holds no text inline (no &lt;inlineXML&gt; or &lt;inlineData&gt;); remote content is not fetched</source>
        <translation>das newsItem enthält keinen eingebetteten Text (kein &lt;inlineXML&gt; oder &lt;inlineData&gt;); entfernte Inhalte werden nicht abgerufen</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="204"/>
        <source>the newsItem has no guid</source>
        <translation>das newsItem hat keine guid</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="260"/>
        <source>the newsMessage holds no newsItem: it contains no articles</source>
        <translation>die newsMessage enthält kein newsItem: sie enthält keine Artikel</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="264"/>
        <source>the newsMessage holds a &lt;%1&gt;; Fourfold imports newsItems only</source>
        <translation>die newsMessage enthält ein &lt;%1&gt;; Fourfold importiert nur newsItems</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="290"/>
        <source>the root element &lt;%1&gt; is not a news item&apos;s (&lt;nitf&gt;, or NewsML-G2&apos;s &lt;newsItem&gt; or &lt;newsMessage&gt;)</source>
        <translation>das Wurzelelement &lt;%1&gt; gehört zu keiner Nachrichtenmeldung (&lt;nitf&gt; oder &lt;newsItem&gt; bzw. &lt;newsMessage&gt; von NewsML-G2)</translation>
    </message>
    <message>
        <location filename="../core/io/odt_reader.cpp" line="221"/>
        <source>the package is of the type &quot;%1&quot;, not an OpenDocument text (%2)</source>
        <translation>das Paket hat den Typ „%1“, ist also kein OpenDocument-Text (%2)</translation>
    </message>
    <message>
        <location filename="../core/io/odt_reader.cpp" line="230"/>
        <source>the document is encrypted (its manifest holds encryption data); save it without a password first</source>
        <translation>das Dokument ist verschlüsselt (sein Manifest enthält Verschlüsselungsdaten); speichern Sie es zuerst ohne Passwort</translation>
    </message>
    <message>
        <location filename="../core/io/odt_reader.cpp" line="236"/>
        <source>the archive holds no content.xml: it is not an OpenDocument text</source>
        <translation>das Archiv enthält kein content.xml: es ist kein OpenDocument-Text</translation>
    </message>
    <message>
        <location filename="../core/io/odt_reader.cpp" line="244"/>
        <source>the root element is &lt;%1&gt;, not &lt;office:document-content&gt;</source>
        <translation>das Wurzelelement ist &lt;%1&gt;, nicht &lt;office:document-content&gt;</translation>
    </message>
    <message>
        <location filename="../core/io/odt_reader.cpp" line="250"/>
        <source>the document has no &lt;office:text&gt; body: it is not a text document</source>
        <translation>das Dokument hat keinen &lt;office:text&gt;-Rumpf: es ist kein Textdokument</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="285"/>
        <source>the file is not a PDF (it has no &quot;%PDF-&quot; header)</source>
        <translation>die Datei ist kein PDF (sie hat keinen „%PDF-“-Kopf)</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="294"/>
        <source>the PDF cannot be read: it is damaged, cut off or encrypted in a way poppler cannot open</source>
        <translation>das PDF kann nicht gelesen werden: es ist beschädigt, abgeschnitten oder so verschlüsselt, dass poppler es nicht öffnen kann</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="298"/>
        <source>the PDF is encrypted with a password; save a copy without the password first</source>
        <translation>das PDF ist mit einem Passwort verschlüsselt; speichern Sie zuerst eine Kopie ohne Passwort</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="304"/>
        <source>the PDF has no pages: it is damaged or cut off</source>
        <translation>das PDF hat keine Seiten: es ist beschädigt oder abgeschnitten</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="312"/>
        <source>page %1 of the PDF cannot be read: the file is damaged</source>
        <translation>Seite %1 des PDFs kann nicht gelesen werden: die Datei ist beschädigt</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="321"/>
        <source>the PDF has no text layer on any of its %1 page(s): it looks scanned (pages as images); run it through OCR (text recognition) first and import the result</source>
        <translation>das PDF hat auf keiner seiner %1 Seite(n) eine Textebene: es sieht gescannt aus (Seiten als Bilder); lassen Sie es zuerst durch eine Texterkennung (OCR) laufen und importieren Sie das Ergebnis</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="329"/>
        <source>the PDF holds no text besides running headers, footers and page numbers</source>
        <translation>das PDF enthält keinen Text außer Kopf- und Fußzeilen und Seitenzahlen</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="348"/>
        <source>the PDF holds no text besides its title</source>
        <translation>das PDF enthält keinen Text außer seinem Titel</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="87"/>
        <source>the file declares the external entity &quot;%1&quot; (%2); Fourfold reads nothing from outside the file</source>
        <translation>die Datei deklariert die externe Entität „%1“ (%2); Fourfold liest nichts von außerhalb der Datei</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="101"/>
        <source>the entity &quot;&amp;%1;&quot; is not declared in the file</source>
        <translation>die Entität „&amp;%1;“ ist in der Datei nicht deklariert</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="152"/>
        <source>the file declares the encoding &quot;%1&quot;; convert it to UTF-8 first</source>
        <translation>die Datei gibt die Kodierung „%1“ an; wandeln Sie sie zuerst in UTF-8 um</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="166"/>
        <source>the file is too large for the XML parser</source>
        <translation>die Datei ist zu groß für den XML-Parser</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="170"/>
        <source>the XML parser could not be started</source>
        <translation>der XML-Parser konnte nicht gestartet werden</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="191"/>
        <source>the XML is refused: its entities expand too far (an entity-expansion bomb?): %1</source>
        <translation>das XML wird abgelehnt: seine Entitäten expandieren zu weit (eine Entity-Expansion-Bombe?): %1</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="195"/>
        <source>the file is not well-formed XML: %1</source>
        <translation>die Datei ist kein wohlgeformtes XML: %1</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="202"/>
        <source>the file holds no XML element</source>
        <translation>die Datei enthält kein XML-Element</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="25"/>
        <source>%1 MiB</source>
        <translation>%1 MiB</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="26"/>
        <source>%1 bytes</source>
        <translation>%1 Bytes</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="57"/>
        <source>the zip reader could not be started</source>
        <translation>der ZIP-Leser konnte nicht gestartet werden</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="69"/>
        <source>the file is not a readable zip archive (not one at all, or cut off or damaged): %1</source>
        <translation>die Datei ist kein lesbares ZIP-Archiv (gar keines, oder abgeschnitten bzw. beschädigt): %1</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="73"/>
        <source>the file is a damaged zip archive: %1</source>
        <translation>die Datei ist ein beschädigtes ZIP-Archiv: %1</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="105"/>
        <source>the archive holds no %1</source>
        <translation>das Archiv enthält kein %1</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="109"/>
        <source>the entry %1 of the archive cannot be read: %2</source>
        <translation>der Eintrag %1 des Archivs kann nicht gelesen werden: %2</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="114"/>
        <source>the entry %1 of the archive is encrypted; save the document without a password first</source>
        <translation>der Eintrag %1 des Archivs ist verschlüsselt; speichern Sie das Dokument zuerst ohne Passwort</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="121"/>
        <source>the entry %1 of the archive cannot be opened: %2</source>
        <translation>der Eintrag %1 des Archivs kann nicht geöffnet werden: %2</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="129"/>
        <source>the entry %1 of the archive is damaged: %2</source>
        <translation>der Eintrag %1 des Archivs ist beschädigt: %2</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="138"/>
        <source>the entry %1 unpacks to more than %2; Fourfold unpacks at most %2 from one entry (is it a zip bomb?)</source>
        <translation>der Eintrag %1 entpackt zu mehr als %2; Fourfold entpackt höchstens %2 aus einem Eintrag (eine ZIP-Bombe?)</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="143"/>
        <source>the archive unpacks to more than %1 in all; Fourfold unpacks at most %1 from one archive (is it a zip bomb?)</source>
        <translation>das Archiv entpackt insgesamt zu mehr als %1; Fourfold entpackt höchstens %1 aus einem Archiv (eine ZIP-Bombe?)</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="189"/>
        <source>%1, line %2</source>
        <translation>%1, Zeile %2</translation>
    </message>
</context>
<context>
    <name>ArticleSplitText</name>
    <message>
        <location filename="../core/exchange/article_split.cpp" line="53"/>
        <source>The split &quot;%1&quot; is not two or three whole percentages summing to 100 (e.g. 80/10/10).</source>
        <translation>Die Aufteilung „%1“ besteht nicht aus zwei oder drei ganzen Prozentzahlen mit der Summe 100 (z. B. 80/10/10).</translation>
    </message>
</context>
<context>
    <name>ArticleStatusEdit</name>
    <message>
        <location filename="../core/project/article_status_edit.cpp" line="23"/>
        <source>Mark article as done</source>
        <translation>Artikel als erledigt markieren</translation>
    </message>
    <message>
        <location filename="../core/project/article_status_edit.cpp" line="24"/>
        <source>Mark article as %1</source>
        <translation>Artikel als %1 markieren</translation>
    </message>
    <message>
        <location filename="../core/project/article_status_edit.cpp" line="32"/>
        <source>&quot;%1&quot; is not a status (assigned, started, done).</source>
        <translation>„%1“ ist kein Status (assigned, started, done).</translation>
    </message>
</context>
<context>
    <name>ArticleTable</name>
    <message>
        <location filename="../core/store/article_table.cpp" line="74"/>
        <source>The article &quot;%1&quot; is already in the project.</source>
        <translation>Der Artikel „%1“ ist bereits im Projekt.</translation>
    </message>
    <message>
        <location filename="../core/store/article_table.cpp" line="131"/>
        <location filename="../core/store/article_table.cpp" line="231"/>
        <source>There is no article #%1 in the project.</source>
        <translation>Im Projekt gibt es keinen Artikel #%1.</translation>
    </message>
    <message>
        <location filename="../core/store/article_table.cpp" line="261"/>
        <source>The search &quot;%1&quot; could not be understood.</source>
        <translation>Die Suche „%1“ konnte nicht verstanden werden.</translation>
    </message>
    <message>
        <location filename="../core/store/article_table.cpp" line="283"/>
        <source>Article #%1 has no paragraph %2.</source>
        <translation>Artikel #%1 hat keinen Absatz %2.</translation>
    </message>
</context>
<context>
    <name>CanonicalText</name>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="32"/>
        <source>invalid UTF-8 (byte 0x%1): a continuation byte without a lead byte.</source>
        <translation>ungültiges UTF-8 (Byte 0x%1): ein Folgebyte ohne Startbyte.</translation>
    </message>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="36"/>
        <source>invalid UTF-8 (byte 0x%1): this byte never occurs in UTF-8.</source>
        <translation>ungültiges UTF-8 (Byte 0x%1): dieses Byte kommt in UTF-8 nie vor.</translation>
    </message>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="39"/>
        <source>invalid UTF-8 (byte 0x%1): an overlong encoding, which UTF-8 forbids.</source>
        <translation>ungültiges UTF-8 (Byte 0x%1): eine überlange Kodierung, die UTF-8 verbietet.</translation>
    </message>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="43"/>
        <source>invalid UTF-8 (byte 0x%1): the multi-byte sequence it starts is cut short.</source>
        <translation>ungültiges UTF-8 (Byte 0x%1): die Mehrbytefolge, die es beginnt, bricht zu früh ab.</translation>
    </message>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="47"/>
        <source>invalid UTF-8 (byte 0x%1): it encodes a UTF-16 surrogate (U+D800..U+DFFF), which UTF-8 forbids.</source>
        <translation>ungültiges UTF-8 (Byte 0x%1): es kodiert ein UTF-16-Surrogat (U+D800..U+DFFF), was UTF-8 verbietet.</translation>
    </message>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="53"/>
        <source>invalid UTF-8 (byte 0x%1): it encodes a code point above U+10FFFF.</source>
        <translation>ungültiges UTF-8 (Byte 0x%1): es kodiert einen Codepunkt oberhalb von U+10FFFF.</translation>
    </message>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="57"/>
        <source>Save the file as UTF-8 and import it again.</source>
        <translation>Speichern Sie die Datei als UTF-8 und importieren Sie sie erneut.</translation>
    </message>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="142"/>
        <source>NUL byte (0x00): the file looks binary, not like text. Import a UTF-8 text file.</source>
        <translation>NUL-Byte (0x00): die Datei sieht binär aus, nicht wie Text. Importieren Sie eine UTF-8-Textdatei.</translation>
    </message>
</context>
<context>
    <name>CodebookEditorText</name>
    <message>
        <location filename="../app/desktop/codebook/codebook_field_check.cpp" line="55"/>
        <source>A choice list needs at least one value (one per line).</source>
        <translation>Eine Auswahlliste braucht mindestens einen Wert (einen pro Zeile).</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_field_check.cpp" line="58"/>
        <source>Line %1 is empty: every value needs a name.</source>
        <translation>Zeile %1 ist leer: jeder Wert braucht einen Namen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_field_check.cpp" line="61"/>
        <source>“%1” is listed twice (lines %2 and %3).</source>
        <translation>„%1“ steht zweimal in der Liste (Zeilen %2 und %3).</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_field_check.cpp" line="87"/>
        <source>The key is empty: give a short name such as “polarity”.</source>
        <translation>Der Schlüssel ist leer: geben Sie einen kurzen Namen wie „polarity“ an.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_field_check.cpp" line="89"/>
        <source>Another attribute of this function already has the key “%1”.</source>
        <translation>Ein anderes Merkmal dieser Funktion hat bereits den Schlüssel „%1“.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_field_check.cpp" line="93"/>
        <source>Another item already has the key “%1”.</source>
        <translation>Ein anderes Item hat bereits den Schlüssel „%1“.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_field_check.cpp" line="104"/>
        <source>the codebook being edited</source>
        <translation>das bearbeitete Codebuch</translation>
    </message>
</context>
<context>
    <name>CodebookTable</name>
    <message>
        <location filename="../core/store/codebook_table.cpp" line="81"/>
        <source>codebook version %1</source>
        <translation>Codebuchversion %1</translation>
    </message>
    <message>
        <location filename="../core/store/codebook_table.cpp" line="116"/>
        <source>The project has no codebook.</source>
        <translation>Das Projekt hat kein Codebuch.</translation>
    </message>
    <message>
        <location filename="../core/store/codebook_table.cpp" line="132"/>
        <source>The project has no codebook version %1.</source>
        <translation>Das Projekt hat keine Codebuchversion %1.</translation>
    </message>
</context>
<context>
    <name>CodebookText</name>
    <message>
        <location filename="../core/model/codebook.cpp" line="90"/>
        <source>The codebook has no attribute &quot;%1&quot; for %2 (it has: %3).</source>
        <translation>Das Codebuch hat kein Merkmal „%1“ für %2 (es hat: %3).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook.cpp" line="92"/>
        <source>none</source>
        <translation>keine</translation>
    </message>
    <message>
        <location filename="../core/model/codebook.cpp" line="97"/>
        <source>The attribute &quot;%1&quot; must be text.</source>
        <translation>Das Merkmal „%1“ muss Text sein.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook.cpp" line="101"/>
        <source>&quot;%1&quot; is not a value of the attribute &quot;%2&quot; (allowed: %3).</source>
        <translation>„%1“ ist kein Wert des Merkmals „%2“ (erlaubt: %3).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook.cpp" line="112"/>
        <source>The codebook has no article-level item &quot;%1&quot;.</source>
        <translation>Das Codebuch hat kein Item „%1“ auf Artikelebene.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook.cpp" line="115"/>
        <source>&quot;%1&quot; is not an answer to &quot;%2&quot; (allowed: %3).</source>
        <translation>„%1“ ist keine Antwort auf „%2“ (erlaubt: %3).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="24"/>
        <source>null</source>
        <translation>null</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="26"/>
        <source>a boolean</source>
        <translation>ein Wahrheitswert</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="28"/>
        <source>a number</source>
        <translation>eine Zahl</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="30"/>
        <location filename="../core/model/codebook_json.cpp" line="227"/>
        <location filename="../core/model/codebook_json.cpp" line="259"/>
        <location filename="../core/model/codebook_json.cpp" line="305"/>
        <source>a string</source>
        <translation>eine Zeichenkette</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="32"/>
        <location filename="../core/model/codebook_json.cpp" line="244"/>
        <source>an array</source>
        <translation>ein Array</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="34"/>
        <location filename="../core/model/codebook_json.cpp" line="299"/>
        <location filename="../core/model/codebook_json.cpp" line="344"/>
        <source>an object</source>
        <translation>ein Objekt</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="38"/>
        <source>nothing</source>
        <translation>nichts</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="91"/>
        <source>the key &quot;%1&quot; appears twice.</source>
        <translation>der Schlüssel „%1“ kommt zweimal vor.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="114"/>
        <source>&quot;%1&quot; defines the function &quot;%2&quot; a second time; a codebook defines problem, cause, evaluation and remedy once each.</source>
        <translation>„%1“ definiert die Funktion „%2“ ein zweites Mal; ein Codebuch definiert Problem, Ursache, Bewertung und Lösung je einmal.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="124"/>
        <source>the codebook does not define the function &quot;%1&quot;.</source>
        <translation>das Codebuch definiert die Funktion „%1“ nicht.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="137"/>
        <source>&quot;%1&quot; repeats the item &quot;%2&quot;.</source>
        <translation>„%1“ wiederholt das Item „%2“.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="176"/>
        <source>&quot;%1&quot; must be %2, not %3.</source>
        <translation>„%1“ muss %2 sein, nicht %3.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="189"/>
        <source>unknown key &quot;%1&quot; (expected one of: %2).</source>
        <translation>unbekannter Schlüssel „%1“ (erwartet wird einer von: %2).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="205"/>
        <source>&quot;%1&quot; contains the control character U+%2; only line breaks and tabs may stand in definitions, rules, examples and questions.</source>
        <translation>„%1“ enthält das Steuerzeichen U+%2; in Definitionen, Regeln, Beispielen und Fragen dürfen nur Zeilenumbrüche und Tabulatoren stehen.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="209"/>
        <source>&quot;%1&quot; contains the control character U+%2.</source>
        <translation>„%1“ enthält das Steuerzeichen U+%2.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="223"/>
        <location filename="../core/model/codebook_json.cpp" line="240"/>
        <source>&quot;%1&quot; is missing.</source>
        <translation>„%1“ fehlt.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="274"/>
        <source>&quot;%1&quot; lists no values.</source>
        <translation>„%1“ nennt keine Werte.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="280"/>
        <source>&quot;%1&quot; is an empty value.</source>
        <translation>„%1“ ist ein leerer Wert.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="283"/>
        <source>&quot;%1&quot; repeats the value &quot;%2&quot;.</source>
        <translation>„%1“ wiederholt den Wert „%2“.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="308"/>
        <source>&quot;%1&quot; recodes an empty value.</source>
        <translation>„%1“ recodiert einen leeren Wert.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="311"/>
        <source>&quot;%1&quot; recodes &quot;%2&quot;, which is still one of the values; recode only values that were dropped.</source>
        <translation>„%1“ recodiert „%2“, der noch einer der Werte ist; recodieren Sie nur Werte, die weggefallen sind.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="317"/>
        <source>&quot;%1&quot; recodes to &quot;%2&quot;, which is not one of the values (%3).</source>
        <translation>„%1“ recodiert zu „%2“, der keiner der Werte ist (%3).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="334"/>
        <source>&quot;%1&quot; is &quot;%2&quot;, not a level of measurement (nominal, ordinal, interval or ratio).</source>
        <translation>„%1“ ist „%2“, kein Skalenniveau (nominal, ordinal, interval oder ratio).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="354"/>
        <source>&quot;%1&quot; is empty.</source>
        <translation>„%1“ ist leer.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="371"/>
        <location filename="../core/model/codebook_json.cpp" line="490"/>
        <source>&quot;%1&quot; is &quot;%2&quot;, not one of the four functions (problem, cause, evaluation, remedy).</source>
        <translation>„%1“ ist „%2“, keine der vier Funktionen (problem, cause, evaluation, remedy).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="404"/>
        <source>&quot;%1&quot; repeats the attribute &quot;%2&quot; of %3.</source>
        <translation>„%1“ wiederholt das Merkmal „%2“ von %3.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="435"/>
        <source>&quot;%1&quot; is only for choice attributes; &quot;%2&quot; is a text attribute.</source>
        <translation>„%1“ gilt nur für Auswahlmerkmale; „%2“ ist ein Textmerkmal.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="450"/>
        <source>&quot;%1&quot; is &quot;%2&quot;, not an attribute type (choice or text).</source>
        <translation>„%1“ ist „%2“, kein Merkmalstyp (choice oder text).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="617"/>
        <source>the codebook is not valid JSON: %1.</source>
        <translation>das Codebuch ist kein gültiges JSON: %1.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="621"/>
        <source>the codebook must be a JSON object, not %1.</source>
        <translation>das Codebuch muss ein JSON-Objekt sein, nicht %1.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="152"/>
        <source>&quot;%1&quot; is not a language code (two or three lower-case letters, ISO 639, such as &quot;nl&quot; or &quot;de&quot;).</source>
        <translation>„%1“ ist kein Sprachcode (zwei oder drei Kleinbuchstaben nach ISO 639, etwa „nl“ oder „de“).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="496"/>
        <source>&quot;%1&quot; gives the texts of &quot;%2&quot; a second time.</source>
        <translation>„%1“ gibt die Texte von „%2“ ein zweites Mal an.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="530"/>
        <source>&quot;%1&quot; names the attribute &quot;%2&quot;, which %3 does not have.</source>
        <translation>„%1“ nennt das Merkmal „%2“, das %3 nicht hat.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="554"/>
        <source>&quot;%1&quot; names the item &quot;%2&quot;, which the codebook does not have.</source>
        <translation>„%1“ nennt die Frage „%2“, die das Codebuch nicht hat.</translation>
    </message>
</context>
<context>
    <name>CoderCopiesText</name>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="74"/>
        <source>Several coders are called &quot;%1&quot;; name the coder by pseudonym.</source>
        <translation>Mehrere Codierende heißen „%1“; nennen Sie die codierende Person beim Pseudonym.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="78"/>
        <source>There is no coder with the pseudonym or name &quot;%1&quot; in the project.</source>
        <translation>Im Projekt gibt es keine codierende Person mit dem Pseudonym oder Namen „%1“.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="114"/>
        <source>%1 (copy for %2)</source>
        <translation>%1 (Kopie für %2)</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="171"/>
        <source>%1 is not a Fourfold project file; it was not merged.</source>
        <translation>%1 ist keine Fourfold-Projektdatei; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="174"/>
        <source>%1 was written by a newer Fourfold (schema version %2); it was not merged.</source>
        <translation>%1 wurde von einem neueren Fourfold geschrieben (Schemaversion %2); sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="183"/>
        <source>%1 is a project file but not a coder copy; it was not merged.</source>
        <translation>%1 ist eine Projektdatei, aber keine Kopie für Codierende; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="188"/>
        <source>%1 is a coder copy of another project (%2), not of this one (%3); it was not merged.</source>
        <translation>%1 ist eine Kopie für Codierende aus einem anderen Projekt (%2), nicht aus diesem (%3); sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="197"/>
        <source>The coder of %1 is no longer in the project; it was not merged.</source>
        <translation>Die codierende Person von %1 ist nicht mehr im Projekt; die Kopie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="209"/>
        <source>%1 holds article &quot;%2&quot;, which is not in the project; it was not merged.</source>
        <translation>%1 enthält den Artikel „%2“, der nicht im Projekt ist; die Kopie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="215"/>
        <source>The text of article &quot;%1&quot; in %2 differs from the project&apos;s (SHA-256 %3 instead of %4): the copy was changed outside Fourfold; it was not merged.</source>
        <translation>Der Text des Artikels „%1“ in %2 weicht von dem des Projekts ab (SHA-256 %3 statt %4): die Kopie wurde außerhalb von Fourfold verändert; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="229"/>
        <source>%1 holds a codebook version (%2) that is not in the project; it was not merged.</source>
        <translation>%1 enthält eine Codebuchversion (%2), die nicht im Projekt ist; die Kopie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="238"/>
        <source>%1 holds %2 annotations, answers or assignments of people other than its coder %3; it was not merged.</source>
        <translation>%1 enthält %2 Annotationen, Antworten oder Zuweisungen anderer Personen als ihrer codierenden Person %3; die Kopie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="374"/>
        <source>%1 names a copy (%2) that this project never handed out; it was not merged.</source>
        <translation>%1 nennt eine Kopie (%2), die dieses Projekt nie ausgegeben hat; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="431"/>
        <source>There is no coder copy %1.</source>
        <translation>Es gibt keine Kopie für Codierende %1.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="597"/>
        <source>The coding time in %1 would overflow the project&apos;s; it was not merged.</source>
        <translation>Die Codierzeit in %1 würde die des Projekts überlaufen lassen; die Kopie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="664"/>
        <source>%1 is itself a coder copy; hand out copies from the main project.</source>
        <translation>%1 ist selbst eine Kopie für Codierende; geben Sie Kopien aus dem Hauptprojekt aus.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="671"/>
        <source>%1 already exists; choose another name for the coder copy.</source>
        <translation>%1 existiert bereits; wählen Sie einen anderen Namen für die Kopie.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="679"/>
        <source>Coder %1 has no assigned articles; assign some before handing out a copy.</source>
        <translation>Der codierenden Person %1 sind keine Artikel zugewiesen; weisen Sie welche zu, bevor Sie eine Kopie ausgeben.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="740"/>
        <source>%1 is itself a coder copy; merge copies into the main project.</source>
        <translation>%1 ist selbst eine Kopie für Codierende; führen Sie Kopien im Hauptprojekt zusammen.</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/project/coder_copies.cpp" line="785"/>
        <source>%1&apos;s coder copy, handed out %2, holds %n of the withdrawn assignments (%3): what %1 codes there still comes back at the merge, named, for you to decide.</source>
        <translation>
            <numerusform>Die Kopie für Codierende von %1, ausgegeben am %2, enthält %n der zurückgezogenen Zuweisungen (%3): was %1 dort codiert, kommt beim Zusammenführen trotzdem zurück, benannt und zu Ihrer Entscheidung.</numerusform>
            <numerusform>Die Kopie für Codierende von %1, ausgegeben am %2, enthält %n der zurückgezogenen Zuweisungen (%3): was %1 dort codiert, kommt beim Zusammenführen trotzdem zurück, benannt und zu Ihrer Entscheidung.</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../core/project/coder_copies.cpp" line="801"/>
        <source>%1 coded %n article(s) in the copy after the assignment was withdrawn in the project (a withdrawn draw): %2. The codings were merged; the assignments stay withdrawn and do not count. Decide each in the merge conflicts: keep the withdrawal, or take %1&apos;s version to assign the article again.</source>
        <translation>
            <numerusform>%1 hat %n Artikel in der Kopie codiert, nachdem die Zuweisung im Projekt zurückgezogen wurde (eine zurückgezogene Ziehung): %2. Die Codierungen wurden zusammengeführt; die Zuweisung bleibt zurückgezogen und zählt nicht. Entscheiden Sie jeden Fall unter den Konflikten beim Zusammenführen: den Rückzug behalten oder die Version von %1 übernehmen, um den Artikel erneut zuzuweisen.</numerusform>
            <numerusform>%1 hat %n Artikel in der Kopie codiert, nachdem ihre Zuweisungen im Projekt zurückgezogen wurden (eine zurückgezogene Ziehung): %2. Die Codierungen wurden zusammengeführt; die Zuweisungen bleiben zurückgezogen und zählen nicht. Entscheiden Sie jeden Fall unter den Konflikten beim Zusammenführen: den Rückzug behalten oder die Version von %1 übernehmen, um den Artikel erneut zuzuweisen.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="829"/>
        <source>Keep &quot;mine&quot; (the version the project holds) or &quot;theirs&quot; (the version that lost), not &quot;%1&quot;.</source>
        <translation>Behalten Sie „mine“ (die Version im Projekt) oder „theirs“ (die unterlegene Version), nicht „%1“.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="846"/>
        <source>There is no open conflict %1.</source>
        <translation>Es gibt keinen offenen Konflikt %1.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="849"/>
        <source>%1 has %2 open conflicts (from several copies); name the conflict&apos;s uuid.</source>
        <translation>%1 hat %2 offene Konflikte (aus mehreren Kopien); nennen Sie die UUID des Konflikts.</translation>
    </message>
</context>
<context>
    <name>CoderTable</name>
    <message>
        <location filename="../core/store/coder_table.cpp" line="34"/>
        <source>The pseudonym &quot;%1&quot; is already taken.</source>
        <translation>Das Pseudonym „%1“ ist bereits vergeben.</translation>
    </message>
    <message>
        <location filename="../core/store/coder_table.cpp" line="51"/>
        <location filename="../core/store/coder_table.cpp" line="69"/>
        <location filename="../core/store/coder_table.cpp" line="87"/>
        <source>There is no person #%1.</source>
        <translation>Es gibt keine Person #%1.</translation>
    </message>
</context>
<context>
    <name>CodingImportText</name>
    <message>
        <location filename="../core/project/coding_import.cpp" line="58"/>
        <source>missing required field &quot;%1&quot;.</source>
        <translation>erforderliches Feld „%1“ fehlt.</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="61"/>
        <source>field &quot;%1&quot; must be a non-empty string.</source>
        <translation>Feld „%1“ muss eine nicht leere Zeichenkette sein.</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="81"/>
        <source>Cannot read %1: %2</source>
        <translation>%1 kann nicht gelesen werden: %2</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="127"/>
        <source>the line is longer than %1 MiB</source>
        <translation>die Zeile ist länger als %1 MiB</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="146"/>
        <source>not a JSON object (%1).</source>
        <translation>kein JSON-Objekt (%1).</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="149"/>
        <source>another JSON value</source>
        <translation>ein anderer JSON-Wert</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="154"/>
        <source>unknown field &quot;%1&quot; (expected article, coder, function, quote, occurrence, attributes, note, confidence, gold, rationale, item, value).</source>
        <translation>unbekanntes Feld „%1“ (erwartet: article, coder, function, quote, occurrence, attributes, note, confidence, gold, rationale, item, value).</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="164"/>
        <source>field &quot;%1&quot; must be %2.</source>
        <translation>Feld „%1“ muss %2 sein.</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="169"/>
        <source>an object</source>
        <translation>ein Objekt</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="170"/>
        <location filename="../core/project/coding_import.cpp" line="174"/>
        <source>text</source>
        <translation>Text</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="172"/>
        <source>a number from 0 to 1</source>
        <translation>eine Zahl von 0 bis 1</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="184"/>
        <source>unknown coder &quot;%1&quot;.</source>
        <translation>unbekannte codierende Person „%1“.</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="192"/>
        <source>unknown article &quot;%1&quot;.</source>
        <translation>unbekannter Artikel „%1“.</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="252"/>
        <source>unknown function &quot;%1&quot; (expected problem, cause, evaluation or remedy).</source>
        <translation>unbekannte Funktion „%1“ (erwartet: problem, cause, evaluation oder remedy).</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="263"/>
        <source>field &quot;occurrence&quot; must be a whole number from 1.</source>
        <translation>Feld „occurrence“ muss eine ganze Zahl ab 1 sein.</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="270"/>
        <source>the quote &quot;%1&quot; does not occur %2 time(s) in article &quot;%3&quot;.</source>
        <translation>das Zitat „%1“ kommt im Artikel „%3“ nicht %2-mal vor.</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="286"/>
        <source>field &quot;gold&quot; must be true or false.</source>
        <translation>Feld „gold“ muss true oder false sein.</translation>
    </message>
</context>
<context>
    <name>CommandExtractorText</name>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="36"/>
        <source>stderr: %1</source>
        <translation>stderr: %1</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="75"/>
        <source>The extractor command is empty.</source>
        <translation>Der Extraktorbefehl ist leer.</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="79"/>
        <source>A timeout must be a positive number of seconds (or 0 for none).</source>
        <translation>Ein Zeitlimit muss eine positive Anzahl Sekunden sein (oder 0 für keines).</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="102"/>
        <source>The extractor &quot;%1&quot; could not be started.</source>
        <translation>Der Extraktor „%1“ konnte nicht gestartet werden.</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="109"/>
        <source>output of &quot;%1&quot;</source>
        <translation>Ausgabe von „%1“</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="128"/>
        <source>a line is longer than %1 MiB, the most one answer may be; the extractor was stopped and nothing was stored.</source>
        <translation>eine Zeile ist länger als %1 MiB, das Höchstmaß einer Antwort; der Extraktor wurde angehalten und nichts gespeichert.</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="143"/>
        <source>the extractor wrote more than %1 MiB, the most a run may write; it was stopped and nothing was stored.</source>
        <translation>der Extraktor hat mehr als %1 MiB geschrieben, das Höchstmaß eines Laufs; er wurde angehalten und nichts gespeichert.</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="196"/>
        <source>The extractor &quot;%1&quot; wrote nothing for %2 s and was stopped; nothing was stored.</source>
        <translation>Der Extraktor „%1“ hat %2 s lang nichts geschrieben und wurde angehalten; nichts wurde gespeichert.</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="201"/>
        <source>The extractor &quot;%1&quot; did not finish within %2 s and was stopped; nothing was stored.</source>
        <translation>Der Extraktor „%1“ ist nicht innerhalb von %2 s fertig geworden und wurde angehalten; nichts wurde gespeichert.</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="222"/>
        <source>The extractor &quot;%1&quot; crashed; nothing was stored.</source>
        <translation>Der Extraktor „%1“ ist abgestürzt; nichts wurde gespeichert.</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="227"/>
        <source>The extractor &quot;%1&quot; exited with code %2; nothing was stored.</source>
        <translation>Der Extraktor „%1“ hat mit Code %2 geendet; nichts wurde gespeichert.</translation>
    </message>
</context>
<context>
    <name>ConflictEditsText</name>
    <message>
        <location filename="../core/project/conflict_edits.cpp" line="61"/>
        <source>Keep the other version</source>
        <translation>Die andere Version behalten</translation>
    </message>
    <message>
        <location filename="../core/project/conflict_edits.cpp" line="62"/>
        <source>Keep the project&apos;s version</source>
        <translation>Die Version des Projekts behalten</translation>
    </message>
    <message>
        <location filename="../core/project/conflict_edits.cpp" line="83"/>
        <source>There is no open conflict %1.</source>
        <translation>Es gibt keinen offenen Konflikt %1.</translation>
    </message>
    <message>
        <location filename="../core/project/conflict_edits.cpp" line="111"/>
        <source>The object of conflict %1 is missing from the project.</source>
        <translation>Das Objekt des Konflikts %1 fehlt im Projekt.</translation>
    </message>
    <message>
        <location filename="../core/project/conflict_edits.cpp" line="122"/>
        <source>The decision on conflict %1 was never made.</source>
        <translation>Die Entscheidung über Konflikt %1 wurde nie getroffen.</translation>
    </message>
</context>
<context>
    <name>CopyTablesText</name>
    <message>
        <location filename="../core/store/copy_tables.cpp" line="58"/>
        <source>The %1 %2 of the copy belongs to another coder or article in the project.</source>
        <translation>%1 %2 der Kopie gehört zu einer anderen codierenden Person oder einem anderen Artikel im Projekt.</translation>
    </message>
    <message>
        <location filename="../core/store/copy_tables.cpp" line="298"/>
        <source>Unknown object type %1.</source>
        <translation>Unbekannter Objekttyp %1.</translation>
    </message>
    <message>
        <location filename="../core/store/copy_tables.cpp" line="303"/>
        <source>The %1 %2 of the copy refers to an object that is not in the project.</source>
        <translation>%1 %2 der Kopie verweist auf ein Objekt, das nicht im Projekt ist.</translation>
    </message>
    <message>
        <location filename="../core/store/copy_tables.cpp" line="664"/>
        <source>There is no open conflict %1.</source>
        <translation>Es gibt keinen offenen Konflikt %1.</translation>
    </message>
    <message>
        <location filename="../core/store/copy_tables.cpp" line="678"/>
        <source>There is no decided conflict %1.</source>
        <translation>Es gibt keinen entschiedenen Konflikt %1.</translation>
    </message>
</context>
<context>
    <name>CopyValidationText</name>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="25"/>
        <source>span</source>
        <translation>Textstelle</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="27"/>
        <source>answer</source>
        <translation>Antwort</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="29"/>
        <source>link</source>
        <translation>Verknüpfung</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="30"/>
        <source>assignment</source>
        <translation>Zuweisung</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="54"/>
        <source>is not a time</source>
        <translation>ist keine Zeitangabe</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="56"/>
        <source>is dated %1, before the copy was handed out (%2)</source>
        <translation>ist auf %1 datiert, vor der Ausgabe der Kopie (%2)</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="59"/>
        <source>is dated %1, in the future (now %2)</source>
        <translation>ist auf %1 datiert, in der Zukunft (jetzt %2)</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="72"/>
        <source>The %1 %2 in %3 reuses the uuid of another object in the project (%4); the copy was changed outside Fourfold; it was not merged.</source>
        <translation>%1 %2 in %3 verwendet die UUID eines anderen Objekts im Projekt (%4) erneut; die Kopie wurde außerhalb von Fourfold verändert; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="84"/>
        <source>The coding time of article &quot;%1&quot; in %2 is %3 s, less than the %4 s it was handed out with; the copy was changed outside Fourfold; it was not merged.</source>
        <translation>Die Codierzeit des Artikels „%1“ in %2 beträgt %3 s, weniger als die %4 s, mit denen er ausgegeben wurde; die Kopie wurde außerhalb von Fourfold verändert; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="93"/>
        <source>%1 adds more coding time (%2 s on article &quot;%3&quot;, %4 s before it) than has passed since it was handed out (%5 s, with a day&apos;s allowance for clocks); the copy was changed outside Fourfold; it was not merged.</source>
        <translation>%1 fügt mehr Codierzeit hinzu (%2 s bei Artikel „%3“, vorher %4 s), als seit der Ausgabe vergangen ist (%5 s, mit einem Tag Spielraum für Uhren); die Kopie wurde außerhalb von Fourfold verändert; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="115"/>
        <source>Span %1 in %2 does not quote its article&apos;s text at [%3, %4); the copy was changed outside Fourfold; it was not merged.</source>
        <translation>Textstelle %1 in %2 zitiert den Text ihres Artikels bei [%3, %4) nicht; die Kopie wurde außerhalb von Fourfold verändert; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="153"/>
        <source>%1 holds two objects (%2, %3) with the same uuid %4; the copy was changed outside Fourfold; it was not merged.</source>
        <translation>%1 enthält zwei Objekte (%2, %3) mit derselben UUID %4; die Kopie wurde außerhalb von Fourfold verändert; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="171"/>
        <source>%1 holds an assignment of article &quot;%2&quot; (phase %3) that was not handed out in this copy; it was not merged.</source>
        <translation>%1 enthält eine Zuweisung des Artikels „%2“ (Phase %3), die mit dieser Kopie nicht ausgegeben wurde; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="179"/>
        <source>The link %1 in %2 joins a span that is not in the copy; it was not merged.</source>
        <translation>Die Verknüpfung %1 in %2 verbindet eine Textstelle, die nicht in der Kopie ist; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="185"/>
        <source>The %1 %2 in %3 is on article &quot;%4&quot;, which was not handed out to %5 in this copy; it was not merged.</source>
        <translation>%1 %2 in %3 betrifft den Artikel „%4“, der %5 mit dieser Kopie nicht ausgegeben wurde; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="203"/>
        <source>The %1 %2 in %3 %4 (%5 &quot;%6&quot;); the copy was changed outside Fourfold; it was not merged.</source>
        <translation>%1 %2 in %3 %4 (%5 „%6“); die Kopie wurde außerhalb von Fourfold verändert; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="218"/>
        <source>Event %1 (%2) of %3</source>
        <translation>Ereignis %1 (%2) von %3</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="220"/>
        <source>%1 %2; the copy&apos;s log was changed outside Fourfold; it was not merged.</source>
        <translation>%1 %2; das Protokoll der Kopie wurde außerhalb von Fourfold verändert; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="229"/>
        <source>%1 is not one a coder&apos;s program writes; the copy&apos;s log was changed outside Fourfold; it was not merged.</source>
        <translation>%1 ist keines, das das Programm einer codierenden Person schreibt; das Protokoll der Kopie wurde außerhalb von Fourfold verändert; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="236"/>
        <source>%1 is not by the copy&apos;s coder %2; it was not merged.</source>
        <translation>%1 stammt nicht von der codierenden Person %2 der Kopie; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="248"/>
        <source>%1 is not an edit a coder can make (object %2 %3); the copy&apos;s log was changed outside Fourfold; it was not merged.</source>
        <translation>%1 ist keine Änderung, die eine codierende Person vornehmen kann (Objekt %2 %3); das Protokoll der Kopie wurde außerhalb von Fourfold verändert; sie wurde nicht zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="259"/>
        <source>%1 is about %2, which is not the coder&apos;s own in the project (%3); it was not merged.</source>
        <translation>%1 betrifft %2, das im Projekt nicht der codierenden Person gehört (%3); sie wurde nicht zusammengeführt.</translation>
    </message>
</context>
<context>
    <name>CueBaselineText</name>
    <message>
        <location filename="../core/extract/cue_baseline.cpp" line="69"/>
        <source>parameter &quot;%1&quot; of the cues extractor must be a number of at least 0, got %2.</source>
        <translation>Parameter „%1“ des Cue-Extraktors muss eine Zahl von mindestens 0 sein, erhalten: %2.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_baseline.cpp" line="79"/>
        <source>parameter &quot;minWeight&quot; of the cues extractor must be a number above 0, got %1.</source>
        <translation>Parameter „minWeight“ des Cue-Extraktors muss eine Zahl über 0 sein, erhalten: %1.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_baseline.cpp" line="86"/>
        <source>parameter &quot;otherLanguages&quot; of the cues extractor must be error or skip, got &quot;%1&quot;.</source>
        <translation>Parameter „otherLanguages“ des Cue-Extraktors muss error oder skip sein, erhalten: „%1“.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_baseline.cpp" line="176"/>
        <source>Article %1 is in language &quot;%2&quot;, which has no cue list (the cue baseline knows %3); pass otherLanguages=skip to leave such articles out.</source>
        <translation>Artikel %1 ist in der Sprache „%2“, für die es keine Cue-Liste gibt (die Cue-Baseline kennt %3); geben Sie otherLanguages=skip an, um solche Artikel auszulassen.</translation>
    </message>
</context>
<context>
    <name>CueListText</name>
    <message>
        <location filename="../core/extract/cue_list.cpp" line="56"/>
        <source>There is no cue list for language &quot;%1&quot;; the cue baseline knows %2.</source>
        <translation>Für die Sprache „%1“ gibt es keine Cue-Liste; die Cue-Baseline kennt %2.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_list.cpp" line="61"/>
        <source>The cue list for &quot;%1&quot; is missing from this build.</source>
        <translation>Die Cue-Liste für „%1“ fehlt in diesem Build.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_list.cpp" line="71"/>
        <source>%1: not valid JSON (%2).</source>
        <translation>%1: kein gültiges JSON (%2).</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_list.cpp" line="77"/>
        <source>%1: the cue list names no language.</source>
        <translation>%1: die Cue-Liste nennt keine Sprache.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_list.cpp" line="85"/>
        <source>%1: every category needs a name and a function.</source>
        <translation>%1: jede Kategorie braucht einen Namen und eine Funktion.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_list.cpp" line="100"/>
        <source>%1: cue &quot;%2&quot; of category %3 has an empty word.</source>
        <translation>%1: Cue „%2“ der Kategorie %3 hat ein leeres Wort.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_list.cpp" line="107"/>
        <source>%1: category %2 has an empty cue.</source>
        <translation>%1: Kategorie %2 hat einen leeren Cue.</translation>
    </message>
</context>
<context>
    <name>Database</name>
    <message>
        <location filename="../core/store/database.cpp" line="40"/>
        <source>The disk holding %1 is full; nothing was written. Free some space and try again.</source>
        <translation>Der Datenträger mit %1 ist voll; nichts wurde geschrieben. Geben Sie Speicherplatz frei und versuchen Sie es erneut.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="141"/>
        <source>%1 is read-only (the file, or the disk it is on); this command writes to it.</source>
        <translation>%1 ist schreibgeschützt (die Datei oder ihr Datenträger); dieser Befehl schreibt hinein.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="159"/>
        <location filename="../core/store/database.cpp" line="182"/>
        <source>Cannot open the project file %1.</source>
        <translation>Die Projektdatei %1 kann nicht geöffnet werden.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="191"/>
        <source>%1 is locked by another program; try again when it is done.</source>
        <translation>%1 ist von einem anderen Programm gesperrt; versuchen Sie es erneut, wenn es fertig ist.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="197"/>
        <source>%1 could not be read: %2.</source>
        <translation>%1 konnte nicht gelesen werden: %2.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="202"/>
        <source>%1 is not a Fourfold project file or is damaged.</source>
        <translation>%1 ist keine Fourfold-Projektdatei oder ist beschädigt.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="219"/>
        <source>The project file %1 could not be prepared for writing.</source>
        <translation>Die Projektdatei %1 konnte nicht zum Schreiben vorbereitet werden.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="242"/>
        <source>The project file could not be updated.</source>
        <translation>Die Projektdatei konnte nicht aktualisiert werden.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="260"/>
        <source>A query could not be prepared.</source>
        <translation>Eine Abfrage konnte nicht vorbereitet werden.</translation>
    </message>
    <message>
        <location filename="../core/store/statement.cpp" line="105"/>
        <source>The project file could not be read or written.</source>
        <translation>Die Projektdatei konnte nicht gelesen oder geschrieben werden.</translation>
    </message>
</context>
<context>
    <name>DiagnosticsText</name>
    <message>
        <location filename="../core/agreement/diagnostics.cpp" line="28"/>
        <source>The diagnostics were cancelled.</source>
        <translation>Die Diagnose wurde abgebrochen.</translation>
    </message>
    <message>
        <location filename="../core/agreement/diagnostics.cpp" line="95"/>
        <source>The coders named do not match the columns of the reliability data.</source>
        <translation>Die genannten Codierenden passen nicht zu den Spalten der Reliabilitätsdaten.</translation>
    </message>
    <message>
        <location filename="../core/agreement/diagnostics.cpp" line="128"/>
        <location filename="../core/agreement/diagnostics.cpp" line="331"/>
        <source>The units named do not match the rows of the reliability data.</source>
        <translation>Die genannten Einheiten passen nicht zu den Zeilen der Reliabilitätsdaten.</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/agreement/diagnostics.cpp" line="237"/>
        <source>Reliability needs at least two coders; the selection has %n.</source>
        <translation>
            <numerusform>Reliabilität braucht mindestens zwei Codierende; die Auswahl hat %n.</numerusform>
            <numerusform>Reliabilität braucht mindestens zwei Codierende; die Auswahl hat %n.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/agreement/diagnostics.cpp" line="334"/>
        <source>A batch holds at least one article.</source>
        <translation>Ein Stapel enthält mindestens einen Artikel.</translation>
    </message>
    <message>
        <location filename="../core/agreement/diagnostics.cpp" line="384"/>
        <source>no date</source>
        <translation>kein Datum</translation>
    </message>
</context>
<context>
    <name>DisagreementsText</name>
    <message>
        <location filename="../core/agreement/disagreements.cpp" line="255"/>
        <source>Both coders of the pair must have marked the article &quot;%1&quot; done.</source>
        <translation>Beide Codierenden des Paars müssen den Artikel „%1“ als erledigt markiert haben.</translation>
    </message>
    <message>
        <location filename="../core/agreement/disagreements.cpp" line="288"/>
        <source>Choose the spans whose boundaries to merge.</source>
        <translation>Wählen Sie die Textstellen, deren Grenzen vereint werden sollen.</translation>
    </message>
    <message>
        <location filename="../core/agreement/disagreements.cpp" line="296"/>
        <source>Only spans of one function can be merged; accept one of them instead.</source>
        <translation>Nur Textstellen einer Funktion können vereint werden; übernehmen Sie stattdessen eine von ihnen.</translation>
    </message>
</context>
<context>
    <name>DocumentSplitText</name>
    <message>
        <location filename="../core/io/document_split.cpp" line="39"/>
        <source>The split pattern is empty.</source>
        <translation>Das Trennmuster ist leer.</translation>
    </message>
    <message>
        <location filename="../core/io/document_split.cpp" line="42"/>
        <source>The split pattern &quot;%1&quot; is not a valid regular expression: %2 (at character %3).</source>
        <translation>Das Trennmuster „%1“ ist kein gültiger regulärer Ausdruck: %2 (bei Zeichen %3).</translation>
    </message>
    <message>
        <location filename="../core/io/document_split.cpp" line="50"/>
        <source>The split pattern &quot;%1&quot; names the group &quot;%2&quot;; the groups it may name are title, outlet and date.</source>
        <translation>Das Trennmuster „%1“ nennt die Gruppe „%2“; es darf nur die Gruppen title, outlet und date nennen.</translation>
    </message>
    <message>
        <location filename="../core/io/document_split.cpp" line="82"/>
        <source>the split pattern &quot;%1&quot; matches no line of the document</source>
        <translation>das Trennmuster „%1“ trifft auf keine Zeile des Dokuments zu</translation>
    </message>
    <message>
        <location filename="../core/io/document_split.cpp" line="104"/>
        <source>part %1 of the document (from this line) holds no text besides its title</source>
        <translation>Teil %1 des Dokuments (ab dieser Zeile) enthält außer seinem Titel keinen Text</translation>
    </message>
</context>
<context>
    <name>ElementIndicatorsText</name>
    <message>
        <location filename="../core/scoring/element_indicators.cpp" line="69"/>
        <source>&quot;%1&quot; is not a layer for frames; use gold, consensus, coder:PSEUDONYM or run:NAME.</source>
        <translation>„%1“ ist keine Ebene für Frames; verwenden Sie gold, consensus, coder:PSEUDONYM oder run:NAME.</translation>
    </message>
</context>
<context>
    <name>ExportFolderText</name>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="44"/>
        <source>The export folder %1 is a symbolic link; name a real folder.</source>
        <translation>Der Exportordner %1 ist ein symbolischer Link; nennen Sie einen echten Ordner.</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="48"/>
        <source>%1 exists and is not a folder.</source>
        <translation>%1 existiert und ist kein Ordner.</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="54"/>
        <source>The folder %1 is not empty (%2 entries); choose a new or empty folder, or ask to replace an earlier export in it (--force).</source>
        <translation>Der Ordner %1 ist nicht leer (%2 Einträge); wählen Sie einen neuen oder leeren Ordner oder lassen Sie einen früheren Export darin ersetzen (--force).</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="63"/>
        <source>The folder %1 holds %2, which is not a file an export writes; it was left alone. Choose a new or empty folder.</source>
        <translation>Der Ordner %1 enthält %2, das keine Datei ist, die ein Export schreibt; es wurde nicht angerührt. Wählen Sie einen neuen oder leeren Ordner.</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="72"/>
        <source>The folder %1 could not be created.</source>
        <translation>Der Ordner %1 konnte nicht angelegt werden.</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="80"/>
        <source>A folder to write the export into could not be made in %1: %2.</source>
        <translation>In %1 konnte kein Ordner für den Export angelegt werden: %2.</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="102"/>
        <source>%1 was replaced by something other than a folder while the export was written; nothing was written.</source>
        <translation>%1 wurde, während der Export geschrieben wurde, durch etwas anderes als einen Ordner ersetzt; nichts wurde geschrieben.</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="109"/>
        <location filename="../core/exchange/export_folder.cpp" line="120"/>
        <location filename="../core/exchange/export_folder.cpp" line="133"/>
        <source>The export could not be moved into %1: %2.</source>
        <translation>Der Export konnte nicht nach %1 verschoben werden: %2.</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="127"/>
        <source>The earlier export in %1 could not be moved aside: %2.</source>
        <translation>Der frühere Export in %1 konnte nicht beiseitegeschoben werden: %2.</translation>
    </message>
</context>
<context>
    <name>ExtractorJob</name>
    <message>
        <location filename="../app/desktop/runs/extractor_job.cpp" line="15"/>
        <source>Choose at least one run.</source>
        <translation>Wählen Sie mindestens einen Lauf.</translation>
    </message>
</context>
<context>
    <name>ExtractorParametersText</name>
    <message>
        <location filename="../core/extract/extractor_parameters.cpp" line="21"/>
        <source>parameter &quot;%1&quot; is not of the form KEY=VALUE.</source>
        <translation>Parameter „%1“ hat nicht die Form SCHLÜSSEL=WERT.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_parameters.cpp" line="27"/>
        <source>parameter &quot;%1&quot; has no key before &apos;=&apos;.</source>
        <translation>Parameter „%1“ hat keinen Schlüssel vor „=“.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_parameters.cpp" line="44"/>
        <source>the %1 extractor has no parameter &quot;%2&quot;; its parameters are %3.</source>
        <translation>der Extraktor %1 hat keinen Parameter „%2“; seine Parameter sind %3.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_parameters.cpp" line="50"/>
        <source>parameter &quot;%1&quot; of the %2 extractor must be a %3, got a %4.</source>
        <translation>Parameter „%1“ des Extraktors %2 muss vom Typ %3 sein, erhalten: %4.</translation>
    </message>
</context>
<context>
    <name>ExtractorProtocolText</name>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="48"/>
        <source>missing field &quot;%1&quot;</source>
        <translation>Feld „%1“ fehlt</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="53"/>
        <source>field &quot;%1&quot; must be a whole number of code points of at least 0, got %2</source>
        <translation>Feld „%1“ muss eine ganze Zahl von Codepunkten ab 0 sein, erhalten: %2</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="91"/>
        <source>not valid JSON (%1)</source>
        <translation>kein gültiges JSON (%1)</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="94"/>
        <source>expected a JSON object, got an array</source>
        <translation>JSON-Objekt erwartet, aber ein Array erhalten</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="127"/>
        <source>unknown field &quot;%1&quot;; a span has the fields %2 (put further data inside &quot;attributes&quot;)</source>
        <translation>unbekanntes Feld „%1“; eine Textstelle hat die Felder %2 (weitere Daten gehören in „attributes“)</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="134"/>
        <source>missing field &quot;function&quot;</source>
        <translation>Feld „function“ fehlt</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="138"/>
        <source>field &quot;function&quot; must be problem, cause, evaluation or remedy, got %1</source>
        <translation>Feld „function“ muss problem, cause, evaluation oder remedy sein, erhalten: %1</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="152"/>
        <source>the span [%1, %2) is empty: &quot;end&quot; must be greater than &quot;start&quot;</source>
        <translation>die Textstelle [%1, %2) ist leer: „end“ muss größer als „start“ sein</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="158"/>
        <source>the span [%1, %2) ends past the end of the article, which has %3 code points</source>
        <translation>die Textstelle [%1, %2) reicht über das Ende des Artikels hinaus, der %3 Codepunkte hat</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="168"/>
        <source>field &quot;score&quot; must be a number or null, got %1</source>
        <translation>Feld „score“ muss eine Zahl oder null sein, erhalten: %1</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="175"/>
        <source>field &quot;attributes&quot; must be an object or null, got %1</source>
        <translation>Feld „attributes“ muss ein Objekt oder null sein, erhalten: %1</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="196"/>
        <source>unknown field &quot;%1&quot;; an answer has the fields &quot;id&quot; and &quot;spans&quot;</source>
        <translation>unbekanntes Feld „%1“; eine Antwort hat die Felder „id“ und „spans“</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="203"/>
        <source>missing field &quot;id&quot;</source>
        <translation>Feld „id“ fehlt</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="204"/>
        <source>field &quot;id&quot; must be a string, got %1</source>
        <translation>Feld „id“ muss eine Zeichenkette sein, erhalten: %1</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="209"/>
        <source>article &quot;%1&quot; was not sent to the extractor</source>
        <translation>Artikel „%1“ wurde dem Extraktor nicht geschickt</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="213"/>
        <source>article &quot;%1&quot; was already answered on line %2</source>
        <translation>Artikel „%1“ wurde bereits in Zeile %2 beantwortet</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="220"/>
        <source>missing field &quot;spans&quot;</source>
        <translation>Feld „spans“ fehlt</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="221"/>
        <source>field &quot;spans&quot; must be an array, got %1</source>
        <translation>Feld „spans“ muss ein Array sein, erhalten: %1</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="227"/>
        <source>span %1 of article &quot;%2&quot; must be an object, got %3</source>
        <translation>Textstelle %1 des Artikels „%2“ muss ein Objekt sein, erhalten: %3</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="232"/>
        <source>span %1 of article &quot;%2&quot;: %3</source>
        <translation>Textstelle %1 des Artikels „%2“: %3</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/extract/extractor_protocol.cpp" line="247"/>
        <source>%n article(s) got no answer: %1%2</source>
        <translation>
            <numerusform>%n Artikel hat keine Antwort erhalten: %1%2</numerusform>
            <numerusform>%n Artikel haben keine Antwort erhalten: %1%2</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="263"/>
        <source>the file holds no spans</source>
        <translation>die Datei enthält keine Textstellen</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="272"/>
        <source>missing field &quot;article&quot;</source>
        <translation>Feld „article“ fehlt</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="273"/>
        <source>field &quot;article&quot; must be a string, got %1</source>
        <translation>Feld „article“ muss eine Zeichenkette sein, erhalten: %1</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="278"/>
        <source>there is no article &quot;%1&quot; in the project</source>
        <translation>im Projekt gibt es keinen Artikel „%1“</translation>
    </message>
</context>
<context>
    <name>ExtractorRunTable</name>
    <message>
        <location filename="../core/store/extractor_run_table.cpp" line="90"/>
        <source>There is no extractor run #%1.</source>
        <translation>Es gibt keinen Extraktorlauf #%1.</translation>
    </message>
</context>
<context>
    <name>ExtractorRunsText</name>
    <message>
        <location filename="../core/extract/extractor_runs.cpp" line="36"/>
        <source>A run needs a name without leading or trailing spaces.</source>
        <translation>Ein Lauf braucht einen Namen ohne Leerzeichen am Anfang oder Ende.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_runs.cpp" line="39"/>
        <source>A run name may not hold control characters.</source>
        <translation>Ein Laufname darf keine Steuerzeichen enthalten.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_runs.cpp" line="45"/>
        <source>There is already a run called &quot;%1&quot;; choose another name or delete it first.</source>
        <translation>Es gibt bereits einen Lauf namens „%1“; wählen Sie einen anderen Namen oder löschen Sie ihn zuerst.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_runs.cpp" line="165"/>
        <source>A span of run &quot;%1&quot; names article #%2, which is not in the project.</source>
        <translation>Eine Textstelle des Laufs „%1“ nennt Artikel #%2, der nicht im Projekt ist.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_runs.cpp" line="172"/>
        <source>A span of run &quot;%1&quot;, [%2, %3), does not lie inside article %4 (%5 code points) or is empty.</source>
        <translation>Eine Textstelle des Laufs „%1“, [%2, %3), liegt nicht innerhalb von Artikel %4 (%5 Codepunkte) oder ist leer.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_runs.cpp" line="216"/>
        <source>There is no run called &quot;%1&quot;.</source>
        <translation>Es gibt keinen Lauf namens „%1“.</translation>
    </message>
</context>
<context>
    <name>FrameAnalysisEditsText</name>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="20"/>
        <source>A saved frame analysis is already called &quot;%1&quot;; choose another name.</source>
        <translation>Eine gespeicherte Frame-Analyse heißt bereits „%1“; wählen Sie einen anderen Namen.</translation>
    </message>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="48"/>
        <source>Save frames &quot;%1&quot;</source>
        <translation>Frames „%1“ speichern</translation>
    </message>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="55"/>
        <source>A saved frame analysis needs a name.</source>
        <translation>Eine gespeicherte Frame-Analyse braucht einen Namen.</translation>
    </message>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="58"/>
        <source>The frame analysis &quot;%1&quot; has no frames to save.</source>
        <translation>Die Frame-Analyse „%1“ hat keine Frames zum Speichern.</translation>
    </message>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="82"/>
        <source>Delete frames &quot;%1&quot;</source>
        <translation>Frames „%1“ löschen</translation>
    </message>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="92"/>
        <source>There is no saved frame analysis &quot;%1&quot;.</source>
        <translation>Es gibt keine gespeicherte Frame-Analyse „%1“.</translation>
    </message>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="111"/>
        <source>Name frame %1 &quot;%2&quot;</source>
        <translation>Frame %1 „%2“ nennen</translation>
    </message>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="121"/>
        <source>The saved frame analysis has no frame %1.</source>
        <translation>Die gespeicherte Frame-Analyse hat keinen Frame %1.</translation>
    </message>
</context>
<context>
    <name>FrameInputText</name>
    <message>
        <location filename="../core/scoring/frame_input.cpp" line="29"/>
        <source>layer %1</source>
        <translation>Ebene %1</translation>
    </message>
    <message>
        <location filename="../core/scoring/frame_input.cpp" line="39"/>
        <source>(unknown)</source>
        <translation>(unbekannt)</translation>
    </message>
</context>
<context>
    <name>FrameTableText</name>
    <message>
        <location filename="../core/store/frame_table.cpp" line="33"/>
        <source>There is no saved frame analysis %1.</source>
        <translation>Es gibt keine gespeicherte Frame-Analyse %1.</translation>
    </message>
    <message>
        <location filename="../core/store/frame_table.cpp" line="179"/>
        <source>The saved frame analysis %1 has no frame %2.</source>
        <translation>Die gespeicherte Frame-Analyse %1 hat keinen Frame %2.</translation>
    </message>
</context>
<context>
    <name>FramesJob</name>
    <message>
        <location filename="../app/desktop/frames/frames_job.cpp" line="18"/>
        <source>The computation was cancelled.</source>
        <translation>Die Berechnung wurde abgebrochen.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frames/frames_job.cpp" line="35"/>
        <source>The layer %1 holds %n article(s); frames need at least 3.</source>
        <translation>
            <numerusform>Die Ebene %1 enthält %n Artikel; Frames brauchen mindestens 3.</numerusform>
            <numerusform>Die Ebene %1 enthält %n Artikel; Frames brauchen mindestens 3.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_job.cpp" line="57"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
</context>
<context>
    <name>FunctionStyle</name>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="30"/>
        <source>Problem</source>
        <translation>Problem</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="32"/>
        <source>Cause</source>
        <translation>Ursache</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="34"/>
        <source>Evaluation</source>
        <translation>Bewertung</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="36"/>
        <source>Remedy</source>
        <translation>Lösung</translation>
    </message>
</context>
<context>
    <name>GoldAnswerEditsText</name>
    <message>
        <location filename="../core/project/gold_answer_edits.cpp" line="36"/>
        <source>Decide gold answer &quot;%1&quot;</source>
        <translation>Goldstandard-Antwort „%1“ entscheiden</translation>
    </message>
    <message>
        <location filename="../core/project/gold_answer_edits.cpp" line="56"/>
        <source>The gold answer could not be stored: there is no article #%1 in the project.</source>
        <translation>Die Goldstandard-Antwort konnte nicht gespeichert werden: Das Projekt hat keinen Artikel #%1.</translation>
    </message>
    <message>
        <location filename="../core/project/gold_answer_edits.cpp" line="82"/>
        <source>Withdraw gold answer &quot;%1&quot;</source>
        <translation>Goldstandard-Antwort „%1“ zurückziehen</translation>
    </message>
    <message>
        <location filename="../core/project/gold_answer_edits.cpp" line="93"/>
        <source>This gold answer has already been withdrawn.</source>
        <translation>Diese Goldstandard-Antwort wurde bereits zurückgezogen.</translation>
    </message>
</context>
<context>
    <name>GoldEditsText</name>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="32"/>
        <source>Only a lead can decide the gold standard.</source>
        <translation>Nur die Leitung kann den Goldstandard entscheiden.</translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="53"/>
        <source>Decide gold %1 span</source>
        <translation>Goldstandard-%1-Textstelle entscheiden</translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="65"/>
        <source>A gold span can only come from live spans of the same article.</source>
        <translation>Eine Goldstandard-Textstelle kann nur aus aktiven Textstellen desselben Artikels entstehen.</translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="91"/>
        <source>Withdraw gold span</source>
        <translation>Goldstandard-Textstelle zurückziehen</translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="102"/>
        <source>This gold span has already been withdrawn.</source>
        <translation>Diese Goldstandard-Textstelle wurde bereits zurückgezogen.</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/project/gold_edits.cpp" line="130"/>
        <source>Reject %n span(s)</source>
        <translation>
            <numerusform>%n Textstelle ablehnen</numerusform>
            <numerusform>%n Textstellen ablehnen</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="143"/>
        <source>Choose at least one span to reject.</source>
        <translation>Wählen Sie mindestens eine Textstelle zum Ablehnen.</translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="154"/>
        <source>Only a live span can be rejected.</source>
        <translation>Nur eine aktive Textstelle kann abgelehnt werden.</translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="160"/>
        <source>A span is already rejected: %1</source>
        <translation>Eine Textstelle ist bereits abgelehnt: %1</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/project/gold_edits.cpp" line="187"/>
        <source>Accept %n agreed span(s) into gold</source>
        <translation>
            <numerusform>%n übereinstimmende Textstelle in den Goldstandard übernehmen</numerusform>
            <numerusform>%n übereinstimmende Textstellen in den Goldstandard übernehmen</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="198"/>
        <source>There are no spans to accept.</source>
        <translation>Es gibt keine Textstellen zum Übernehmen.</translation>
    </message>
</context>
<context>
    <name>GoldJudgementTableText</name>
    <message>
        <location filename="../core/store/gold_judgement_table.cpp" line="37"/>
        <source>There is no gold answer #%1 in the project.</source>
        <translation>Das Projekt hat keine Goldstandard-Antwort #%1.</translation>
    </message>
</context>
<context>
    <name>GoldTable</name>
    <message>
        <location filename="../core/store/gold_table.cpp" line="52"/>
        <location filename="../core/store/gold_table.cpp" line="128"/>
        <source>There is no gold span #%1 in the project.</source>
        <translation>Im Projekt gibt es keine Goldstandard-Textstelle #%1.</translation>
    </message>
    <message>
        <location filename="../core/store/gold_table.cpp" line="202"/>
        <source>There is no rejection #%1 in the project.</source>
        <translation>Im Projekt gibt es keine Ablehnung #%1.</translation>
    </message>
</context>
<context>
    <name>ImportDialog</name>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="24"/>
        <source>Importing articles…</source>
        <translation>Artikel werden importiert…</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="25"/>
        <source>Cancel</source>
        <translation>Abbrechen</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="30"/>
        <source>Importing %1 (%2 of %3)…</source>
        <translation>%1 wird importiert (%2 von %3)…</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="51"/>
        <source>%1: not imported — %2</source>
        <translation>%1: nicht importiert — %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="46"/>
        <source>%1: cancelled; nothing from this file was added.</source>
        <translation>%1: abgebrochen; aus dieser Datei wurde nichts hinzugefügt.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/import_dialog.cpp" line="56"/>
        <source>%1: %n article(s) added</source>
        <translation>
            <numerusform>%1: %n Artikel hinzugefügt</numerusform>
            <numerusform>%1: %n Artikel hinzugefügt</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="60"/>
        <source>    line %1 (%2): skipped, %3</source>
        <translation>    Zeile %1 (%2): übersprungen, %3</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="65"/>
        <source>    line %1 (%2): added, a near copy of &quot;%3&quot; (similarity %4)</source>
        <translation>    Zeile %1 (%2): hinzugefügt, eine Beinahe-Kopie von „%3“ (Ähnlichkeit %4)</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="73"/>
        <source>    %1: %2</source>
        <translation>    %1: %2</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/import_dialog.cpp" line="75"/>
        <source>    %1: %n article(s) added</source>
        <translation>
            <numerusform>    %1: %n Artikel hinzugefügt</numerusform>
            <numerusform>    %1: %n Artikel hinzugefügt</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="87"/>
        <location filename="../app/desktop/import_dialog.cpp" line="93"/>
        <source>Import report</source>
        <translation>Importbericht</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/import_dialog.cpp" line="89"/>
        <source>%n article(s) added.</source>
        <translation>
            <numerusform>%n Artikel hinzugefügt.</numerusform>
            <numerusform>%n Artikel hinzugefügt.</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>InputFileText</name>
    <message>
        <location filename="../core/io/input_file.cpp" line="27"/>
        <source>this is not a regular file</source>
        <translation>dies ist keine reguläre Datei</translation>
    </message>
    <message>
        <location filename="../core/io/input_file.cpp" line="37"/>
        <source>the file cannot be opened for reading</source>
        <translation>die Datei kann nicht zum Lesen geöffnet werden</translation>
    </message>
    <message>
        <location filename="../core/io/input_file.cpp" line="43"/>
        <source>the file is longer than %1 MiB, the most this reader takes</source>
        <translation>die Datei ist länger als %1 MiB, das Höchstmaß dieses Lesers</translation>
    </message>
    <message>
        <location filename="../core/io/input_file.cpp" line="61"/>
        <source>the file cannot be read</source>
        <translation>die Datei kann nicht gelesen werden</translation>
    </message>
</context>
<context>
    <name>Iob2FormatText</name>
    <message>
        <location filename="../core/exchange/iob2_format.cpp" line="172"/>
        <source>A token row comes before any &quot;# article = ...&quot; line.</source>
        <translation>Eine Token-Zeile steht vor jeder Zeile „# article = ...“.</translation>
    </message>
    <message>
        <location filename="../core/exchange/iob2_format.cpp" line="176"/>
        <source>A token row needs 7 tab-separated fields (token, start, end and one tag per function); this one has %1.</source>
        <translation>Eine Token-Zeile braucht 7 durch Tabulatoren getrennte Felder (Token, Anfang, Ende und ein Tag je Funktion); diese hat %1.</translation>
    </message>
    <message>
        <location filename="../core/exchange/iob2_format.cpp" line="184"/>
        <source>The token&apos;s start and end must be whole numbers with start &lt; end.</source>
        <translation>Anfang und Ende des Tokens müssen ganze Zahlen mit Anfang &lt; Ende sein.</translation>
    </message>
    <message>
        <location filename="../core/exchange/iob2_format.cpp" line="200"/>
        <source>&quot;%1&quot; continues no chunk: in IOB2 a chunk starts with B-.</source>
        <translation>„%1“ setzt keinen Chunk fort: in IOB2 beginnt ein Chunk mit B-.</translation>
    </message>
    <message>
        <location filename="../core/exchange/iob2_format.cpp" line="206"/>
        <source>The tag &quot;%1&quot; is not O, B-%2 or I-%2.</source>
        <translation>Das Tag „%1“ ist nicht O, B-%2 oder I-%2.</translation>
    </message>
</context>
<context>
    <name>JsonItemStreamText</name>
    <message>
        <location filename="../core/io/json_item_stream.cpp" line="140"/>
        <location filename="../core/io/json_item_stream.cpp" line="204"/>
        <source>The file %1 could not be read: %2.</source>
        <translation>Die Datei %1 konnte nicht gelesen werden: %2.</translation>
    </message>
    <message>
        <location filename="../core/io/json_item_stream.cpp" line="218"/>
        <source>This is not valid JSON: the file ends before the JSON is complete.</source>
        <translation>Das ist kein gültiges JSON: Die Datei endet, bevor das JSON vollständig ist.</translation>
    </message>
    <message>
        <location filename="../core/io/json_item_stream.cpp" line="221"/>
        <source>This is not valid JSON at &quot;%1&quot;.</source>
        <translation>Das ist kein gültiges JSON bei „%1“.</translation>
    </message>
    <message>
        <location filename="../core/io/json_item_stream.cpp" line="223"/>
        <source>This is not valid JSON.</source>
        <translation>Das ist kein gültiges JSON.</translation>
    </message>
</context>
<context>
    <name>JsonTypeNameText</name>
    <message>
        <location filename="../core/io/json_type_name.cpp" line="22"/>
        <source>null</source>
        <comment>a JSON value&apos;s type</comment>
        <translation>null</translation>
    </message>
    <message>
        <location filename="../core/io/json_type_name.cpp" line="24"/>
        <source>boolean</source>
        <comment>a JSON value&apos;s type</comment>
        <translation>Wahrheitswert</translation>
    </message>
    <message>
        <location filename="../core/io/json_type_name.cpp" line="26"/>
        <source>number</source>
        <comment>a JSON value&apos;s type</comment>
        <translation>Zahl</translation>
    </message>
    <message>
        <location filename="../core/io/json_type_name.cpp" line="28"/>
        <source>string</source>
        <comment>a JSON value&apos;s type</comment>
        <translation>Zeichenkette</translation>
    </message>
    <message>
        <location filename="../core/io/json_type_name.cpp" line="30"/>
        <source>array</source>
        <comment>a JSON value&apos;s type</comment>
        <translation>Array</translation>
    </message>
    <message>
        <location filename="../core/io/json_type_name.cpp" line="32"/>
        <source>object</source>
        <comment>a JSON value&apos;s type</comment>
        <translation>Objekt</translation>
    </message>
    <message>
        <location filename="../core/io/json_type_name.cpp" line="36"/>
        <source>undefined</source>
        <comment>a JSON value&apos;s type</comment>
        <translation>undefiniert</translation>
    </message>
</context>
<context>
    <name>LayerExportText</name>
    <message>
        <location filename="../core/exchange/layer_export.cpp" line="167"/>
        <source>The file %1 could not be written: %2.</source>
        <translation>Die Datei %1 konnte nicht geschrieben werden: %2.</translation>
    </message>
    <message>
        <location filename="../core/exchange/layer_export.cpp" line="221"/>
        <source>Fourfold %1 spans, split %2</source>
        <translation>Fourfold-%1-Textstellen, Aufteilung %2</translation>
    </message>
    <message>
        <location filename="../core/exchange/layer_export.cpp" line="253"/>
        <source>The layer &quot;%1&quot; covers no article, so there is nothing to export.</source>
        <translation>Die Ebene „%1“ deckt keinen Artikel ab, es gibt also nichts zu exportieren.</translation>
    </message>
    <message>
        <location filename="../core/exchange/layer_export.cpp" line="414"/>
        <source>The text of article &quot;%1&quot; does not match its stored SHA-256 (the project file is damaged); nothing was exported.</source>
        <translation>Der Text des Artikels „%1“ passt nicht zu seinem gespeicherten SHA-256 (die Projektdatei ist beschädigt); nichts wurde exportiert.</translation>
    </message>
</context>
<context>
    <name>NearCopyCheck</name>
    <message>
        <location filename="../core/project/near_copy_check.cpp" line="24"/>
        <source>The near-copy threshold %1 does not lie in (0, 1]: it is the least Jaccard similarity of two articles&apos; word shingles that makes one a near copy of the other.</source>
        <translation>Die Schwelle für Beinahe-Kopien %1 liegt nicht in (0, 1]: sie ist die kleinste Jaccard-Ähnlichkeit der Wort-Shingles zweier Artikel, ab der einer als Beinahe-Kopie des anderen gilt.</translation>
    </message>
</context>
<context>
    <name>NumericMatrixReaderText</name>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="45"/>
        <source>column %1 of the header has no variable name.</source>
        <translation>Spalte %1 der Kopfzeile hat keinen Variablennamen.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="49"/>
        <source>the variable &quot;%1&quot; appears twice in the header.</source>
        <translation>die Variable „%1“ kommt in der Kopfzeile zweimal vor.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="56"/>
        <source>the header names no variable; expected &quot;article,&lt;variable&gt;,...&quot;.</source>
        <translation>die Kopfzeile nennt keine Variable; erwartet: „article,&lt;Variable&gt;,...“.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="62"/>
        <source>this row has %1 fields but the header has %2.</source>
        <translation>diese Zeile hat %1 Felder, die Kopfzeile aber %2.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="68"/>
        <source>the article id is empty.</source>
        <translation>die Artikel-ID ist leer.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="71"/>
        <source>the article &quot;%1&quot; appears twice (first on line %2).</source>
        <translation>der Artikel „%1“ kommt zweimal vor (zuerst in Zeile %2).</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="82"/>
        <source>column %1 (&quot;%2&quot;) is empty; every cell needs a number.</source>
        <translation>Spalte %1 („%2“) ist leer; jede Zelle braucht eine Zahl.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="86"/>
        <source>column %1 (&quot;%2&quot;) holds &quot;%3&quot;, which is not a number.</source>
        <translation>Spalte %1 („%2“) enthält „%3“, das keine Zahl ist.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="97"/>
        <source>the file is empty; expected a header row &quot;article,&lt;variable&gt;,...&quot;.</source>
        <translation>die Datei ist leer; erwartet wird eine Kopfzeile „article,&lt;Variable&gt;,...“.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="101"/>
        <source>the file has a header but no articles.</source>
        <translation>die Datei hat eine Kopfzeile, aber keine Artikel.</translation>
    </message>
</context>
<context>
    <name>ParagraphRoleEdit</name>
    <message>
        <location filename="../core/project/paragraph_role_edit.cpp" line="19"/>
        <source>Mark paragraph %1 as %2</source>
        <translation>Absatz %1 als %2 markieren</translation>
    </message>
    <message>
        <location filename="../core/project/paragraph_role_edit.cpp" line="31"/>
        <source>Article &quot;%1&quot; has no paragraph %2.</source>
        <translation>Artikel „%1“ hat keinen Absatz %2.</translation>
    </message>
    <message>
        <location filename="../core/project/paragraph_role_edit.cpp" line="45"/>
        <source>An edit that was never applied cannot be undone.</source>
        <translation>Eine Änderung, die nie ausgeführt wurde, kann nicht rückgängig gemacht werden.</translation>
    </message>
</context>
<context>
    <name>Passphrase</name>
    <message>
        <location filename="../core/project/passphrase.cpp" line="36"/>
        <source>A lead&apos;s passphrase needs at least %1 characters.</source>
        <translation>Die Passphrase einer Leitung braucht mindestens %1 Zeichen.</translation>
    </message>
    <message>
        <location filename="../core/project/passphrase.cpp" line="46"/>
        <source>The passphrase library could not start.</source>
        <translation>Die Passphrase-Bibliothek konnte nicht starten.</translation>
    </message>
    <message>
        <location filename="../core/project/passphrase.cpp" line="54"/>
        <source>There was not enough memory to protect the passphrase.</source>
        <translation>Es gab nicht genug Speicher, um die Passphrase zu schützen.</translation>
    </message>
</context>
<context>
    <name>People</name>
    <message>
        <location filename="../core/project/people.cpp" line="32"/>
        <source>There is nobody with the pseudonym &quot;%1&quot;.</source>
        <translation>Niemand hat das Pseudonym „%1“.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="46"/>
        <source>This is a coder copy: it holds its coder only, and nobody leads in it. Add and change people in the main project.</source>
        <translation>Dies ist eine Kopie für Codierende: sie enthält nur ihre codierende Person, und niemand leitet darin. Fügen Sie Personen im Hauptprojekt hinzu und ändern Sie sie dort.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="64"/>
        <source>Only a lead can add or change people; choose a lead first.</source>
        <translation>Nur die Leitung kann Personen hinzufügen oder ändern; wählen Sie zuerst eine Leitung.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="70"/>
        <source>Only a lead can add or change people; %1 is not an enabled lead of this project.</source>
        <translation>Nur die Leitung kann Personen hinzufügen oder ändern; %1 ist keine aktive Leitung dieses Projekts.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="114"/>
        <source>%1 is disabled and cannot be chosen; a lead can enable them again.</source>
        <translation>%1 ist deaktiviert und kann nicht gewählt werden; eine Leitung kann die Person wieder aktivieren.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="141"/>
        <source>That is not the passphrase of %1.</source>
        <translation>Das ist nicht die Passphrase von %1.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="184"/>
        <source>A person needs a name and a pseudonym.</source>
        <translation>Eine Person braucht einen Namen und ein Pseudonym.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="187"/>
        <source>The pseudonym &quot;%1&quot; is already taken.</source>
        <translation>Das Pseudonym „%1“ ist bereits vergeben.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="213"/>
        <source>A person needs a name.</source>
        <translation>Eine Person braucht einen Namen.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="229"/>
        <source>%1 is already disabled.</source>
        <translation>%1 ist bereits deaktiviert.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="231"/>
        <source>%1 is already enabled.</source>
        <translation>%1 ist bereits aktiviert.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="238"/>
        <source>%1 is the project&apos;s only enabled lead; add or enable another lead first.</source>
        <translation>%1 ist die einzige aktive Leitung des Projekts; fügen Sie zuerst eine andere Leitung hinzu oder aktivieren Sie eine.</translation>
    </message>
</context>
<context>
    <name>PersonEdits</name>
    <message>
        <location filename="../core/project/person_edits.cpp" line="17"/>
        <source>Add %1</source>
        <translation>%1 hinzufügen</translation>
    </message>
    <message>
        <location filename="../core/project/person_edits.cpp" line="42"/>
        <source>Rename %1</source>
        <translation>%1 umbenennen</translation>
    </message>
    <message>
        <location filename="../core/project/person_edits.cpp" line="64"/>
        <source>Disable %1</source>
        <translation>%1 deaktivieren</translation>
    </message>
    <message>
        <location filename="../core/project/person_edits.cpp" line="65"/>
        <source>Enable %1</source>
        <translation>%1 aktivieren</translation>
    </message>
    <message>
        <location filename="../core/project/person_edits.cpp" line="87"/>
        <source>Set the passphrase of %1</source>
        <translation>Passphrase von %1 festlegen</translation>
    </message>
</context>
<context>
    <name>PositionBaselineText</name>
    <message>
        <location filename="../core/extract/position_baseline.cpp" line="44"/>
        <source>parameter &quot;%1&quot; of the position extractor must be problem, cause, evaluation, remedy or none, got &quot;%2&quot;.</source>
        <translation>Parameter „%1“ des Positions-Extraktors muss problem, cause, evaluation, remedy oder none sein, erhalten: „%2“.</translation>
    </message>
    <message>
        <location filename="../core/extract/position_baseline.cpp" line="54"/>
        <source>parameter &quot;unit&quot; of the position extractor must be paragraph or sentence, got &quot;%1&quot;.</source>
        <translation>Parameter „unit“ des Positions-Extraktors muss paragraph oder sentence sein, erhalten: „%1“.</translation>
    </message>
</context>
<context>
    <name>ProgressText</name>
    <message>
        <location filename="../app/cli/terminal_progress.cpp" line="46"/>
        <source>%1: %2% (%3 of %4 MB)</source>
        <translation>%1: %2 % (%3 von %4 MB)</translation>
    </message>
    <message>
        <location filename="../app/cli/terminal_progress.cpp" line="50"/>
        <source>%1: %2 MB</source>
        <translation>%1: %2 MB</translation>
    </message>
</context>
<context>
    <name>Project</name>
    <message>
        <location filename="../core/project/project_open.cpp" line="19"/>
        <source>There is no project file %1.</source>
        <translation>Es gibt keine Projektdatei %1.</translation>
    </message>
</context>
<context>
    <name>ProjectCheckText</name>
    <message>
        <location filename="../core/project/project_check.cpp" line="49"/>
        <source>Article &quot;%1&quot;: its text does not match its stored SHA-256.</source>
        <translation>Artikel „%1“: sein Text passt nicht zu seinem gespeicherten SHA-256.</translation>
    </message>
    <message>
        <location filename="../core/project/project_check.cpp" line="53"/>
        <source>Article &quot;%1&quot;: stored length %2 but the text has %3 characters.</source>
        <translation>Artikel „%1“: gespeicherte Länge %2, aber der Text hat %3 Zeichen.</translation>
    </message>
    <message>
        <location filename="../core/project/project_check.cpp" line="59"/>
        <source>Article &quot;%1&quot;: the text is not in canonical form (NFC, LF line ends).</source>
        <translation>Artikel „%1“: der Text ist nicht in kanonischer Form (NFC, LF-Zeilenenden).</translation>
    </message>
    <message>
        <location filename="../core/project/project_check.cpp" line="72"/>
        <source>%1 #%2 refers to a missing article #%3.</source>
        <translation>%1 #%2 verweist auf einen fehlenden Artikel #%3.</translation>
    </message>
    <message>
        <location filename="../core/project/project_check.cpp" line="79"/>
        <source>%1 #%2 in article &quot;%3&quot;: [%4, %5) lies outside the text of %6 characters.</source>
        <translation>%1 #%2 in Artikel „%3“: [%4, %5) liegt außerhalb des Texts von %6 Zeichen.</translation>
    </message>
    <message>
        <location filename="../core/project/project_check.cpp" line="90"/>
        <source>%1 #%2 in article &quot;%3&quot;: the stored quote differs from the text at [%4, %5).</source>
        <translation>%1 #%2 in Artikel „%3“: das gespeicherte Zitat weicht vom Text bei [%4, %5) ab.</translation>
    </message>
</context>
<context>
    <name>ProjectImportText</name>
    <message>
        <location filename="../core/project/project_import.cpp" line="42"/>
        <source>the article &quot;%1&quot; has no text.</source>
        <translation>der Artikel „%1“ hat keinen Text.</translation>
    </message>
    <message>
        <location filename="../core/project/project_import.cpp" line="57"/>
        <source>the article &quot;%1&quot; cannot be segmented: %2</source>
        <translation>der Artikel „%1“ kann nicht segmentiert werden: %2</translation>
    </message>
    <message>
        <location filename="../core/project/project_import.cpp" line="121"/>
        <source>same text as the article &quot;%1&quot; already in the project</source>
        <translation>gleicher Text wie der Artikel „%1“, der bereits im Projekt ist</translation>
    </message>
    <message>
        <location filename="../core/project/project_import.cpp" line="130"/>
        <source>the id &quot;%1&quot; is already used by another article in the project, with a different text.</source>
        <translation>die ID „%1“ wird im Projekt bereits von einem anderen Artikel mit anderem Text verwendet.</translation>
    </message>
    <message>
        <location filename="../core/project/project_import.cpp" line="148"/>
        <source>The import of %1 was cancelled; nothing was added.</source>
        <translation>Der Import von %1 wurde abgebrochen; nichts wurde hinzugefügt.</translation>
    </message>
    <message>
        <location filename="../core/project/project_import.cpp" line="194"/>
        <source>passed over: not a format Fourfold reads</source>
        <translation>übergangen: kein Format, das Fourfold liest</translation>
    </message>
    <message>
        <location filename="../core/project/project_import.cpp" line="205"/>
        <source>The folder %1 holds no files.</source>
        <translation>Der Ordner %1 enthält keine Dateien.</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/project/project_import.cpp" line="210"/>
        <source>%1: %n article(s)</source>
        <translation>
            <numerusform>%1: %n Artikel</numerusform>
            <numerusform>%1: %n Artikel</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../core/project/project_import.cpp" line="215"/>
        <source>The folder %1 was not imported: %n of its files could not be read, so nothing was added.</source>
        <translation>
            <numerusform>Der Ordner %1 wurde nicht importiert: %n seiner Dateien konnte nicht gelesen werden, daher wurde nichts hinzugefügt.</numerusform>
            <numerusform>Der Ordner %1 wurde nicht importiert: %n seiner Dateien konnten nicht gelesen werden, daher wurde nichts hinzugefügt.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/project/project_import.cpp" line="178"/>
        <source>passed over: a Fourfold project file</source>
        <translation>übergangen: eine Fourfold-Projektdatei</translation>
    </message>
</context>
<context>
    <name>ProjectTables</name>
    <message>
        <location filename="../core/store/project_tables.cpp" line="62"/>
        <source>The article is already assigned to this coder in this phase, or one of them does not exist.</source>
        <translation>Der Artikel ist dieser codierenden Person in dieser Phase bereits zugewiesen, oder einer von beiden existiert nicht.</translation>
    </message>
    <message>
        <location filename="../core/store/project_tables.cpp" line="320"/>
        <source>The project file %1 is damaged, so nothing was added to it; `fourfold-cli check` lists the damage. Restore it from a backup.</source>
        <translation>Die Projektdatei %1 ist beschädigt, daher wurde ihr nichts hinzugefügt; `fourfold-cli check` listet die Schäden auf. Stellen Sie sie aus einer Sicherung wieder her.</translation>
    </message>
    <message>
        <location filename="../core/store/project_tables.cpp" line="352"/>
        <source>foreign_key_check: row %1 of %2 refers to a missing row of %3</source>
        <translation>foreign_key_check: Zeile %1 von %2 verweist auf eine fehlende Zeile von %3</translation>
    </message>
    <message>
        <location filename="../core/store/project_tables.cpp" line="119"/>
        <source>The assignment is not in the project.</source>
        <translation>Die Zuweisung ist nicht im Projekt.</translation>
    </message>
</context>
<context>
    <name>ProjectText</name>
    <message>
        <location filename="../core/project/project.cpp" line="41"/>
        <source>The default codebook is missing from this build.</source>
        <translation>Das Standard-Codebuch fehlt in diesem Build.</translation>
    </message>
    <message>
        <location filename="../core/project/project.cpp" line="70"/>
        <source>%1 already exists; choose another name or open it.</source>
        <translation>%1 existiert bereits; wählen Sie einen anderen Namen oder öffnen Sie es.</translation>
    </message>
    <message>
        <location filename="../core/project/project.cpp" line="89"/>
        <source>Default codebook</source>
        <translation>Standard-Codebuch</translation>
    </message>
    <message>
        <location filename="../core/project/project.cpp" line="113"/>
        <source>There is no project file %1.</source>
        <translation>Es gibt keine Projektdatei %1.</translation>
    </message>
    <message>
        <location filename="../core/project/project.cpp" line="191"/>
        <source>A coder needs a name and a pseudonym.</source>
        <translation>Eine codierende Person braucht einen Namen und ein Pseudonym.</translation>
    </message>
    <message>
        <location filename="../core/project/project.cpp" line="196"/>
        <source>%1 was not added: a lead is added with a passphrase (Lead → People or fourfold-cli people --add).</source>
        <translation>%1 wurde nicht hinzugefügt: Eine Leitung wird mit einer Passphrase hinzugefügt (Leitung → Personen oder fourfold-cli people --add).</translation>
    </message>
    <message>
        <location filename="../core/project/project.cpp" line="246"/>
        <source>%1 is disabled and takes no new assignments; enable them first.</source>
        <translation>%1 ist deaktiviert und erhält keine neuen Zuweisungen; aktivieren Sie die Person zuerst.</translation>
    </message>
    <message>
        <location filename="../core/project/project.cpp" line="375"/>
        <source>An edit without its own savepoint needs a batch.</source>
        <translation>Eine Änderung ohne eigenen Sicherungspunkt braucht einen Stapel.</translation>
    </message>
</context>
<context>
    <name>ProjectUnitsText</name>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="54"/>
        <source>There is no article &quot;%1&quot; in the project.</source>
        <translation>Im Projekt gibt es keinen Artikel „%1“.</translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="68"/>
        <source>There is no coder &quot;%1&quot; in the project.</source>
        <translation>Im Projekt gibt es keine codierende Person „%1“.</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/agreement/project_units.cpp" line="92"/>
        <location filename="../core/agreement/project_units.cpp" line="433"/>
        <source>Reliability needs at least two coders; the selection has %n.</source>
        <translation>
            <numerusform>Reliabilität braucht mindestens zwei Codierende; die Auswahl hat %n.</numerusform>
            <numerusform>Reliabilität braucht mindestens zwei Codierende; die Auswahl hat %n.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="168"/>
        <source>%1: 1 article in progress left out</source>
        <translation>%1: 1 begonnener Artikel ausgelassen</translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="169"/>
        <source>%1: %2 articles in progress left out</source>
        <translation>%1: %2 begonnene Artikel ausgelassen</translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="319"/>
        <source>Continuum units are compared with unitizing alpha, not as a table.</source>
        <translation>Kontinuum-Einheiten werden mit Unitizing-Alpha verglichen, nicht als Tabelle.</translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="323"/>
        <source>Span units compare an attribute: name one function and one of its attributes.</source>
        <translation>Textstellen-Einheiten vergleichen ein Merkmal: nennen Sie eine Funktion und eines ihrer Merkmale.</translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="410"/>
        <source>None of the selected coders has marked any of the selected articles done.</source>
        <translation>Keine der gewählten codierenden Personen hat einen der gewählten Artikel als erledigt markiert.</translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="486"/>
        <source>No article was marked done by all of the selected coders, so there is no common continuum.</source>
        <translation>Kein Artikel wurde von allen gewählten Codierenden als erledigt markiert, es gibt also kein gemeinsames Kontinuum.</translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="505"/>
        <source>the codebook has no attribute &quot;%1&quot; for %2.</source>
        <translation>das Codebuch hat kein Merkmal „%1“ für %2.</translation>
    </message>
</context>
<context>
    <name>RangeBlob</name>
    <message>
        <location filename="../core/store/range_blob.cpp" line="24"/>
        <source>A stored list of text ranges is damaged (%1 bytes).</source>
        <translation>Eine gespeicherte Liste von Textbereichen ist beschädigt (%1 Bytes).</translation>
    </message>
</context>
<context>
    <name>ReliabilityJob</name>
    <message>
        <location filename="../app/desktop/reliability/reliability_job.cpp" line="39"/>
        <source>The computation was cancelled.</source>
        <translation>Die Berechnung wurde abgebrochen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_job.cpp" line="49"/>
        <source>Choose at least one framing function.</source>
        <translation>Wählen Sie mindestens eine Framing-Funktion.</translation>
    </message>
</context>
<context>
    <name>ReliabilityTableReaderText</name>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="118"/>
        <source>the first column of the header must be &quot;unit&quot;, found &quot;%1&quot;.</source>
        <translation>die erste Spalte der Kopfzeile muss „unit“ sein, gefunden: „%1“.</translation>
    </message>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="125"/>
        <source>column %1 of the header has no coder name.</source>
        <translation>Spalte %1 der Kopfzeile hat keinen Namen einer codierenden Person.</translation>
    </message>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="129"/>
        <source>the coder &quot;%1&quot; appears twice in the header.</source>
        <translation>die codierende Person „%1“ kommt in der Kopfzeile zweimal vor.</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/io/reliability_table_reader.cpp" line="136"/>
        <source>reliability needs at least two coders; the header names %n.</source>
        <translation>
            <numerusform>Reliabilität braucht mindestens zwei Codierende; die Kopfzeile nennt %n.</numerusform>
            <numerusform>Reliabilität braucht mindestens zwei Codierende; die Kopfzeile nennt %n.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="144"/>
        <source>this row has %1 fields but the header has %2.</source>
        <translation>diese Zeile hat %1 Felder, die Kopfzeile aber %2.</translation>
    </message>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="150"/>
        <source>the unit id is empty.</source>
        <translation>die Einheiten-ID ist leer.</translation>
    </message>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="159"/>
        <source>the unit &quot;%1&quot; appears twice (first on line %2).</source>
        <translation>die Einheit „%1“ kommt zweimal vor (zuerst in Zeile %2).</translation>
    </message>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="167"/>
        <source>the file is empty; expected a header row &quot;unit,&lt;coder&gt;,&lt;coder&gt;,...&quot;.</source>
        <translation>die Datei ist leer; erwartet wird eine Kopfzeile „unit,&lt;Codierende&gt;,&lt;Codierende&gt;,...“.</translation>
    </message>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="171"/>
        <source>the file has a header but no units.</source>
        <translation>die Datei hat eine Kopfzeile, aber keine Einheiten.</translation>
    </message>
</context>
<context>
    <name>ReportChartsText</name>
    <message>
        <location filename="../app/report/report_charts.cpp" line="144"/>
        <source>undef.</source>
        <translation>n. def.</translation>
    </message>
    <message>
        <location filename="../app/report/report_charts.cpp" line="157"/>
        <source>95% CI, pairs resampled</source>
        <translation>95%-KI, Paare neu gezogen</translation>
    </message>
    <message>
        <location filename="../app/report/report_charts.cpp" line="165"/>
        <source>95% CI, units resampled</source>
        <translation>95%-KI, Einheiten neu gezogen</translation>
    </message>
    <message>
        <location filename="../app/report/report_charts.cpp" line="202"/>
        <source>undefined</source>
        <translation>nicht definiert</translation>
    </message>
    <message>
        <location filename="../app/report/report_charts.cpp" line="219"/>
        <source>Cohen&apos;s kappa</source>
        <translation>Cohens Kappa</translation>
    </message>
</context>
<context>
    <name>ReportDataText</name>
    <message>
        <location filename="../app/report/report_data.cpp" line="66"/>
        <source>a sample stratified by %1</source>
        <translation>eine nach %1 geschichtete Stichprobe</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="67"/>
        <source>a simple random sample</source>
        <translation>eine einfache Zufallsstichprobe</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="68"/>
        <source>The %1 articles of the %2 phase were drawn as %3 (seed %4) from a frame of %5 articles not yet assigned to training, pilot or reliability coding, on %6.</source>
        <translation>Die %1 Artikel der Phase %2 wurden als %3 (Seed %4) aus einer Auswahlgesamtheit von %5 Artikeln gezogen, die noch keiner Schulungs-, Pilot- oder Reliabilitätscodierung zugewiesen waren, am %6.</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="201"/>
        <source>The report&apos;s unit must be paragraph, sentence or token.</source>
        <translation>Die Einheit des Berichts muss paragraph, sentence oder token sein.</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="206"/>
        <source>Reliability report</source>
        <translation>Reliabilitätsbericht</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="207"/>
        <source>Reliability report: %1</source>
        <translation>Reliabilitätsbericht: %1</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="249"/>
        <source>All four functions (MASI)</source>
        <translation>Alle vier Funktionen (MASI)</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="249"/>
        <source>All four (MASI)</source>
        <translation>Alle vier (MASI)</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="297"/>
        <source>Spans on the continuum</source>
        <translation>Textstellen auf dem Kontinuum</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="298"/>
        <source>continuum</source>
        <translation>Kontinuum</translation>
    </message>
</context>
<context>
    <name>ReportDocumentText</name>
    <message>
        <location filename="../app/report/report_document.cpp" line="139"/>
        <location filename="../app/report/report_frames_section.cpp" line="77"/>
        <location filename="../app/report/report_markup.cpp" line="51"/>
        <location filename="../app/report/report_markup.cpp" line="90"/>
        <source>undefined</source>
        <translation>nicht definiert</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="92"/>
        <source>reliable</source>
        <translation>reliabel</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="94"/>
        <source>tentative</source>
        <translation>vorläufig</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="98"/>
        <source>unreliable</source>
        <translation>nicht reliabel</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="135"/>
        <source>paragraph</source>
        <translation>Absatz</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="135"/>
        <source>paragraphs</source>
        <translation>Absätze</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="137"/>
        <source>token</source>
        <translation>Token</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="137"/>
        <source>tokens</source>
        <translation>Tokens</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="139"/>
        <source>sentence</source>
        <translation>Satz</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="139"/>
        <source>sentences</source>
        <translation>Sätze</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="40"/>
        <source>unit: %1</source>
        <translation>Einheit: %1</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="41"/>
        <source>phase: %1</source>
        <translation>Phase: %1</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="43"/>
        <source>all phases</source>
        <translation>alle Phasen</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="44"/>
        <source>bootstrap: %1 replicates, seed %2</source>
        <translation>Bootstrap: %1 Replikationen, Seed %2</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="48"/>
        <source>Inter-coder reliability</source>
        <translation>Intercoder-Reliabilität</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="51"/>
        <source>Project “%1” · written %2 by %3 · %4</source>
        <translation>Projekt „%1“ · geschrieben %2 von %3 · %4</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="20"/>
        <source>%1 coded %2 articles (%3 spans)</source>
        <translation>%1 codierte %2 Artikel (%3 Textstellen)</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="30"/>
        <source>Inter-coder reliability was assessed on a reliability sample of %1 articles that two or more coders coded independently (%2 of them by all %3 coders), out of %4 articles in the project. </source>
        <translation>Die Intercoder-Reliabilität wurde an einer Reliabilitätsstichprobe von %1 Artikeln bestimmt, die zwei oder mehr Codierende unabhängig voneinander codierten (%2 davon von allen %3 Codierenden), von %4 Artikeln im Projekt. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="42"/>
        <source>The sample was drawn %1. </source>
        <translation>Die Stichprobe wurde %1 gezogen. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="43"/>
        <source>state how the articles were drawn, e.g. a simple random sample of the study&apos;s articles, with its size and seed</source>
        <translation>geben Sie an, wie die Artikel gezogen wurden, z. B. als einfache Zufallsstichprobe aus den Artikeln der Studie, mit Umfang und Seed</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="47"/>
        <source>%1 coders (%2) took part: %3. </source>
        <translation>%1 Codierende (%2) nahmen teil: %3. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="51"/>
        <source>Articles that coders had started but not yet marked as finished were included. </source>
        <translation>Artikel, die Codierende begonnen, aber noch nicht als abgeschlossen markiert hatten, wurden einbezogen. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="54"/>
        <source>Only articles that a coder had marked as finished count for that coder. </source>
        <translation>Für jede codierende Person zählen nur Artikel, die sie als abgeschlossen markiert hatte. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="58"/>
        <source>%1 (%2)</source>
        <translation>%1 (%2)</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="62"/>
        <source>Articles still in progress were left out: %1. </source>
        <translation>Noch begonnene Artikel wurden ausgelassen: %1. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="66"/>
        <source>Before the reliability coding, coders trained on %1 articles and coded a pilot of %2 articles; %3. </source>
        <translation>Vor der Reliabilitätscodierung übten die Codierenden an %1 Artikeln und codierten einen Pretest von %2 Artikeln; %3. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="73"/>
        <source>hours of training</source>
        <translation>Stunden Schulung</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="75"/>
        <source>Coder training: %1. </source>
        <translation>Codiererschulung: %1. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="77"/>
        <source>describe the training and its approximate hours</source>
        <translation>beschreiben Sie die Schulung und ihren ungefähren Umfang in Stunden</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="86"/>
        <source>%1 α = %2</source>
        <translation>%1 α = %2</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="91"/>
        <source> (95% CI %1)</source>
        <translation> (95%-KI %1)</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="96"/>
        <source>Each of Entman&apos;s (1993) four framing functions was coded as a span of text; for reliability, each function became a binary variable (present or absent) per %1, a %2 carrying a function when a coder&apos;s span of that function overlaps it. </source>
        <translation>Jede der vier Framing-Funktionen nach Entman (1993) wurde als Textstelle codiert; für die Reliabilität wurde jede Funktion zu einer binären Variablen (vorhanden oder nicht vorhanden) je %1: eine Einheit (%2) trägt eine Funktion, wenn die Textstelle einer codierenden Person mit dieser Funktion sie überlappt. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="101"/>
        <source>We report Krippendorff&apos;s alpha (Krippendorff, 2004) because it handles any number of coders, missing data and any level of measurement (Hayes &amp; Krippendorff, 2007). </source>
        <translation>Wir berichten Krippendorffs Alpha (Krippendorff, 2004), weil es beliebig viele Codierende, fehlende Daten und jedes Skalenniveau zulässt (Hayes &amp; Krippendorff, 2007). </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="105"/>
        <source>Alpha was %1</source>
        <translation>Alpha betrug %1</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="107"/>
        <source>; for the set of functions per %1, compared with the MASI distance (Passonneau, 2006), α = %2</source>
        <translation>; für die Menge der Funktionen je %1, verglichen mit der MASI-Distanz (Passonneau, 2006), α = %2</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="115"/>
        <source>Intervals are 95% percentile bootstrap intervals from %1 resamples of the units; the table also gives the interval from resampled pairable values (Hayes &amp; Krippendorff, 2007), which is narrower than its nominal level when more than two coders are compared. </source>
        <translation>Die Intervalle sind 95%-Perzentil-Bootstrap-Intervalle aus %1 Neuziehungen der Einheiten; die Tabelle nennt auch das Intervall aus neu gezogenen paarbaren Werten (Hayes &amp; Krippendorff, 2007), das enger als sein nominales Niveau ist, wenn mehr als zwei Codierende verglichen werden. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="122"/>
        <source>Following Krippendorff (2004), variables with α&#xa0;≥&#xa0;0.800 are relied on and variables with 0.667&#xa0;≤&#xa0;α&#xa0;&lt;&#xa0;0.800 support tentative conclusions only. </source>
        <translation>Nach Krippendorff (2004) wird Variablen mit α&#xa0;≥&#xa0;0.800 vertraut, und Variablen mit 0.667&#xa0;≤&#xa0;α&#xa0;&lt;&#xa0;0.800 tragen nur vorläufige Schlüsse. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="133"/>
        <source>%1 (%2) α = %3</source>
        <translation>%1 (%2) α = %3</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="139"/>
        <source>For the other variables alpha was: %1.</source>
        <translation>Für die übrigen Variablen betrug Alpha: %1.</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="144"/>
        <source>Disagreements were resolved by adjudication into a separate gold standard: %1 spans on %2 articles, decided by %3, %4 of them with a written rationale. The independent codings were kept unchanged; every figure above comes from them. </source>
        <translation>Abweichungen wurden durch Entscheidung in einen getrennten Goldstandard aufgelöst: %1 Textstellen in %2 Artikeln, entschieden von %3, %4 davon mit schriftlicher Begründung. Die unabhängigen Codierungen blieben unverändert; alle obigen Werte stammen aus ihnen. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="180"/>
        <source>No adjudication is recorded in the project yet: %1. </source>
        <translation>Im Projekt ist noch keine Entscheidung verzeichnet: %1. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="181"/>
        <source>say how disagreements were resolved, e.g. by discussion or by the lead</source>
        <translation>geben Sie an, wie Abweichungen aufgelöst wurden, z. B. durch Diskussion oder durch die Leitung</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="185"/>
        <source>Coding followed version %1 of the codebook (“%2”)</source>
        <translation>Die Codierung folgte Version %1 des Codebuchs („%2“)</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="190"/>
        <source>; %1 of %2 codings were made under an earlier version</source>
        <translation>; %1 von %2 Codierungen entstanden unter einer früheren Version</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="196"/>
        <source>, which is available at %1.</source>
        <translation>, das unter %1 verfügbar ist.</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="197"/>
        <source>where readers can obtain it</source>
        <translation>wo Lesende es erhalten können</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="201"/>
        <source>Highlighted brackets are for the authors to complete: the project does not record these facts.</source>
        <translation>Hervorgehobene Klammern ergänzen die Autorinnen und Autoren: das Projekt verzeichnet diese Angaben nicht.</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="219"/>
        <source>Size of the reliability sample and how it was selected</source>
        <translation>Umfang der Reliabilitätsstichprobe und wie sie ausgewählt wurde</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="221"/>
        <source>Relationship of the reliability sample to the full sample</source>
        <translation>Verhältnis der Reliabilitätsstichprobe zur Gesamtstichprobe</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="223"/>
        <source>Number of reliability coders</source>
        <translation>Anzahl der Codierenden in der Reliabilitätsprüfung</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="224"/>
        <source>Amount of coding conducted by each coder</source>
        <translation>Umfang der Codierung je codierender Person</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="225"/>
        <source>Index or indices selected and why</source>
        <translation>Gewählte Koeffizienten und Begründung</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="226"/>
        <source>Reliability for each variable, for each index</source>
        <translation>Reliabilität jeder Variablen, für jeden Koeffizienten</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="227"/>
        <source>Amount of coder training required to reach reliability</source>
        <translation>Umfang der Codiererschulung bis zum Erreichen der Reliabilität</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="229"/>
        <source>How disagreements were resolved</source>
        <translation>Wie Abweichungen aufgelöst wurden</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="231"/>
        <source>Where the codebook and coding instructions can be obtained</source>
        <translation>Wo Codebuch und Codieranweisungen erhältlich sind</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="236"/>
        <source>#</source>
        <translation>#</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="237"/>
        <source>Item</source>
        <translation>Punkt</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="238"/>
        <source>In this report</source>
        <translation>In diesem Bericht</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="247"/>
        <source>filled in from the project</source>
        <translation>aus dem Projekt ausgefüllt</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="248"/>
        <source>partly filled in; complete the bracket</source>
        <translation>teilweise ausgefüllt; ergänzen Sie die Klammer</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="21"/>
        <location filename="../app/report/report_sections.cpp" line="23"/>
        <location filename="../app/report/report_sections.cpp" line="109"/>
        <location filename="../app/report/report_sections.cpp" line="198"/>
        <location filename="../app/report/report_sections.cpp" line="242"/>
        <location filename="../app/report/report_sections.cpp" line="399"/>
        <source>Variable</source>
        <translation>Variable</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="24"/>
        <source>Level</source>
        <translation>Niveau</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="25"/>
        <location filename="../app/report/report_sections.cpp" line="200"/>
        <source>Units</source>
        <translation>Einh.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="26"/>
        <location filename="../app/report/report_sections.cpp" line="110"/>
        <source>Pairable values</source>
        <translation>Paarb. Werte</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="27"/>
        <source>95% CI, units</source>
        <translation>95%-KI, Einheiten</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="28"/>
        <source>95% CI, pairs</source>
        <translation>95%-KI, Paare</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="29"/>
        <location filename="../app/report/report_sections.cpp" line="201"/>
        <source>Agreement</source>
        <translation>Übereinst.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="30"/>
        <location filename="../app/report/report_sections.cpp" line="306"/>
        <source>Verdict</source>
        <translation>Urteil</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="45"/>
        <source>not computed: %1</source>
        <translation>nicht berechnet: %1</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="78"/>
        <source>Units: %1 (articles for article-level items; passages matched across coders for span attributes). Agreement: percent agreement, which is not chance-corrected and is never reported alone (Lombard et al., 2002). Units: units resampled, percentile interval (the interval to report); pairs: pairable values resampled with the expected disagreement held fixed (Hayes &amp; Krippendorff, 2007), too narrow with more than two coders.</source>
        <translation>Einheiten: %1 (Artikel für Items auf Artikelebene; zwischen Codierenden zugeordnete Passagen für Merkmale von Textstellen). Übereinstimmung: prozentuale Übereinstimmung, die nicht zufallskorrigiert ist und nie allein berichtet wird (Lombard et al., 2002). Einheiten: Einheiten neu gezogen, Perzentilintervall (das zu berichtende Intervall); Paare: paarbare Werte neu gezogen bei festgehaltener erwarteter Nichtübereinstimmung (Hayes &amp; Krippendorff, 2007), bei mehr als zwei Codierenden zu eng.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="95"/>
        <source>Krippendorff&apos;s alpha per variable</source>
        <translation>Krippendorffs Alpha je Variable</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="96"/>
        <source>Krippendorff&apos;s alpha per variable (dots) with 95% bootstrap intervals: whiskers resample pairable values (Hayes &amp; Krippendorff, 2007), bands resample units. The lines mark 0.667 and 0.800 (Krippendorff, 2004).</source>
        <translation>Krippendorffs Alpha je Variable (Punkte) mit 95%-Bootstrap-Intervallen: Whisker ziehen paarbare Werte neu (Hayes &amp; Krippendorff, 2007), Bänder ziehen Einheiten neu. Die Linien markieren 0.667 und 0.800 (Krippendorff, 2004).</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="111"/>
        <source>Rarest value</source>
        <translation>Seltenster Wert</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="112"/>
        <source>Minimum for α ≥ 0.800</source>
        <translation>Minimum für α ≥ 0.800</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="113"/>
        <source>Enough?</source>
        <translation>Ausreichend?</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="130"/>
        <source>yes</source>
        <translation>ja</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="131"/>
        <source>too few values</source>
        <translation>zu wenige Werte</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="134"/>
        <source>Krippendorff&apos;s (2004, §11.4) minimum number of pairable values for α ≥ 0.800 at p = 0.05, after Bloch &amp; Kraemer (1989), given the share of the rarest value.</source>
        <translation>Krippendorffs (2004, §11.4) Mindestzahl paarbarer Werte für α ≥ 0.800 bei p = 0.05 nach Bloch &amp; Kraemer (1989), gegeben den Anteil des seltensten Werts.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="147"/>
        <source>Coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="148"/>
        <source>Role</source>
        <translation>Rolle</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="39"/>
        <location filename="../app/report/report_sections.cpp" line="149"/>
        <source>Articles</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="150"/>
        <source>Shared articles</source>
        <translation>Gemeinsame Artikel</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="151"/>
        <source>Spans</source>
        <translation>Textstellen</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="157"/>
        <source>Answers</source>
        <translation>Antworten</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="176"/>
        <source>Coders appear by pseudonym only. Articles: coded by the coder (assigned, or with a span or an answer); shared: also coded by another coder in this report.</source>
        <translation>Codierende erscheinen nur unter Pseudonym. Artikel: von der Person codiert (zugewiesen oder mit einer Textstelle oder Antwort); gemeinsam: in diesem Bericht auch von einer anderen Person codiert.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="188"/>
        <source>Cohen&apos;s kappa per coder pair</source>
        <translation>Cohens Kappa je Codierpaar</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="189"/>
        <source>Cohen&apos;s kappa (Cohen, 1960) for each pair of coders and each function, on the %1 both coded. Darker is higher; hatched cells are undefined.</source>
        <translation>Cohens Kappa (Cohen, 1960) für jedes Paar von Codierenden und jede Funktion, auf den %1, die beide codierten. Dunkler ist höher; schraffierte Zellen sind nicht definiert.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="199"/>
        <source>Pair</source>
        <translation>Paar</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="202"/>
        <source>95% CI</source>
        <translation>95%-KI</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="228"/>
        <source>95% CI: large-sample interval with the standard error of Fleiss, Cohen &amp; Everitt (1969). A coder whose kappa is low with everyone else is worth a look before the coders are retrained.</source>
        <translation>95%-KI: Intervall für große Stichproben mit dem Standardfehler nach Fleiss, Cohen &amp; Everitt (1969). Eine codierende Person, deren Kappa mit allen anderen niedrig ist, verdient einen Blick, bevor die Codierenden nachgeschult werden.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="243"/>
        <source>Fleiss&apos; κ</source>
        <translation>Fleiss&apos; κ</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="244"/>
        <source>Light&apos;s κ</source>
        <translation>Lights κ</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="245"/>
        <source>Cohen&apos;s κ</source>
        <translation>Cohens κ</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="246"/>
        <source>Scott&apos;s π</source>
        <translation>Scotts π</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="247"/>
        <source>Bennett&apos;s S</source>
        <translation>Bennetts S</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="253"/>
        <source>n/a</source>
        <translation>n. v.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="274"/>
        <source>For comparison with older studies: Fleiss (1971) and Light (1971) for any number of coders, Cohen (1960), Scott (1955) and Bennett, Alpert &amp; Goldstein (1954) for two; n/a where their assumptions (complete data, two coders) do not hold.</source>
        <translation>Zum Vergleich mit älteren Studien: Fleiss (1971) und Light (1971) für beliebig viele Codierende, Cohen (1960), Scott (1955) und Bennett, Alpert &amp; Goldstein (1954) für zwei; n. v., wo ihre Voraussetzungen (vollständige Daten, zwei Codierende) nicht erfüllt sind.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="290"/>
        <source>Not computed: %1</source>
        <translation>Nicht berechnet: %1</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="293"/>
        <source>Unitizing alpha (Krippendorff, 2004) compares where the coders put their spans, character by character, on the %1 articles that every coder coded (%2 characters laid end to end).</source>
        <translation>Unitizing-Alpha (Krippendorff, 2004) vergleicht Zeichen für Zeichen, wo die Codierenden ihre Textstellen setzen, auf den %1 Artikeln, die alle Codierenden codierten (%2 Zeichen aneinandergereiht).</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="303"/>
        <source>Function</source>
        <translation>Funktion</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="304"/>
        <source>Observed disagreement</source>
        <translation>Beobachtete Nichtübereinstimmung</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="305"/>
        <source>Expected disagreement</source>
        <translation>Erwartete Nichtübereinstimmung</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="330"/>
        <source>all four</source>
        <translation>alle vier</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="353"/>
        <source>Alpha without each coder</source>
        <translation>Alpha ohne jeweils eine codierende Person</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="355"/>
        <source>Left out</source>
        <translation>Ausgelassen</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="388"/>
        <source>Alpha recomputed without the coder&apos;s codings; in brackets the change against all coders (positive: the coder pulls alpha down). A diagnostic for retraining, not a licence to report the better figure (Krippendorff, 2004).</source>
        <translation>Alpha ohne die Codierungen der Person neu berechnet; in Klammern die Änderung gegenüber allen Codierenden (positiv: die Person senkt Alpha). Eine Diagnose für die Nachschulung, keine Erlaubnis, den besseren Wert zu berichten (Krippendorff, 2004).</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="395"/>
        <source>The article that costs most</source>
        <translation>Der Artikel, der am meisten kostet</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="400"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="401"/>
        <source>α without it</source>
        <translation>α ohne ihn</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="402"/>
        <source>Change</source>
        <translation>Änderung</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="427"/>
        <source>Function confusion between coders</source>
        <translation>Funktionsverwechslungen zwischen Codierenden</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="430"/>
        <source>A coder&apos;s span</source>
        <translation>Textstelle einer Person</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="456"/>
        <source>For each coder&apos;s span, the function the other coder gave the span that overlaps it most (none: nothing there), summed over ordered pairs of coders. Off the diagonal are the confusions a codebook rule could settle.</source>
        <translation>Für jede Textstelle einer codierenden Person die Funktion, die die andere Person der am stärksten überlappenden Textstelle gab (keine: dort ist nichts), summiert über geordnete Paare von Codierenden. Abseits der Diagonale stehen die Verwechslungen, die eine Codebuchregel klären könnte.</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="19"/>
        <source>The newest saved frame analysis, “%1” (saved %2): %3 frames of the layer %4 over %5 articles, by Ward&apos;s hierarchical clustering refined by k-means (Matthes &amp; Kohring 2008). A frame&apos;s characteristic elements are those with an adjusted residual above 1.96 (Haberman 1973), with their share in the frame and in all articles. The frames are only as good as their elements: beside each element variable stands its Krippendorff&apos;s alpha (nominal, articles as units) over the coders of this report.</source>
        <translation>Die neueste gespeicherte Frame-Analyse, „%1“ (gespeichert %2): %3 Frames der Ebene %4 über %5 Artikel, mit hierarchischer Clusteranalyse nach Ward, verfeinert durch k-Means (Matthes &amp; Kohring 2008). Die kennzeichnenden Elemente eines Frames sind jene mit einem standardisierten Residuum über 1.96 (Haberman 1973), mit ihrem Anteil im Frame und in allen Artikeln. Die Frames sind nur so gut wie ihre Elemente: neben jeder Elementvariable steht ihr Krippendorffs Alpha (nominal, Artikel als Einheiten) über die Codierenden dieses Berichts.</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="37"/>
        <source>Frame</source>
        <translation>Frame</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="38"/>
        <source>Name</source>
        <translation>Name</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="40"/>
        <source>Share</source>
        <translation>Anteil</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="41"/>
        <source>Characteristic elements</source>
        <translation>Kennzeichnende Elemente</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="43"/>
        <source>F%1</source>
        <translation>F%1</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="51"/>
        <source>%1 (%2% / %3%)</source>
        <translation>%1 (%2% / %3%)</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="62"/>
        <source>none stands out</source>
        <translation>keines sticht heraus</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="69"/>
        <source>Element variable</source>
        <translation>Elementvariable</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="70"/>
        <source>Pairable articles</source>
        <translation>Paarbare Artikel</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="71"/>
        <source>Characterises</source>
        <translation>Kennzeichnet</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="257"/>
        <source>Every figure above is what these commands print (add --json for all digits):</source>
        <translation>Jeder Wert oben ist das, was diese Befehle ausgeben (mit --json alle Stellen):</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="63"/>
        <source>en</source>
        <extracomment>The report&apos;s language as a BCP 47 tag for &lt;html lang&gt;: nl, de.</extracomment>
        <translation>de</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="81"/>
        <source>Method text</source>
        <translation>Methodentext</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="83"/>
        <source>Reporting checklist (Lombard, Snyder-Duch &amp; Bracken, 2002)</source>
        <translation>Checkliste für die Berichterstattung (Lombard, Snyder-Duch &amp; Bracken, 2002)</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="85"/>
        <source>Reliability per variable</source>
        <translation>Reliabilität je Variable</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="87"/>
        <source>Is the sample large enough?</source>
        <translation>Ist die Stichprobe groß genug?</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="89"/>
        <source>Coders and the amount each coded</source>
        <translation>Codierende und ihr Codierumfang</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="91"/>
        <source>Coder pairs</source>
        <translation>Codierpaare</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="92"/>
        <source>Other coefficients</source>
        <translation>Weitere Koeffizienten</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="94"/>
        <source>Span boundaries: unitizing alpha</source>
        <translation>Grenzen der Textstellen: Unitizing-Alpha</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="98"/>
        <source>Where reliability is lost</source>
        <translation>Wo Reliabilität verloren geht</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="101"/>
        <source>Frames</source>
        <translation>Frames</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="102"/>
        <source>Reproducing the figures</source>
        <translation>Die Werte reproduzieren</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="104"/>
        <source>References</source>
        <translation>Literatur</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="156"/>
        <source>Answers to article-level items were adjudicated as well: %1 gold answers on %2 articles, %3 of them with a written rationale. </source>
        <translation>Auch Antworten auf Items auf Artikelebene wurden entschieden: %1 Goldstandard-Antworten zu %2 Artikeln, %3 davon mit schriftlicher Begründung. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="167"/>
        <source>Disagreements on article-level items were resolved by adjudication into a separate gold standard: %1 gold answers on %2 articles, decided by %3, %4 of them with a written rationale. The independent codings were kept unchanged; every figure above comes from them. </source>
        <translation>Abweichungen bei Items auf Artikelebene wurden durch Entscheidung in einen getrennten Goldstandard aufgelöst: %1 Goldstandard-Antworten zu %2 Artikeln, entschieden von %3, %4 davon mit schriftlicher Begründung. Die unabhängigen Codierungen blieben unverändert; alle obigen Werte stammen aus ihnen. </translation>
    </message>
</context>
<context>
    <name>ReportWriterText</name>
    <message>
        <location filename="../app/report/report_writer.cpp" line="33"/>
        <source>Writing a report needs the graphical libraries; start the program with a QGuiApplication (the offscreen platform will do).</source>
        <translation>Das Schreiben eines Berichts braucht die Grafikbibliotheken; starten Sie das Programm mit einer QGuiApplication (die Offscreen-Plattform genügt).</translation>
    </message>
    <message>
        <location filename="../app/report/report_writer.cpp" line="42"/>
        <location filename="../app/report/report_writer.cpp" line="55"/>
        <location filename="../app/report/report_writer.cpp" line="67"/>
        <source>The report could not be written to %1.</source>
        <translation>Der Bericht konnte nicht nach %1 geschrieben werden.</translation>
    </message>
    <message>
        <location filename="../app/report/report_writer.cpp" line="101"/>
        <source>The report file %1 must end in .html or .pdf.</source>
        <translation>Die Berichtsdatei %1 muss auf .html oder .pdf enden.</translation>
    </message>
</context>
<context>
    <name>RunAgreementText</name>
    <message>
        <location filename="../core/scoring/run_agreement.cpp" line="61"/>
        <source>The run joins the humans on paragraph, sentence or token units.</source>
        <translation>Der Lauf schließt sich den Menschen auf Absatz-, Satz- oder Token-Einheiten an.</translation>
    </message>
</context>
<context>
    <name>RunErrorsText</name>
    <message>
        <location filename="../core/scoring/run_errors.cpp" line="136"/>
        <source>A run is compared with the gold standard or one coder, not &quot;%1&quot;.</source>
        <translation>Ein Lauf wird mit dem Goldstandard oder einer codierenden Person verglichen, nicht mit „%1“.</translation>
    </message>
    <message>
        <location filename="../core/scoring/run_errors.cpp" line="156"/>
        <source>The project has no gold spans yet, so there is nothing to compare with.</source>
        <translation>Das Projekt hat noch keine Goldstandard-Textstellen, es gibt also nichts zum Vergleichen.</translation>
    </message>
    <message>
        <location filename="../core/scoring/run_errors.cpp" line="158"/>
        <source>Coder &quot;%1&quot; has coded no article, so there is nothing to compare with.</source>
        <translation>Die codierende Person „%1“ hat keinen Artikel codiert, es gibt also nichts zum Vergleichen.</translation>
    </message>
</context>
<context>
    <name>RunScoresText</name>
    <message>
        <location filename="../core/scoring/run_scores.cpp" line="204"/>
        <source>A run is scored against the gold standard or one coder, not &quot;%1&quot;.</source>
        <translation>Ein Lauf wird am Goldstandard oder an einer codierenden Person bewertet, nicht an „%1“.</translation>
    </message>
    <message>
        <location filename="../core/scoring/run_scores.cpp" line="224"/>
        <source>The project has no gold spans yet, so there is nothing to score against.</source>
        <translation>Das Projekt hat noch keine Goldstandard-Textstellen, es gibt also nichts, woran bewertet werden kann.</translation>
    </message>
    <message>
        <location filename="../core/scoring/run_scores.cpp" line="226"/>
        <source>Coder &quot;%1&quot; has coded no article, so there is nothing to score against.</source>
        <translation>Die codierende Person „%1“ hat keinen Artikel codiert, es gibt also nichts, woran bewertet werden kann.</translation>
    </message>
</context>
<context>
    <name>SavedFrames</name>
    <message>
        <location filename="../core/project/saved_frames.cpp" line="22"/>
        <source>%1 has no saved frame analysis &quot;%2&quot;.</source>
        <translation>%1 hat keine gespeicherte Frame-Analyse „%2“.</translation>
    </message>
</context>
<context>
    <name>Schema</name>
    <message>
        <location filename="../core/store/schema.cpp" line="397"/>
        <source>Upgrading %1 to schema version %2 failed; the file is unchanged.</source>
        <translation>Das Aktualisieren von %1 auf Schemaversion %2 ist fehlgeschlagen; die Datei ist unverändert.</translation>
    </message>
    <message>
        <location filename="../core/store/schema.cpp" line="463"/>
        <source>%1 is an SQLite file but not a Fourfold project.</source>
        <translation>%1 ist eine SQLite-Datei, aber kein Fourfold-Projekt.</translation>
    </message>
    <message>
        <location filename="../core/store/schema.cpp" line="472"/>
        <source>%1 was written by a newer Fourfold (schema version %2; this version reads up to %3). Open it with a newer Fourfold; the file was not changed.</source>
        <translation>%1 wurde von einem neueren Fourfold geschrieben (Schemaversion %2; diese Version liest bis %3). Öffnen Sie es mit einem neueren Fourfold; die Datei wurde nicht verändert.</translation>
    </message>
    <message>
        <location filename="../core/store/schema.cpp" line="520"/>
        <location filename="../core/store/schema.cpp" line="540"/>
        <source>Could not back up %1 to %2 before upgrading it; the file was not changed.</source>
        <translation>%1 konnte vor dem Aktualisieren nicht nach %2 gesichert werden; die Datei wurde nicht verändert.</translation>
    </message>
    <message>
        <location filename="../core/store/schema.cpp" line="530"/>
        <source>%1 needs upgrading from schema version %2, but its backup %3 from an earlier upgrade differs from it; move the backup away and open the file again. The file was not changed.</source>
        <translation>%1 muss von Schemaversion %2 aktualisiert werden, aber seine Sicherung %3 aus einer früheren Aktualisierung weicht davon ab; verschieben Sie die Sicherung und öffnen Sie die Datei erneut. Die Datei wurde nicht verändert.</translation>
    </message>
</context>
<context>
    <name>SegmenterText</name>
    <message>
        <location filename="../core/text/segmenter.cpp" line="257"/>
        <source>The text is too long to segment (more than 2^31 UTF-16 code units).</source>
        <translation>Der Text ist zu lang zum Segmentieren (mehr als 2^31 UTF-16-Codeeinheiten).</translation>
    </message>
    <message>
        <location filename="../core/text/segmenter.cpp" line="265"/>
        <source>&quot;%1&quot; is not a valid BCP 47 language tag (for example &quot;en&quot;, &quot;nl&quot; or &quot;de-AT&quot;).</source>
        <translation>„%1“ ist kein gültiges BCP-47-Sprachkennzeichen (zum Beispiel „en“, „nl“ oder „de-AT“).</translation>
    </message>
    <message>
        <location filename="../core/text/segmenter.cpp" line="278"/>
        <source>ICU could not create its break iterators for &quot;%1&quot;.</source>
        <translation>ICU konnte seine Break-Iteratoren für „%1“ nicht anlegen.</translation>
    </message>
    <message>
        <location filename="../core/text/segmenter.cpp" line="334"/>
        <source>ICU could not segment the text.</source>
        <translation>ICU konnte den Text nicht segmentieren.</translation>
    </message>
</context>
<context>
    <name>ServerConnectionText</name>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="133"/>
        <source>Out of memory while connecting to the server.</source>
        <translation>Kein Speicher mehr beim Verbinden mit dem Server.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="142"/>
        <source>The server refused the login %1.</source>
        <translation>Der Server hat die Anmeldung %1 abgewiesen.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="143"/>
        <source>Could not connect to the server %1.</source>
        <translation>Keine Verbindung zum Server %1 möglich.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="150"/>
        <source>The server %1 cannot speak UTF-8.</source>
        <translation>Der Server %1 kann kein UTF-8.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="164"/>
        <source>&quot;%1&quot; is not a PostgreSQL connection string.</source>
        <translation>„%1“ ist keine PostgreSQL-Verbindungszeichenkette.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="204"/>
        <source>The server %1 does not allow this for the role %2.</source>
        <translation>Der Server %1 erlaubt dies der Rolle %2 nicht.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="208"/>
        <source>The server %1 refused a row that breaks a rule of the team project.</source>
        <translation>Der Server %1 hat eine Zeile abgewiesen, die gegen eine Regel des Teamprojekts verstößt.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="214"/>
        <location filename="../core/team/server_store_connection.cpp" line="299"/>
        <source>The connection to the server %1 was lost.</source>
        <translation>Die Verbindung zum Server %1 ist abgebrochen.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="218"/>
        <source>The server %1 could not run a statement.</source>
        <translation>Der Server %1 konnte eine Anweisung nicht ausführen.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="258"/>
        <source>Could not make a SCRAM verifier for the role %1.</source>
        <translation>Für die Rolle %1 konnte kein SCRAM-Verifier erzeugt werden.</translation>
    </message>
</context>
<context>
    <name>ServerRolesText</name>
    <message>
        <location filename="../core/team/server_store_roles.cpp" line="37"/>
        <source>The server %1 has a role %2 already; a team project needs a new role for each person (use another database name, or drop the old role).</source>
        <translation>Der Server %1 hat bereits eine Rolle %2; ein Teamprojekt braucht für jede Person eine neue Rolle (verwenden Sie einen anderen Datenbanknamen oder löschen Sie die alte Rolle).</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_roles.cpp" line="101"/>
        <source>The server %1 has no login for the person %2.</source>
        <translation>Der Server %1 hat keine Anmeldung für die Person %2.</translation>
    </message>
</context>
<context>
    <name>ServerSchema</name>
    <message>
        <location filename="../core/team/server_store_schema.cpp" line="485"/>
        <source>The team project on %1 was written by a newer Fourfold (server schema version %2; this version reads up to %3); nothing was changed.</source>
        <translation>Das Teamprojekt auf %1 wurde von einem neueren Fourfold geschrieben (Server-Schemaversion %2; diese Version liest bis %3); nichts wurde verändert.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_schema.cpp" line="494"/>
        <source>Upgrading the team project on %1 to server schema version %2 failed.</source>
        <translation>Das Aktualisieren des Teamprojekts auf %1 auf Server-Schemaversion %2 ist fehlgeschlagen.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_schema.cpp" line="485"/>
        <source>The database %1 holds no team project.</source>
        <translation>Die Datenbank %1 enthält kein Teamprojekt.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_schema.cpp" line="489"/>
        <source>The team project on %1 was written by a newer Fourfold (server schema version %2; this version reads up to %3).</source>
        <translation>Das Teamprojekt auf %1 wurde von einem neueren Fourfold geschrieben (Server-Schemaversion %2; diese Version liest bis %3).</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_schema.cpp" line="497"/>
        <source>The team project on %1 has server schema version %2; this Fourfold works with version %3. The administrator who published it upgrades it first: fourfold-cli team upgrade --server CONNECTION (nothing was changed).</source>
        <translation>Das Teamprojekt auf %1 hat die Server-Schemaversion %2; dieses Fourfold arbeitet mit Version %3. Wer es als Administrator veröffentlicht hat, aktualisiert es zuerst: fourfold-cli team upgrade --server VERBINDUNG (nichts wurde geändert).</translation>
    </message>
</context>
<context>
    <name>SharedRows</name>
    <message>
        <location filename="../core/store/shared_rows.cpp" line="131"/>
        <source>A shared row is not a JSON object.</source>
        <translation>Eine gemeinsame Zeile ist kein JSON-Objekt.</translation>
    </message>
    <message>
        <location filename="../core/store/shared_rows.cpp" line="156"/>
        <source>The units of the article %1 are not pairs of 32-bit offsets.</source>
        <translation>Die Einheiten des Artikels %1 sind keine Paare von 32-Bit-Offsets.</translation>
    </message>
</context>
<context>
    <name>ShortcutTableText</name>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="25"/>
        <source> or </source>
        <translation> oder </translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="114"/>
        <source>Mark the selected text as problem, cause, evaluation or remedy, snapped to whole words; with a span selected: relabel it</source>
        <translation>Den markierten Text als Problem, Ursache, Bewertung oder Lösung kennzeichnen, an ganzen Wörtern ausgerichtet; bei gewählter Textstelle: ihre Funktion ändern</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="117"/>
        <source>%1+1 – 4 (or Alt+1 – 4)</source>
        <translation>%1+1 – 4 (oder Alt+1 – 4)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="118"/>
        <source>Mark exactly the selected text, without snapping to words</source>
        <translation>Genau den markierten Text kennzeichnen, ohne Ausrichtung an Wörtern</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="120"/>
        <source>Exact selection on or off (View menu): while on, 1 – 4 and handle drags take the text exactly as selected</source>
        <translation>Exakte Auswahl ein oder aus (Menü Ansicht): solange ein, übernehmen 1 – 4 und das Ziehen an Griffen den Text genau wie markiert</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="123"/>
        <source>%1 while dragging a handle (or Alt)</source>
        <translation>%1 beim Ziehen eines Griffs (oder Alt)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="124"/>
        <source>Resize the selected span to the exact character</source>
        <translation>Die gewählte Textstelle zeichengenau in der Länge ändern</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="125"/>
        <source>Delete or Backspace</source>
        <translation>Entf oder Rücktaste</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="126"/>
        <source>Delete the selected span</source>
        <translation>Die gewählte Textstelle löschen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="127"/>
        <source>%1+Left / Right (or Alt+Left / Right)</source>
        <translation>%1+Links / Rechts (oder Alt+Links / Rechts)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="128"/>
        <source>Move the selected span&apos;s start by a word</source>
        <translation>Den Anfang der gewählten Textstelle um ein Wort verschieben</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="129"/>
        <source>%1+Shift+Left / Right (or Alt+Shift+Left / Right)</source>
        <translation>%1+Umschalt+Links / Rechts (oder Alt+Umschalt+Links / Rechts)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="130"/>
        <source>Move the selected span&apos;s end by a word</source>
        <translation>Das Ende der gewählten Textstelle um ein Wort verschieben</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="131"/>
        <source>%1+Up / Down (or Alt+Up / Down)</source>
        <translation>%1+Hoch / Runter (oder Alt+Hoch / Runter)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="132"/>
        <source>Select the previous / next span</source>
        <translation>Die vorige / nächste Textstelle wählen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="133"/>
        <source>Esc</source>
        <translation>Esc</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="134"/>
        <source>Clear the span selection, then the text selection; cancel a drag</source>
        <translation>Erst die Auswahl der Textstelle, dann die Textauswahl aufheben; ein Ziehen abbrechen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="136"/>
        <location filename="../app/desktop/shortcut_table.cpp" line="179"/>
        <source>Undo the last change</source>
        <translation>Die letzte Änderung rückgängig machen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="137"/>
        <location filename="../app/desktop/shortcut_table.cpp" line="180"/>
        <source>Redo</source>
        <translation>Wiederholen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="139"/>
        <source>Mark the article as done and open the next</source>
        <translation>Den Artikel als erledigt markieren und den nächsten öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="140"/>
        <source>Next article that is not done</source>
        <translation>Nächster Artikel, der nicht erledigt ist</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="141"/>
        <source>Start a new project</source>
        <translation>Ein neues Projekt beginnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="142"/>
        <source>Open a project</source>
        <translation>Ein Projekt öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="143"/>
        <source>Search the texts</source>
        <translation>In den Texten suchen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="145"/>
        <source>Compare coders and adjudicate (leads)</source>
        <translation>Codierende vergleichen und entscheiden (Leitung)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="146"/>
        <source>Reliability (leads)</source>
        <translation>Reliabilität (Leitung)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="147"/>
        <location filename="../app/desktop/shortcut_table.cpp" line="181"/>
        <source>This list of keys</source>
        <translation>Diese Liste der Tasten</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="155"/>
        <source>Next undecided disagreement</source>
        <translation>Nächste nicht entschiedene Abweichung</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="157"/>
        <source>Previous undecided disagreement</source>
        <translation>Vorherige nicht entschiedene Abweichung</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="158"/>
        <source>Next article in the queue</source>
        <translation>Nächster Artikel in der Warteschlange</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="160"/>
        <source>Previous article in the queue</source>
        <translation>Vorheriger Artikel in der Warteschlange</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="162"/>
        <source>Re-sort the queue: most undecided disagreements first (the queue keeps its order while you decide)</source>
        <translation>Die Warteschlange neu sortieren: die meisten nicht entschiedenen Abweichungen zuerst (bis dahin behält sie ihre Reihenfolge, während Sie entscheiden)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="165"/>
        <source>Accept the chosen coder&apos;s span into gold</source>
        <translation>Die Textstelle der gewählten codierenden Person in den Goldstandard übernehmen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="167"/>
        <source>Put one span covering the chosen spans into gold</source>
        <translation>Eine Textstelle, die die gewählten Textstellen umfasst, in den Goldstandard aufnehmen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="169"/>
        <source>Decide a gold span with a function and boundaries of your own</source>
        <translation>Eine Goldstandard-Textstelle mit eigener Funktion und eigenen Grenzen festlegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="171"/>
        <source>Record that the chosen spans do not belong in gold</source>
        <translation>Festhalten, dass die gewählten Textstellen nicht in den Goldstandard gehören</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="172"/>
        <source>Withdraw the chosen gold span</source>
        <translation>Die gewählte Goldstandard-Textstelle zurückziehen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="174"/>
        <source>Accept every span all coders of the article agree on</source>
        <translation>Jede Textstelle übernehmen, in der alle Codierenden des Artikels übereinstimmen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="176"/>
        <source>Write the rationale kept with the next decision</source>
        <translation>Die Begründung schreiben, die mit der nächsten Entscheidung festgehalten wird</translation>
    </message>
</context>
<context>
    <name>SpanLayerText</name>
    <message>
        <location filename="../core/scoring/span_layer.cpp" line="54"/>
        <source>Unknown layer &quot;%1&quot; (expected gold, coders, coder:PSEUDONYM or run:NAME).</source>
        <translation>Unbekannte Ebene „%1“ (erwartet: gold, coders, coder:PSEUDONYM oder run:NAME).</translation>
    </message>
    <message>
        <location filename="../core/scoring/span_layer.cpp" line="108"/>
        <source>There is no coder &quot;%1&quot; in the project.</source>
        <translation>Im Projekt gibt es keine codierende Person „%1“.</translation>
    </message>
    <message>
        <location filename="../core/scoring/span_layer.cpp" line="149"/>
        <source>There is no extractor run &quot;%1&quot; in the project.</source>
        <translation>Im Projekt gibt es keinen Extraktorlauf „%1“.</translation>
    </message>
</context>
<context>
    <name>StudyDesignText</name>
    <message numerus="yes">
        <location filename="../core/project/assignment_plans.cpp" line="158"/>
        <source>Assign %n article(s)</source>
        <translation>
            <numerusform>%n Artikel zuweisen</numerusform>
            <numerusform>%n Artikel zuweisen</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="239"/>
        <source>Draw the %1 subsample</source>
        <translation>Die Teilstichprobe der Phase %1 ziehen</translation>
    </message>
    <message>
        <location filename="../core/project/study_progress.cpp" line="41"/>
        <source>Show effort per coder</source>
        <translation>Aufwand je Person zeigen</translation>
    </message>
    <message>
        <location filename="../core/project/study_progress.cpp" line="42"/>
        <source>Hide effort per coder</source>
        <translation>Aufwand je Person ausblenden</translation>
    </message>
    <message>
        <location filename="../core/project/assignment_plans.cpp" line="138"/>
        <location filename="../core/project/study_names.cpp" line="42"/>
        <source>There is no coder &quot;%1&quot; in the project.</source>
        <translation>Im Projekt gibt es keine codierende Person „%1“.</translation>
    </message>
    <message>
        <location filename="../core/project/study_names.cpp" line="45"/>
        <source>The coder &quot;%1&quot; is named twice.</source>
        <translation>Die codierende Person „%1“ ist zweimal genannt.</translation>
    </message>
    <message>
        <location filename="../core/project/assignment_plans.cpp" line="141"/>
        <location filename="../core/project/study_names.cpp" line="48"/>
        <source>%1 is disabled and takes no new assignments; enable them first.</source>
        <translation>%1 ist deaktiviert und erhält keine neuen Zuweisungen; aktivieren Sie die Person zuerst.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="60"/>
        <source>A subsample is drawn for the reliability or the pilot phase, not for %1.</source>
        <translation>Eine Teilstichprobe wird für die Reliabilitäts- oder die Pretest-Phase gezogen, nicht für %1.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="65"/>
        <source>Give either the size of the subsample or its fraction of the articles.</source>
        <translation>Geben Sie entweder den Umfang der Teilstichprobe oder ihren Anteil an den Artikeln an.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="69"/>
        <source>The fraction %1 does not lie in (0, 1].</source>
        <translation>Der Anteil %1 liegt nicht in (0, 1].</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="72"/>
        <source>A reliability subsample needs at least two coders; %1 given.</source>
        <translation>Eine Reliabilitäts-Teilstichprobe braucht mindestens zwei Codierende; angegeben: %1.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="85"/>
        <source>The %1 phase already has a subsample (drawn %2 with seed %3).</source>
        <translation>Die Phase %1 hat bereits eine Teilstichprobe (gezogen %2 mit Seed %3).</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="118"/>
        <source>A subsample of %1 articles cannot be drawn from a sampling frame of %2 articles.</source>
        <translation>Eine Teilstichprobe von %1 Artikeln kann nicht aus einer Auswahlgesamtheit von %2 Artikeln gezogen werden.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="234"/>
        <source>The %1 phase already has a subsample.</source>
        <translation>Die Phase %1 hat bereits eine Teilstichprobe.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="305"/>
        <source>The record of the %1 subsample is not a JSON object.</source>
        <translation>Der Eintrag der Teilstichprobe %1 ist kein JSON-Objekt.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="351"/>
        <source>The subsample record is damaged: %1.</source>
        <translation>Der Eintrag der Teilstichprobe ist beschädigt: %1.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="362"/>
        <source>no valid phase</source>
        <translation>keine gültige Phase</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="366"/>
        <source>unknown method &quot;%1&quot;</source>
        <translation>unbekannte Methode „%1“</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="371"/>
        <source>unknown stratum &quot;%1&quot;</source>
        <translation>unbekannte Schicht „%1“</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="376"/>
        <source>no valid seed</source>
        <translation>kein gültiger Seed</translation>
    </message>
    <message>
        <location filename="../core/project/assignment_plans.cpp" line="26"/>
        <source>Double coding needs at least two coders; %1 given.</source>
        <translation>Doppelcodierung braucht mindestens zwei Codierende; angegeben: %1.</translation>
    </message>
    <message>
        <location filename="../core/project/assignment_plans.cpp" line="28"/>
        <source>Name at least one coder for the remaining articles.</source>
        <translation>Nennen Sie mindestens eine codierende Person für die übrigen Artikel.</translation>
    </message>
    <message>
        <location filename="../core/project/assignment_plans.cpp" line="80"/>
        <source>Name at least one article and one coder.</source>
        <translation>Nennen Sie mindestens einen Artikel und eine codierende Person.</translation>
    </message>
    <message>
        <location filename="../core/project/assignment_plans.cpp" line="90"/>
        <location filename="../core/project/assignment_plans.cpp" line="134"/>
        <source>There is no article &quot;%1&quot; in the project.</source>
        <translation>Im Projekt gibt es keinen Artikel „%1“.</translation>
    </message>
    <message>
        <location filename="../core/project/assignment_plans.cpp" line="151"/>
        <source>Article &quot;%1&quot; is already assigned to %2 in the %3 phase.</source>
        <translation>Artikel „%1“ ist %2 in der Phase %3 bereits zugewiesen.</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_version_edit.cpp" line="91"/>
        <source>%1 span(s) of %2 carry the value &quot;%3&quot; of the attribute &quot;%4&quot;, which the new version neither lists nor recodes; add &quot;recode&quot;: {&quot;%3&quot;: &quot;…&quot;} to the attribute with one of its values (%5).</source>
        <translation>%1 Textstelle(n) von %2 tragen den Wert „%3“ des Merkmals „%4“, den die neue Version weder aufführt noch recodiert; fügen Sie dem Merkmal &quot;recode&quot;: {&quot;%3&quot;: &quot;…&quot;} mit einem seiner Werte hinzu (%5).</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_version_edit.cpp" line="110"/>
        <source>%1 answer(s) to the item &quot;%2&quot; are &quot;%3&quot;, which the new version neither lists nor recodes; add &quot;recode&quot;: {&quot;%3&quot;: &quot;…&quot;} to the item with one of its values (%4).</source>
        <translation>%1 Antwort(en) auf das Item „%2“ lauten „%3“, was die neue Version weder aufführt noch recodiert; fügen Sie dem Item &quot;recode&quot;: {&quot;%3&quot;: &quot;…&quot;} mit einem seiner Werte hinzu (%4).</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_versions.cpp" line="186"/>
        <source>A new codebook version needs a note that says what changed and why.</source>
        <translation>Eine neue Codebuchversion braucht eine Notiz, die sagt, was sich geändert hat und warum.</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_versions.cpp" line="200"/>
        <source>The codebook is the same as version %1; no new version was made.</source>
        <translation>Das Codebuch ist identisch mit Version %1; es wurde keine neue Version erstellt.</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_versions.cpp" line="309"/>
        <source>Codebook version %1 → %2</source>
        <translation>Codebuchversion %1 → %2</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_versions.cpp" line="311"/>
        <source>no changes</source>
        <translation>keine Änderungen</translation>
    </message>
    <message>
        <location filename="../core/project/training_feedback.cpp" line="24"/>
        <source>Training feedback is computed on paragraphs, sentences or tokens, not on %1 units.</source>
        <translation>Trainingsfeedback wird auf Absätzen, Sätzen oder Tokens berechnet, nicht auf %1-Einheiten.</translation>
    </message>
    <message>
        <location filename="../core/project/training_feedback.cpp" line="42"/>
        <source>Name the lead whose training coding is the master: there is not exactly one lead with training annotations.</source>
        <translation>Nennen Sie die Leitung, deren Trainingscodierung die Vorlage ist: es gibt nicht genau eine Leitung mit Trainingsannotationen.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="266"/>
        <source>The %1 phase has no subsample to withdraw.</source>
        <translation>Die Phase %1 hat keine Teilstichprobe, die zurückgezogen werden könnte.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="280"/>
        <source>Withdraw the %1 subsample</source>
        <translation>Teilstichprobe der Phase %1 zurückziehen</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_version_edit.cpp" line="38"/>
        <source>Save codebook version %1</source>
        <translation>Codebuch-Version %1 speichern</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_version_edit.cpp" line="48"/>
        <source>The codebook is at version %1 now; this change was made to version %2 and is not saved. Make it again on version %1.</source>
        <translation>Das Codebuch ist jetzt bei Version %1; diese Änderung wurde an Version %2 vorgenommen und ist nicht gespeichert. Nehmen Sie sie an Version %1 noch einmal vor.</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/project/codebook_version_edit.cpp" line="66"/>
        <source>%n span(s) or answer(s) were made under codebook version %1; undo them before the version.</source>
        <translation>
            <numerusform>%n Markierung oder Antwort wurde unter Codebuch-Version %1 gemacht; machen Sie sie vor der Version rückgängig.</numerusform>
            <numerusform>%n Markierungen oder Antworten wurden unter Codebuch-Version %1 gemacht; machen Sie sie vor der Version rückgängig.</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>StudyEditText</name>
    <message>
        <location filename="../core/project/study_edits.cpp" line="59"/>
        <source>The project already holds %1.</source>
        <translation>Das Projekt enthält %1 bereits.</translation>
    </message>
    <message>
        <location filename="../core/project/study_edits.cpp" line="132"/>
        <source>The %1 phase has no subsample to withdraw.</source>
        <translation>Die Phase %1 hat keine Teilstichprobe, die zurückgezogen werden könnte.</translation>
    </message>
    <message>
        <location filename="../core/project/study_edits.cpp" line="152"/>
        <source>The %1 subsample cannot be withdrawn: coding has started on %2 of its %3 assignments (spans, answers, coding time, or a status of started or done). A draw can be withdrawn only before anyone codes it.</source>
        <translation>Die Teilstichprobe der Phase %1 kann nicht zurückgezogen werden: bei %2 ihrer %3 Zuweisungen hat das Codieren begonnen (Textstellen, Antworten, Codierzeit oder der Status begonnen oder fertig). Eine Ziehung kann nur zurückgezogen werden, bevor jemand sie codiert.</translation>
    </message>
    <message>
        <location filename="../core/project/study_edits.cpp" line="183"/>
        <source>An edit that was never applied cannot be undone.</source>
        <translation>Eine Änderung, die nie ausgeführt wurde, kann nicht rückgängig gemacht werden.</translation>
    </message>
    <message>
        <location filename="../core/project/study_edits.cpp" line="102"/>
        <source>&quot;%1&quot; cannot be undone: coding has started on %2 of its %3 assignments (spans, answers, coding time, or a status of started or done).</source>
        <translation>„%1“ kann nicht rückgängig gemacht werden: bei %2 der %3 Zuweisungen hat das Codieren begonnen (Textstellen, Antworten, Codierzeit oder der Status begonnen oder fertig).</translation>
    </message>
</context>
<context>
    <name>StudyText</name>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="13"/>
        <source>Training</source>
        <translation>Training</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="15"/>
        <source>Pilot</source>
        <translation>Pilot</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="17"/>
        <source>Reliability</source>
        <translation>Reliabilität</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="19"/>
        <source>Production</source>
        <translation>Hauptcodierung</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="29"/>
        <source>%1 s</source>
        <translation>%1 s</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="32"/>
        <source>%1 min</source>
        <translation>%1 min</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="33"/>
        <source>%1 h %2 min</source>
        <translation>%1 h %2 min</translation>
    </message>
</context>
<context>
    <name>TeamPeopleText</name>
    <message>
        <location filename="../core/team/team_people.cpp" line="38"/>
        <source>%1 is not a team working file (made by team publish or team join).</source>
        <translation>%1 ist keine Team-Arbeitsdatei (erstellt mit team publish oder team join).</translation>
    </message>
    <message>
        <location filename="../core/team/team_people.cpp" line="47"/>
        <source>The login %1 may not create or change login roles. Adding or disabling a person needs the administrator&apos;s login that published the team project (give it with --server).</source>
        <translation>Die Anmeldung %1 darf keine Anmelderollen anlegen oder ändern. Eine Person hinzuzufügen oder zu deaktivieren erfordert die Anmeldung der Administration, die das Teamprojekt veröffentlicht hat (mit --server angeben).</translation>
    </message>
    <message>
        <location filename="../core/team/team_people.cpp" line="88"/>
        <source>%1 exists already; a new person&apos;s password file needs a new name.</source>
        <translation>%1 existiert bereits; die Passwortdatei einer neuen Person braucht einen neuen Namen.</translation>
    </message>
</context>
<context>
    <name>TeamProjectText</name>
    <message>
        <location filename="../core/team/team_join.cpp" line="64"/>
        <source>%1 already exists; name a new file for the working file.</source>
        <translation>%1 existiert bereits; nennen Sie eine neue Datei für die Arbeitsdatei.</translation>
    </message>
    <message>
        <location filename="../core/team/team_join.cpp" line="84"/>
        <source>The database %1 holds no team project.</source>
        <translation>Die Datenbank %1 enthält kein Teamprojekt.</translation>
    </message>
    <message>
        <location filename="../core/team/team_join.cpp" line="87"/>
        <source>The team project on %1 was written by a newer Fourfold (server schema version %2; this version reads up to %3).</source>
        <translation>Das Teamprojekt auf %1 wurde von einem neueren Fourfold geschrieben (Server-Schemaversion %2; diese Version liest bis %3).</translation>
    </message>
    <message>
        <location filename="../core/team/team_join.cpp" line="100"/>
        <location filename="../core/team/team_sync.cpp" line="101"/>
        <source>The login %1 is not a person of the team project.</source>
        <translation>Die Anmeldung %1 gehört zu keiner Person des Teamprojekts.</translation>
    </message>
    <message>
        <location filename="../core/team/team_join.cpp" line="106"/>
        <source>The login %1 is %2, not %3.</source>
        <translation>Die Anmeldung %1 ist %2, nicht %3.</translation>
    </message>
    <message>
        <location filename="../core/team/team_password_files.cpp" line="53"/>
        <source>Could not write the password file %1.</source>
        <translation>Die Passwortdatei %1 konnte nicht geschrieben werden.</translation>
    </message>
    <message>
        <location filename="../core/team/team_password_files.cpp" line="65"/>
        <source>%1 is a symbolic link; name a new folder for the password files.</source>
        <translation>%1 ist ein symbolischer Link; nennen Sie einen neuen Ordner für die Passwortdateien.</translation>
    </message>
    <message>
        <location filename="../core/team/team_password_files.cpp" line="73"/>
        <source>%1 is not an empty folder; name a new folder for the password files.</source>
        <translation>%1 ist kein leerer Ordner; nennen Sie einen neuen Ordner für die Passwortdateien.</translation>
    </message>
    <message>
        <location filename="../core/team/team_password_files.cpp" line="79"/>
        <source>Could not create the folder %1.</source>
        <translation>Der Ordner %1 konnte nicht angelegt werden.</translation>
    </message>
    <message>
        <location filename="../core/team/team_password_files.cpp" line="85"/>
        <source>Could not make %1 private to its owner.</source>
        <translation>%1 konnte nicht nur für seinen Besitzer zugänglich gemacht werden.</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="91"/>
        <source>%1 is a coder copy; publish the main project.</source>
        <translation>%1 ist eine Kopie für Codierende; veröffentlichen Sie das Hauptprojekt.</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="98"/>
        <source>%1 has no people; add the lead and the coders before publishing it.</source>
        <translation>%1 hat keine Personen; fügen Sie die Leitung und die Codierenden hinzu, bevor Sie es veröffentlichen.</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="111"/>
        <source>%1 has several leads (%2); name the one publishing it.</source>
        <translation>%1 hat mehrere Leitungen (%2); nennen Sie die, die es veröffentlicht.</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="113"/>
        <source>%1 has no lead with the pseudonym %2 (leads: %3).</source>
        <translation>%1 hat keine Leitung mit dem Pseudonym %2 (Leitungen: %3).</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="115"/>
        <source>none</source>
        <translation>keine</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="136"/>
        <source>The pseudonyms %1 and %2 make the same login role %3; rename one of them.</source>
        <translation>Die Pseudonyme %1 und %2 ergeben dieselbe Anmelderolle %3; benennen Sie eines davon um.</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="165"/>
        <source>The database %1 holds a team project already; publish into an empty database.</source>
        <translation>Die Datenbank %1 enthält bereits ein Teamprojekt; veröffentlichen Sie in eine leere Datenbank.</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="269"/>
        <source>The team project is on %1, but %2 could not record it: %3</source>
        <translation>Das Teamprojekt liegt auf %1, aber %2 konnte das nicht festhalten: %3</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="300"/>
        <location filename="../core/team/team_sync.cpp" line="74"/>
        <source>%1 is not a team working file (made by team publish or team join).</source>
        <translation>%1 ist keine Team-Arbeitsdatei (erstellt mit team publish oder team join).</translation>
    </message>
    <message>
        <location filename="../core/team/team_sync.cpp" line="105"/>
        <source>The login %1 is %2, but %3 is the working file of %4.</source>
        <translation>Die Anmeldung %1 ist %2, aber %3 ist die Arbeitsdatei von %4.</translation>
    </message>
</context>
<context>
    <name>TeamStatusText</name>
    <message>
        <location filename="../core/team/team_status.cpp" line="39"/>
        <source>%1 is not a team working file (made by team publish or team join).</source>
        <translation>%1 ist keine Team-Arbeitsdatei (erstellt mit team publish oder team join).</translation>
    </message>
</context>
<context>
    <name>TeamUpgradeText</name>
    <message>
        <location filename="../core/team/team_upgrade.cpp" line="34"/>
        <source>The database %1 holds no team project.</source>
        <translation>Die Datenbank %1 enthält kein Teamprojekt.</translation>
    </message>
</context>
<context>
    <name>ValueEncodingText</name>
    <message>
        <location filename="../core/agreement/value_encoding.cpp" line="30"/>
        <source>unit &quot;%1&quot;, coder &quot;%2&quot;: %3</source>
        <translation>Einheit „%1“, codierende Person „%2“: %3</translation>
    </message>
    <message>
        <location filename="../core/agreement/value_encoding.cpp" line="126"/>
        <source>A set distance (Jaccard, MASI) cannot be combined with the %1 level.</source>
        <translation>Eine Mengendistanz (Jaccard, MASI) lässt sich nicht mit dem Niveau %1 kombinieren.</translation>
    </message>
    <message>
        <location filename="../core/agreement/value_encoding.cpp" line="179"/>
        <source>&quot;%1&quot; is not one of the ordered values (%2).</source>
        <translation>„%1“ ist keiner der geordneten Werte (%2).</translation>
    </message>
    <message>
        <location filename="../core/agreement/value_encoding.cpp" line="186"/>
        <source>&quot;%1&quot; is not a number, as the %2 level needs.</source>
        <translation>„%1“ ist keine Zahl, wie das Niveau %2 sie verlangt.</translation>
    </message>
    <message>
        <location filename="../core/agreement/value_encoding.cpp" line="190"/>
        <source>%1 is negative; ratio values cannot be.</source>
        <translation>%1 ist negativ; Verhältniswerte können das nicht sein.</translation>
    </message>
</context>
<context>
    <name>W3cFormatText</name>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="118"/>
        <source>its &quot;type&quot; is not &quot;Annotation&quot;.</source>
        <translation>ihr „type“ ist nicht „Annotation“.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="130"/>
        <source>its target has no source of the form &quot;ni:///sha-256;…&quot; naming the article&apos;s text (found &quot;%1&quot;).</source>
        <translation>ihr Ziel hat keine Quelle der Form „ni:///sha-256;…“, die den Text des Artikels nennt (gefunden: „%1“).</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="144"/>
        <source>its TextPositionSelector needs whole numbers &quot;start&quot; and &quot;end&quot;.</source>
        <translation>ihr TextPositionSelector braucht ganze Zahlen „start“ und „end“.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="148"/>
        <source>its TextPositionSelector range [%1, %2) is empty or negative.</source>
        <translation>der Bereich [%1, %2) ihres TextPositionSelector ist leer oder negativ.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="160"/>
        <source>its target has no TextPositionSelector.</source>
        <translation>ihr Ziel hat keinen TextPositionSelector.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="169"/>
        <source>its classifying body &quot;%1&quot; is not a framing function (problem, cause, evaluation or remedy).</source>
        <translation>ihr klassifizierender Body „%1“ ist keine Framing-Funktion (problem, cause, evaluation oder remedy).</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="182"/>
        <source>its describing body is not a JSON object of attributes.</source>
        <translation>ihr beschreibender Body ist kein JSON-Objekt mit Merkmalen.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="187"/>
        <source>it has no classifying body naming a framing function.</source>
        <translation>sie hat keinen klassifizierenden Body, der eine Framing-Funktion nennt.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="199"/>
        <source>it has no creator with a pseudonym (&quot;nickname&quot;).</source>
        <translation>sie hat keinen Urheber mit einem Pseudonym („nickname“).</translation>
    </message>
</context>
<context>
    <name>W3cImportText</name>
    <message>
        <location filename="../core/exchange/w3c_import.cpp" line="64"/>
        <source>Annotation %1%2: %3</source>
        <translation>Annotation %1%2: %3</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_import.cpp" line="72"/>
        <source>its creator &quot;%1&quot; is software; only coders&apos; annotations can be imported.</source>
        <translation>ihr Urheber „%1“ ist Software; nur Annotationen von Codierenden können importiert werden.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_import.cpp" line="77"/>
        <source>no article of the project has the text with SHA-256 %1.</source>
        <translation>kein Artikel des Projekts hat den Text mit SHA-256 %1.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_import.cpp" line="98"/>
        <source>the range [%1, %2) lies outside the article&apos;s %3 code points.</source>
        <translation>der Bereich [%1, %2) liegt außerhalb der %3 Codepunkte des Artikels.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_import.cpp" line="103"/>
        <source>the quote &quot;%1&quot; is not the article&apos;s text at [%2, %3).</source>
        <translation>das Zitat „%1“ ist nicht der Text des Artikels bei [%2, %3).</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_import.cpp" line="177"/>
        <source>The collection does not hold its annotations inline (&quot;first&quot; must be an AnnotationPage object with &quot;items&quot;).</source>
        <translation>Die Sammlung enthält ihre Annotationen nicht eingebettet („first“ muss ein AnnotationPage-Objekt mit „items“ sein).</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_import.cpp" line="184"/>
        <location filename="../core/exchange/w3c_import.cpp" line="190"/>
        <source>The file holds neither an AnnotationCollection, nor an Annotation, nor an array of annotations.</source>
        <translation>Die Datei enthält weder eine AnnotationCollection noch eine Annotation noch ein Array von Annotationen.</translation>
    </message>
</context>
<context>
    <name>cli</name>
    <message>
        <location filename="../app/cli/cli_output.cpp" line="54"/>
        <source>Run &quot;fourfold-cli %1 --help&quot; for its options.</source>
        <translation>„fourfold-cli %1 --help“ zeigt die Optionen.</translation>
    </message>
    <message>
        <location filename="../app/cli/cli_output.cpp" line="70"/>
        <source>Show this help.</source>
        <translation>Diese Hilfe anzeigen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="37"/>
        <source>Left out      %1</source>
        <translation>Ausgelassen   %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="38"/>
        <source>Coders        %1 (%2)</source>
        <translation>Codierende    %1 (%2)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="41"/>
        <source>Continuum     %1 articles coded by all, %2 characters</source>
        <translation>Kontinuum     %1 von allen codierte Artikel, %2 Zeichen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="47"/>
        <location filename="../app/cli/command_agree.cpp" line="84"/>
        <source>undefined</source>
        <translation>nicht definiert</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="50"/>
        <source>Unitizing alpha (Krippendorff 2004)</source>
        <translation>Unitizing-Alpha (Krippendorff 2004)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="54"/>
        <source>all</source>
        <translation>alle</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="55"/>
        <source>Positive specific agreement per pair (span F1: same boundaries / any overlap)</source>
        <translation>Positive spezifische Übereinstimmung je Paar (Textstellen-F1: gleiche Grenzen / jede Überlappung)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="93"/>
        <source>Function confusion on matched spans (rows: a coder&apos;s function; columns: the other coder&apos;s at the best-overlapping span)</source>
        <translation>Funktionsverwechslungen bei zugeordneten Textstellen (Zeilen: Funktion einer Person; Spalten: die der anderen Person bei der am besten überlappenden Textstelle)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="106"/>
        <source>Boundary habits (this coder&apos;s span − the other&apos;s, code points, same function)</source>
        <translation>Grenzgewohnheiten (Textstelle dieser Person − die der anderen, Codepunkte, gleiche Funktion)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="117"/>
        <source>  systematic</source>
        <translation>  systematisch</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="162"/>
        <source>Alpha without each coder (costliest first; change = without − with all)</source>
        <translation>Alpha ohne jeweils eine codierende Person (teuerste zuerst; Änderung = ohne − mit allen)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="168"/>
        <source>Alpha without each article (costliest first)</source>
        <translation>Alpha ohne jeweils einen Artikel (teuerste zuerst)</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_agree.cpp" line="171"/>
        <source>  … and %n more (--json lists every one)</source>
        <translation>
            <numerusform>  … und %n weiterer (--json listet alle)</numerusform>
            <numerusform>  … und %n weitere (--json listet alle)</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="186"/>
        <source>A raw reliability matrix: CSV with the header unit,&lt;coder&gt;,&lt;coder&gt;,...; an empty cell is missing.</source>
        <translation>Eine rohe Reliabilitätsmatrix: CSV mit der Kopfzeile unit,&lt;Codierende&gt;,&lt;Codierende&gt;,...; eine leere Zelle fehlt.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="191"/>
        <source>Level of measurement: nominal (default), ordinal, interval or ratio.</source>
        <translation>Skalenniveau: nominal (Standard), ordinal, interval oder ratio.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="194"/>
        <source>Ordinal labels from lowest to highest, e.g. negative,neutral,positive.</source>
        <translation>Ordinale Labels vom niedrigsten zum höchsten, z. B. negative,neutral,positive.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="197"/>
        <source>Cells are sets of labels separated by | (braces allowed; {} = empty set), compared with jaccard or masi.</source>
        <translation>Zellen sind Mengen von Labels, getrennt durch | (geschweifte Klammern erlaubt; {} = leere Menge), verglichen mit jaccard oder masi.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="203"/>
        <source>With a project: article, paragraph, sentence, token, span (an attribute on matched passages) or continuum.</source>
        <translation>Mit einem Projekt: article, paragraph, sentence, token, span (ein Merkmal auf zugeordneten Passagen) oder continuum.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="208"/>
        <source>With a project: problem, cause, evaluation, remedy or all (default all).</source>
        <translation>Mit einem Projekt: problem, cause, evaluation, remedy oder all (Standard: all).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="211"/>
        <source>With a project: the coders&apos; pseudonyms (default: everyone who coded).</source>
        <translation>Mit einem Projekt: die Pseudonyme der Codierenden (Standard: alle, die codiert haben).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="214"/>
        <source>With a project: only this phase (training, pilot, reliability, production).</source>
        <translation>Mit einem Projekt: nur diese Phase (training, pilot, reliability, production).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="217"/>
        <source>With --unit span: the attribute compared on passages matched across coders, e.g. polarity (with --function evaluation).</source>
        <translation>Mit --unit span: das Merkmal, das auf zwischen Codierenden zugeordneten Passagen verglichen wird, z. B. polarity (mit --function evaluation).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="222"/>
        <source>With a project: add the adjudicated gold standard as one more coder, &quot;gold&quot;.</source>
        <translation>Mit einem Projekt: den entschiedenen Goldstandard als weitere codierende Person „gold“ hinzufügen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="225"/>
        <source>With a project: only these articles (ids).</source>
        <translation>Mit einem Projekt: nur diese Artikel (IDs).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="227"/>
        <source>With a project: also count articles that coders started but did not mark done (left out and listed by default).</source>
        <translation>Mit einem Projekt: auch Artikel zählen, die Codierende begonnen, aber nicht als erledigt markiert haben (standardmäßig ausgelassen und aufgelistet).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="230"/>
        <source>With --unit article: the article-level item (default dominant_function).</source>
        <translation>Mit --unit article: das Item auf Artikelebene (Standard: dominant_function).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="233"/>
        <source>Bootstrap replicates for alpha&apos;s 95% interval (both methods, labelled).</source>
        <translation>Bootstrap-Replikationen für das 95%-Intervall von Alpha (beide Methoden, beschriftet).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="236"/>
        <location filename="../app/cli/command_frames.cpp" line="203"/>
        <location filename="../app/cli/command_report.cpp" line="51"/>
        <location filename="../app/cli/command_score.cpp" line="122"/>
        <source>Seed of the bootstrap (default 1).</source>
        <translation>Seed des Bootstraps (Standard 1).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="239"/>
        <source>Cohen&apos;s kappa with disagreement weights by the values&apos; order (Cohen 1968): none (default), linear or quadratic. For ordered values: an ordinal item, --order, or numbers.</source>
        <translation>Cohens Kappa mit Gewichten der Nichtübereinstimmung nach der Ordnung der Werte (Cohen 1968): none (Standard), linear oder quadratic. Für geordnete Werte: ein ordinales Item, --order oder Zahlen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="245"/>
        <location filename="../app/cli/command_frames.cpp" line="211"/>
        <location filename="../app/cli/command_info.cpp" line="35"/>
        <location filename="../app/cli/command_score.cpp" line="133"/>
        <source>Print the figures as JSON.</source>
        <translation>Die Werte als JSON ausgeben.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="247"/>
        <source>Also show where reliability is lost: alpha without each coder and without each article (the costliest first), and with a project the function confusion on matched spans and the coders&apos; boundary habits.</source>
        <translation>Auch zeigen, wo Reliabilität verloren geht: Alpha ohne jeweils eine codierende Person und ohne jeweils einen Artikel (teuerste zuerst) sowie mit einem Projekt die Funktionsverwechslungen bei zugeordneten Textstellen und die Grenzgewohnheiten der Codierenden.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="254"/>
        <location filename="../app/cli/command_frames.cpp" line="235"/>
        <source>The project file (unless --data is given).</source>
        <translation>Die Projektdatei (außer wenn --data angegeben ist).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="256"/>
        <source>Inter-coder reliability: Krippendorff&apos;s alpha (with bootstrap intervals), percent agreement, Cohen&apos;s, Fleiss&apos; and Light&apos;s kappa, Scott&apos;s pi, Bennett&apos;s S; unitizing alpha on the continuum.</source>
        <translation>Intercoder-Reliabilität: Krippendorffs Alpha (mit Bootstrap-Intervallen), prozentuale Übereinstimmung, Cohens, Fleiss&apos; und Lights Kappa, Scotts Pi, Bennetts S; Unitizing-Alpha auf dem Kontinuum.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="271"/>
        <location filename="../app/cli/command_report.cpp" line="140"/>
        <location filename="../app/cli/command_score.cpp" line="159"/>
        <source>--bootstrap expects a number of replicates from 0 to 1000000.</source>
        <translation>--bootstrap erwartet eine Anzahl Replikationen von 0 bis 1000000.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="274"/>
        <location filename="../app/cli/command_export.cpp" line="111"/>
        <location filename="../app/cli/command_frames.cpp" line="276"/>
        <location filename="../app/cli/command_report.cpp" line="143"/>
        <location filename="../app/cli/command_score.cpp" line="162"/>
        <source>--seed expects a non-negative whole number.</source>
        <translation>--seed erwartet eine nicht negative ganze Zahl.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="285"/>
        <source>unknown weights &quot;%1&quot; (expected none, linear or quadratic).</source>
        <translation>unbekannte Gewichte „%1“ (erwartet: none, linear oder quadratic).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="292"/>
        <source>unknown level &quot;%1&quot; (expected nominal, ordinal, interval or ratio).</source>
        <translation>unbekanntes Niveau „%1“ (erwartet: nominal, ordinal, interval oder ratio).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="301"/>
        <source>--order is for the ordinal level; add --level ordinal.</source>
        <translation>--order gilt für das ordinale Niveau; ergänzen Sie --level ordinal.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="307"/>
        <source>unknown distance &quot;%1&quot; (expected jaccard or masi).</source>
        <translation>unbekannte Distanz „%1“ (erwartet: jaccard oder masi).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="316"/>
        <location filename="../app/cli/command_frames.cpp" line="288"/>
        <source>give either --data FILE or a project, not both.</source>
        <translation>geben Sie entweder --data DATEI oder ein Projekt an, nicht beides.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="319"/>
        <source>--include-unfinished is for a project, not --data.</source>
        <translation>--include-unfinished gilt für ein Projekt, nicht für --data.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="331"/>
        <location filename="../app/cli/command_frames.cpp" line="303"/>
        <source>expected a project file, or --data FILE.</source>
        <translation>Projektdatei oder --data DATEI erwartet.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="334"/>
        <source>with a project, say which units to compare: --unit article|paragraph|sentence|token|span|continuum.</source>
        <translation>sagen Sie bei einem Projekt, welche Einheiten verglichen werden: --unit article|paragraph|sentence|token|span|continuum.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="338"/>
        <location filename="../app/cli/command_assign.cpp" line="439"/>
        <source>unknown unit &quot;%1&quot;.</source>
        <translation>unbekannte Einheit „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="346"/>
        <source>unknown function &quot;%1&quot; (expected problem, cause, evaluation, remedy or all).</source>
        <translation>unbekannte Funktion „%1“ (erwartet: problem, cause, evaluation, remedy oder all).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="357"/>
        <location filename="../app/cli/command_assign.cpp" line="348"/>
        <location filename="../app/cli/command_assign.cpp" line="374"/>
        <location filename="../app/cli/command_assign.cpp" line="455"/>
        <location filename="../app/cli/command_report.cpp" line="132"/>
        <source>unknown phase &quot;%1&quot;.</source>
        <translation>unbekannte Phase „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="63"/>
        <source>%1 subsample: %2%3, seed %4; %5 of %6 articles in the sampling frame; coders %7</source>
        <translation>Teilstichprobe %1: %2%3, Seed %4; %5 von %6 Artikeln der Auswahlgesamtheit; Codierende %7</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="66"/>
        <source> by %1</source>
        <translation> nach %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="72"/>
        <source>  near copies left out of the sampling frame</source>
        <translation>  Beinahe-Kopien aus der Auswahlgesamtheit ausgelassen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="74"/>
        <source>  drawn at %1</source>
        <translation>  gezogen am %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="76"/>
        <source>  stratum %1: %2 of %3</source>
        <translation>  Schicht %1: %2 von %3</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="80"/>
        <source>  articles: %1</source>
        <translation>  Artikel: %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="83"/>
        <source>  Krippendorff&apos;s minimum for alpha_min %1 at p = %2 with the rarest value at %3: %4 values</source>
        <translation>  Krippendorffs Minimum für alpha_min %1 bei p = %2, wenn der seltenste Wert %3 ausmacht: %4 Werte</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="91"/>
        <source>  Krippendorff&apos;s minimum: not defined for these arguments</source>
        <translation>  Krippendorffs Minimum: für diese Argumente nicht definiert</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="92"/>
        <source>  this draw delivers %1 article values, %2 paragraph values, %3 sentence values (units × coders)</source>
        <translation>  diese Ziehung liefert %1 Artikelwerte, %2 Absatzwerte, %3 Satzwerte (Einheiten × Codierende)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="98"/>
        <source>  enough for: none of these units; draw more articles or expect a wider interval</source>
        <translation>  ausreichend für: keine dieser Einheiten; ziehen Sie mehr Artikel oder rechnen Sie mit einem breiteren Intervall</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="100"/>
        <source>  enough for: %1 units</source>
        <translation>  ausreichend für: %1-Einheiten</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="137"/>
        <source>Assignments: %1</source>
        <translation>Zuweisungen: %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="168"/>
        <source>%1  %2  %3  %4  %5  %6  %7</source>
        <translation>%1  %2  %3  %4  %5  %6  %7</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="169"/>
        <source>phase</source>
        <translation>Phase</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="170"/>
        <location filename="../app/cli/command_team.cpp" line="259"/>
        <source>coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="171"/>
        <source>assigned</source>
        <translation>zugewiesen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="172"/>
        <source>started</source>
        <translation>begonnen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="173"/>
        <source>done</source>
        <translation>erledigt</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="174"/>
        <location filename="../app/cli/command_assign.cpp" line="225"/>
        <source>alpha</source>
        <translation>Alpha</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="175"/>
        <source>active</source>
        <translation>aktiv</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="185"/>
        <source>%1 min</source>
        <translation>%1 min</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="189"/>
        <source>Effort (active time; idle time not counted):</source>
        <translation>Aufwand (aktive Zeit; Leerlauf nicht gezählt):</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="190"/>
        <source>Effort in aggregate (active time per coder is off; see --effort):</source>
        <translation>Aufwand insgesamt (aktive Zeit je Person ist ausgeschaltet; siehe --effort):</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="192"/>
        <source>  %1  %2 articles done, %3 min active, %4 min per done article</source>
        <translation>  %1  %2 Artikel erledigt, %3 min aktiv, %4 min je erledigtem Artikel</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="199"/>
        <source>alpha: Krippendorff&apos;s alpha (nominal) on present/absent per sentence and function, against the lead&apos;s master coding in training, else the mean over the coder&apos;s partners; finished articles only.</source>
        <translation>Alpha: Krippendorffs Alpha (nominal) auf vorhanden/nicht vorhanden je Satz und Funktion, gegen die Vorlage-Codierung der Leitung im Training, sonst der Mittelwert über die Partner der Person; nur abgeschlossene Artikel.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="215"/>
        <source>Training feedback for %1 against the master coding of %2 (%3 units)</source>
        <translation>Trainingsfeedback für %1 gegen die Vorlage-Codierung von %2 (%3 Einheiten)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="217"/>
        <source>Finished training articles compared: %1; still open: %2</source>
        <translation>Verglichene abgeschlossene Trainingsartikel: %1; noch offen: %2</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="218"/>
        <location filename="../app/cli/command_extract.cpp" line="105"/>
        <location filename="../app/cli/command_extract.cpp" line="312"/>
        <source>none</source>
        <translation>keine</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="221"/>
        <source>%1  %2  %3  %4  %5</source>
        <translation>%1  %2  %3  %4  %5</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="222"/>
        <location filename="../app/cli/command_score.cpp" line="242"/>
        <location filename="../app/cli/command_score.cpp" line="284"/>
        <source>function</source>
        <translation>Funktion</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="223"/>
        <source>units</source>
        <translation>Einheiten</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="224"/>
        <source>agree %</source>
        <translation>Übereinst. %</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="226"/>
        <source>marked (you / master)</source>
        <translation>markiert (Sie / Vorlage)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="238"/>
        <source>Training complete: the coder can move on to the real work.</source>
        <translation>Training abgeschlossen: die Person kann mit der eigentlichen Arbeit beginnen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="239"/>
        <source>Training not complete yet.</source>
        <translation>Training noch nicht abgeschlossen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="249"/>
        <source>Draw the subsample of this phase (reliability or pilot) that every --coders codes.</source>
        <translation>Die Teilstichprobe dieser Phase (reliability oder pilot) ziehen, die alle --coders codieren.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="257"/>
        <source>With --draw: the number of articles.</source>
        <translation>Mit --draw: die Anzahl der Artikel.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="259"/>
        <source>With --draw: the share of the sampling frame (0 &lt; F &lt;= 1, rounded up).</source>
        <translation>Mit --draw: der Anteil an der Auswahlgesamtheit (0 &lt; F &lt;= 1, aufgerundet).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="262"/>
        <source>With --draw: draw proportionally within outlet, language or topic (metadata key &quot;topic&quot;).</source>
        <translation>Mit --draw: proportional innerhalb von Medium, Sprache oder Thema ziehen (Metadatenschlüssel „topic“).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="267"/>
        <source>With --draw: leave articles found to be near copies of older ones at import out of the sampling frame.</source>
        <translation>Mit --draw: Artikel, die beim Import als Beinahe-Kopien älterer erkannt wurden, aus der Auswahlgesamtheit auslassen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="270"/>
        <source>Seed of the draw or of dealing the rest (default: a random seed, printed and recorded).</source>
        <translation>Seed der Ziehung oder der Verteilung des Rests (Standard: ein zufälliger Seed, ausgegeben und gespeichert).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="274"/>
        <source>With --draw: the smallest acceptable alpha for the sample-size advice (default 0.8).</source>
        <translation>Mit --draw: das kleinste akzeptable Alpha für die Empfehlung zum Stichprobenumfang (Standard 0.8).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="279"/>
        <source>With --draw: the expected share of the rarest value (default 0.25).</source>
        <translation>Mit --draw: der erwartete Anteil des seltensten Werts (Standard 0.25).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="282"/>
        <source>Deal every article without any assignment to --coders for production: single or double coding.</source>
        <translation>Jeden Artikel ohne Zuweisung den --coders für die Produktion zuteilen: Einfach- oder Doppelcodierung.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="287"/>
        <source>With --articles: assign in this phase (training, pilot, reliability, production); with --show or --progress: only this phase.</source>
        <translation>Mit --articles: in dieser Phase zuweisen (training, pilot, reliability, production); mit --show oder --progress: nur diese Phase.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="292"/>
        <source>Assign these articles (ids) to every one of --coders in --phase.</source>
        <translation>Diese Artikel (IDs) allen --coders in --phase zuweisen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="295"/>
        <source>The coders&apos; pseudonyms.</source>
        <translation>Die Pseudonyme der Codierenden.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="297"/>
        <source>With --draw, --rest or --articles: show the plan, write nothing.</source>
        <translation>Mit --draw, --rest oder --articles: den Plan zeigen, nichts schreiben.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="299"/>
        <source>Show the assignments and the draws with their advice.</source>
        <translation>Die Zuweisungen und die Ziehungen mit ihrer Empfehlung zeigen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="301"/>
        <source>Show per coder and phase the articles done, agreement so far and effort.</source>
        <translation>Je Person und Phase die erledigten Artikel, die bisherige Übereinstimmung und den Aufwand zeigen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="303"/>
        <source>Show this coder&apos;s agreement with the master coding on finished training articles.</source>
        <translation>Die Übereinstimmung dieser Person mit der Vorlage-Codierung bei abgeschlossenen Trainingsartikeln zeigen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="307"/>
        <source>With --training: the lead whose training coding is the master (default: the one lead who coded training articles).</source>
        <translation>Mit --training: die Leitung, deren Trainingscodierung die Vorlage ist (Standard: die eine Leitung, die Trainingsartikel codiert hat).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="312"/>
        <source>With --training: paragraph, sentence (default) or token.</source>
        <translation>Mit --training: paragraph, sentence (Standard) oder token.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="315"/>
        <source>Show active time per coder (on) or only in aggregate (off, the default).</source>
        <translation>Aktive Zeit je Person zeigen (on) oder nur insgesamt (off, der Standard).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="317"/>
        <location filename="../app/cli/command_check.cpp" line="13"/>
        <location filename="../app/cli/command_codebook.cpp" line="53"/>
        <location filename="../app/cli/command_extract.cpp" line="163"/>
        <location filename="../app/cli/command_handout.cpp" line="20"/>
        <location filename="../app/cli/command_merge.cpp" line="71"/>
        <location filename="../app/cli/command_team.cpp" line="35"/>
        <location filename="../app/cli/command_team.cpp" line="117"/>
        <location filename="../app/cli/command_team.cpp" line="176"/>
        <location filename="../app/cli/command_team.cpp" line="221"/>
        <location filename="../app/cli/command_team_people.cpp" line="63"/>
        <source>Print the result as JSON.</source>
        <translation>Das Ergebnis als JSON ausgeben.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="321"/>
        <location filename="../app/cli/command_check.cpp" line="16"/>
        <location filename="../app/cli/command_codebook.cpp" line="55"/>
        <location filename="../app/cli/command_export.cpp" line="73"/>
        <location filename="../app/cli/command_extract.cpp" line="166"/>
        <location filename="../app/cli/command_handout.cpp" line="25"/>
        <location filename="../app/cli/command_import.cpp" line="129"/>
        <location filename="../app/cli/command_info.cpp" line="38"/>
        <location filename="../app/cli/command_merge.cpp" line="75"/>
        <location filename="../app/cli/command_people.cpp" line="80"/>
        <location filename="../app/cli/command_report.cpp" line="69"/>
        <location filename="../app/cli/command_score.cpp" line="135"/>
        <location filename="../app/cli/command_team.cpp" line="38"/>
        <source>The project file.</source>
        <translation>Die Projektdatei.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="323"/>
        <source>Assign articles to coders per phase (training, pilot, reliability, production), draw the reliability subsample with a recorded seed, and follow progress. Give one of --draw, --withdraw-draw, --rest, --articles, --show, --progress, --training, --effort.</source>
        <translation>Artikel je Phase (training, pilot, reliability, production) Codierenden zuweisen, die Reliabilitäts-Teilstichprobe mit gespeichertem Seed ziehen und den Fortschritt verfolgen. Geben Sie eine der Optionen --draw, --withdraw-draw, --rest, --articles, --show, --progress, --training, --effort an.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="332"/>
        <location filename="../app/cli/command_check.cpp" line="27"/>
        <location filename="../app/cli/command_codebook.cpp" line="72"/>
        <location filename="../app/cli/command_extract.cpp" line="175"/>
        <location filename="../app/cli/command_handout.cpp" line="37"/>
        <location filename="../app/cli/command_info.cpp" line="47"/>
        <location filename="../app/cli/command_new.cpp" line="30"/>
        <location filename="../app/cli/command_people.cpp" line="101"/>
        <location filename="../app/cli/command_team.cpp" line="50"/>
        <source>expected exactly one project file.</source>
        <translation>genau eine Projektdatei erwartet.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="340"/>
        <source>give exactly one of --draw, --withdraw-draw, --rest, --articles, --show, --progress, --training, --effort.</source>
        <translation>geben Sie genau eine der Optionen --draw, --withdraw-draw, --rest, --articles, --show, --progress, --training, --effort an.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="357"/>
        <source>the seed &quot;%1&quot; is not a whole number from 0 to 18446744073709551615.</source>
        <translation>der Seed „%1“ ist keine ganze Zahl von 0 bis 18446744073709551615.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="378"/>
        <source>give --size or --fraction, not both.</source>
        <translation>geben Sie --size oder --fraction an, nicht beides.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="379"/>
        <source>--draw needs --size or --fraction.</source>
        <translation>--draw braucht --size oder --fraction.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="385"/>
        <source>--size must be a whole number of articles, at least 1; &quot;%1&quot; given.</source>
        <translation>--size muss eine ganze Zahl von Artikeln sein, mindestens 1; angegeben: „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="393"/>
        <source>--fraction must be a number above 0 and at most 1; &quot;%1&quot; given.</source>
        <translation>--fraction muss eine Zahl über 0 und höchstens 1 sein; angegeben: „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="401"/>
        <source>--stratify takes outlet, language or topic, not &quot;%1&quot;.</source>
        <translation>--stratify nimmt outlet, language oder topic, nicht „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="407"/>
        <source>--alpha-min must lie between 0 and 1; &quot;%1&quot; given.</source>
        <translation>--alpha-min muss zwischen 0 und 1 liegen; angegeben: „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="412"/>
        <source>--rarest must lie above 0 and at most 0.5; &quot;%1&quot; given.</source>
        <translation>--rarest muss über 0 und höchstens bei 0.5 liegen; angegeben: „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="425"/>
        <source>--rest takes single or double, not &quot;%1&quot;.</source>
        <translation>--rest nimmt single oder double, nicht „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="430"/>
        <source>--articles needs --phase.</source>
        <translation>--articles braucht --phase.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="432"/>
        <source>--articles needs --coders.</source>
        <translation>--articles braucht --coders.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="445"/>
        <source>--effort takes on or off, not &quot;%1&quot;.</source>
        <translation>--effort nimmt on oder off, nicht „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="448"/>
        <source>name the coders with --coders.</source>
        <translation>nennen Sie die Codierenden mit --coders.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="490"/>
        <source>Active time is now shown per coder.</source>
        <translation>Aktive Zeit wird jetzt je Person angezeigt.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="491"/>
        <source>Active time is now shown in aggregate only.</source>
        <translation>Aktive Zeit wird jetzt nur insgesamt angezeigt.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="509"/>
        <location filename="../app/cli/command_assign.cpp" line="540"/>
        <source>Dry run: nothing was written.</source>
        <translation>Probelauf: nichts wurde geschrieben.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="510"/>
        <location filename="../app/cli/command_assign.cpp" line="541"/>
        <source>%1 assignments written.</source>
        <translation>%1 Zuweisungen geschrieben.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="539"/>
        <source>Seed %1.</source>
        <translation>Seed %1.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="35"/>
        <source>Cannot read %1: %2</source>
        <translation>%1 kann nicht gelesen werden: %2</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="40"/>
        <source>%1: not a JSON object (%2).</source>
        <translation>%1: kein JSON-Objekt (%2).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="69"/>
        <source>%1: a coder&apos;s role must be &quot;coder&quot; or &quot;lead&quot;.</source>
        <translation>%1: die Rolle einer Person muss „coder“ oder „lead“ sein.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="103"/>
        <source>%1: the reliability article &quot;%2&quot; is not in articles.jsonl.</source>
        <translation>%1: der Reliabilitätsartikel „%2“ ist nicht in articles.jsonl.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="149"/>
        <source>Built %1: %2 articles, %3 coders, %4 spans, %5 article judgements, %6 gold spans, 2 baseline runs.</source>
        <translation>%1 erstellt: %2 Artikel, %3 Codierende, %4 Textstellen, %5 Urteile auf Artikelebene, %6 Goldstandard-Textstellen, 2 Baseline-Läufe.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="174"/>
        <source>Replace OUT if it exists.</source>
        <translation>OUT ersetzen, falls vorhanden.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="177"/>
        <source>The folder with study.json, articles.jsonl, codings.jsonl and gold.jsonl.</source>
        <translation>Der Ordner mit study.json, articles.jsonl, codings.jsonl und gold.jsonl.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="179"/>
        <source>The project file to write (*.fourfold).</source>
        <translation>Die zu schreibende Projektdatei (*.fourfold).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="181"/>
        <source>Build the demo project (invented data) from its source files.</source>
        <translation>Das Demoprojekt (erfundene Daten) aus seinen Quelldateien erstellen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="186"/>
        <source>expected a source folder and an output file.</source>
        <translation>Quellordner und Ausgabedatei erwartet.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="191"/>
        <source>%1 already exists; add --force to replace it.</source>
        <translation>%1 existiert bereits; ergänzen Sie --force, um es zu ersetzen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="205"/>
        <source>Cannot move the new project to %1.</source>
        <translation>Das neue Projekt kann nicht nach %1 verschoben werden.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_check.cpp" line="18"/>
        <source>Check a project file: SQLite&apos;s integrity and foreign-key checks, the full-text index, every article&apos;s hash, length and canonical form, and every span and quote against its text. Exits 1 if anything is wrong.</source>
        <translation>Eine Projektdatei prüfen: SQLites Integritäts- und Fremdschlüsselprüfungen, den Volltextindex, Hash, Länge und kanonische Form jedes Artikels sowie jede Textstelle und jedes Zitat gegen ihren Text. Endet mit 1, wenn etwas nicht stimmt.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_check.cpp" line="46"/>
        <source>OK: %1 articles and %2 spans checked, no problems.</source>
        <translation>OK: %1 Artikel und %2 Textstellen geprüft, keine Probleme.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_check.cpp" line="52"/>
        <source>fourfold-cli: %1 has %n problem(s).</source>
        <translation>
            <numerusform>fourfold-cli: %1 hat %n Problem.</numerusform>
            <numerusform>fourfold-cli: %1 hat %n Probleme.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="37"/>
        <source>Print what changed from version A to version B (&quot;--diff A B&quot; or &quot;--diff A,B&quot;; B defaults to the current version).</source>
        <translation>Ausgeben, was sich von Version A zu Version B geändert hat („--diff A B“ oder „--diff A,B“; B ist standardmäßig die aktuelle Version).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="42"/>
        <source>Add the codebook in this JSON file as a new version (needs --note).</source>
        <translation>Das Codebuch in dieser JSON-Datei als neue Version hinzufügen (braucht --note).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="45"/>
        <source>With --update: what changed and why.</source>
        <translation>Mit --update: was sich geändert hat und warum.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="47"/>
        <source>With --update: the lead&apos;s pseudonym, recorded as the author.</source>
        <translation>Mit --update: das Pseudonym der Leitung, als Autor gespeichert.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="50"/>
        <source>Print version N as JSON (the form --update reads).</source>
        <translation>Version N als JSON ausgeben (in der Form, die --update liest).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="52"/>
        <source>List the annotations made under an older version than the current one.</source>
        <translation>Die Annotationen auflisten, die unter einer älteren als der aktuellen Version entstanden sind.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="57"/>
        <source>Codebook versions: without options, list them; editing definitions, decision rules or attributes is recorded as a new version with --update.</source>
        <translation>Codebuchversionen: ohne Optionen werden sie aufgelistet; Änderungen an Definitionen, Entscheidungsregeln oder Merkmalen werden mit --update als neue Version gespeichert.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="68"/>
        <source>give at most one of --diff, --update, --show, --outdated.</source>
        <translation>geben Sie höchstens eine der Optionen --diff, --update, --show, --outdated an.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="81"/>
        <source>--diff takes two version numbers.</source>
        <translation>--diff nimmt zwei Versionsnummern.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="87"/>
        <source>--diff takes version numbers (1, 2, ...), not &quot;%1&quot;.</source>
        <translation>--diff nimmt Versionsnummern (1, 2, ...), nicht „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="95"/>
        <source>--show takes a version number (1, 2, ...), not &quot;%1&quot;.</source>
        <translation>--show nimmt eine Versionsnummer (1, 2, ...), nicht „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="100"/>
        <source>--update needs --note saying what changed and why.</source>
        <translation>--update braucht --note, das sagt, was sich geändert hat und warum.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="115"/>
        <source>There is no coder &quot;%1&quot; in the project.</source>
        <translation>Im Projekt gibt es keine codierende Person „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="134"/>
        <source>Codebook version %1 added.</source>
        <translation>Codebuchversion %1 hinzugefügt.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="181"/>
        <source>%1 annotations were made under an older codebook version.</source>
        <translation>%1 Annotationen entstanden unter einer älteren Codebuchversion.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="184"/>
        <source>  #%1  %2  %3  %4  version %5%6</source>
        <translation>  #%1  %2  %3  %4  Version %5%6</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="190"/>
        <source>  (its function changed since: re-check)</source>
        <translation>  (ihre Funktion hat sich seitdem geändert: erneut prüfen)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="32"/>
        <source>fourfold-cli: note: the %1 split is empty; %2 article(s) are too few for these shares.</source>
        <translation>fourfold-cli: Hinweis: die Aufteilung %1 ist leer; %2 Artikel sind zu wenige für diese Anteile.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="46"/>
        <source>What to export: gold, coders, coder:PSEUDONYM or run:NAME.</source>
        <translation>Was exportiert wird: gold, coders, coder:PSEUDONYM oder run:NAME.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="49"/>
        <source>jsonl (spans and articles), w3c (Web Annotation JSON-LD), bio (IOB2 tokens, one column per function) or csv (article × variable).</source>
        <translation>jsonl (Textstellen und Artikel), w3c (Web Annotation JSON-LD), bio (IOB2-Tokens, eine Spalte je Funktion) oder csv (Artikel × Variable).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="54"/>
        <source>The output directory: new or empty (created if needed); the export appears in it whole or not at all.</source>
        <translation>Das Ausgabeverzeichnis: neu oder leer (wird bei Bedarf angelegt); der Export erscheint darin ganz oder gar nicht.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="59"/>
        <source>Replace an earlier export in --out DIR (a folder holding only export files).</source>
        <translation>Einen früheren Export in --out DIR ersetzen (ein Ordner, der nur Exportdateien enthält).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="62"/>
        <source>Split by article, stratified by function presence: train/dev/test or train/test percentages, e.g. 80/10/10.</source>
        <translation>Nach Artikeln aufteilen, geschichtet nach vorhandenen Funktionen: Prozentanteile train/dev/test oder train/test, z. B. 80/10/10.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="67"/>
        <source>Seed of the split (default 1).</source>
        <translation>Seed der Aufteilung (Standard 1).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="69"/>
        <source>Write offsets and hashes only: no texts, quotes, tokens or titles.</source>
        <translation>Nur Offsets und Hashes schreiben: keine Texte, Zitate, Tokens oder Titel.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="71"/>
        <source>Print the manifest as JSON.</source>
        <translation>Das Manifest als JSON ausgeben.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="75"/>
        <source>Exports gold, codings or a run&apos;s spans for data teams and statistics packages; coders appear only by pseudonym.</source>
        <translation>Exportiert Goldstandard, Codierungen oder die Textstellen eines Laufs für Datenteams und Statistikpakete; Codierende erscheinen nur unter Pseudonym.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="82"/>
        <location filename="../app/cli/command_report.cpp" line="80"/>
        <location filename="../app/cli/command_score.cpp" line="145"/>
        <source>expected one project file.</source>
        <translation>eine Projektdatei erwartet.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="85"/>
        <source>say what to export: --layer gold|coders|coder:PSEUDONYM|run:NAME.</source>
        <translation>sagen Sie, was exportiert wird: --layer gold|coders|coder:PSEUDONYM|run:NAME.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="87"/>
        <source>say which format: --format jsonl|w3c|bio|csv.</source>
        <translation>sagen Sie, welches Format: --format jsonl|w3c|bio|csv.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="89"/>
        <source>say where to write: --out DIR.</source>
        <translation>sagen Sie, wohin geschrieben wird: --out DIR.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="98"/>
        <source>unknown format &quot;%1&quot; (expected jsonl, w3c, bio or csv).</source>
        <translation>unbekanntes Format „%1“ (erwartet: jsonl, w3c, bio oder csv).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="127"/>
        <source>Exported %1 as %2 into %3:</source>
        <translation>%1 als %2 nach %3 exportiert:</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="135"/>
        <source>  %1: %2 articles, %3 spans</source>
        <translation>  %1: %2 Artikel, %3 Textstellen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="94"/>
        <source>No extractor runs.</source>
        <translation>Keine Extraktorläufe.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="103"/>
        <source>%1  (%2, version %3, %4)</source>
        <translation>%1  (%2, Version %3, %4)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="106"/>
        <source>    %1 spans in %2 articles (%3)</source>
        <translation>    %1 Textstellen in %2 Artikeln (%3)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="110"/>
        <source>    %1</source>
        <translation>    %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="124"/>
        <source>Run a built-in baseline: position or cues.</source>
        <translation>Eine eingebaute Baseline ausführen: position oder cues.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="126"/>
        <source>Run an external extractor: a program reading one JSON object per article on stdin and writing one per article on stdout (see the README).</source>
        <translation>Einen externen Extraktor ausführen: ein Programm, das je Artikel ein JSON-Objekt von stdin liest und je Artikel eines nach stdout schreibt (siehe README).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="131"/>
        <source>Import a finished run from a JSON Lines file of spans.</source>
        <translation>Einen fertigen Lauf aus einer JSON-Lines-Datei mit Textstellen importieren.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="134"/>
        <source>Name of the new run (unique in the project).</source>
        <translation>Name des neuen Laufs (eindeutig im Projekt).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="136"/>
        <source>Set a parameter, stored with the run. Repeatable. position: intro, body, conclusion (a function or none), unit (paragraph or sentence). cues: weight.modal, weight.imperative, weight.connective, weight.attribution, weight.negative, weight.positive (numbers), minWeight (number), multiple (true/false), otherLanguages (error or skip). --command and --from-file: recorded as given.</source>
        <translation>Einen Parameter setzen, der mit dem Lauf gespeichert wird. Wiederholbar. position: intro, body, conclusion (eine Funktion oder none), unit (paragraph oder sentence). cues: weight.modal, weight.imperative, weight.connective, weight.attribution, weight.negative, weight.positive (Zahlen), minWeight (Zahl), multiple (true/false), otherLanguages (error oder skip). --command und --from-file: wie angegeben gespeichert.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="144"/>
        <source>--command: stop the program and store nothing when the whole run takes longer than this many seconds (default: no limit).</source>
        <translation>--command: das Programm anhalten und nichts speichern, wenn der ganze Lauf länger als so viele Sekunden dauert (Standard: keine Grenze).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="149"/>
        <source>--command: stop the program and store nothing when it writes nothing for this many seconds (default 120; 0: no limit).</source>
        <translation>--command: das Programm anhalten und nichts speichern, wenn es so viele Sekunden lang nichts schreibt (Standard 120; 0: keine Grenze).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="154"/>
        <source>--command and --from-file: the extractor&apos;s own version, stored with the run.</source>
        <translation>--command und --from-file: die eigene Version des Extraktors, mit dem Lauf gespeichert.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="157"/>
        <source>Only these articles (external ids, comma-separated; default: all).</source>
        <translation>Nur diese Artikel (externe IDs, durch Kommas getrennt; Standard: alle).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="160"/>
        <source>List the project&apos;s runs instead.</source>
        <translation>Stattdessen die Läufe des Projekts auflisten.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="162"/>
        <source>Delete the run called NAME and its spans instead.</source>
        <translation>Stattdessen den Lauf NAME und seine Textstellen löschen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="168"/>
        <source>Run an extractor over a project&apos;s articles and store its spans as a named run, whole or not at all; or import, list or delete runs. Offsets are code points.</source>
        <translation>Einen Extraktor über die Artikel eines Projekts laufen lassen und seine Textstellen als benannten Lauf speichern, ganz oder gar nicht; oder Läufe importieren, auflisten oder löschen. Offsets sind Codepunkte.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="183"/>
        <source>give --extractor, --command or --from-file with --run NAME, or --list, or --delete NAME.</source>
        <translation>geben Sie --extractor, --command oder --from-file mit --run NAME an, oder --list, oder --delete NAME.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="187"/>
        <source>give only one of --extractor, --command, --from-file, --list and --delete.</source>
        <translation>geben Sie nur eine der Optionen --extractor, --command, --from-file, --list und --delete an.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="194"/>
        <location filename="../app/cli/command_import.cpp" line="202"/>
        <source>Upgraded the project file; the old version is kept as %1.</source>
        <translation>Die Projektdatei wurde aktualisiert; die alte Version bleibt als %1 erhalten.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="207"/>
        <source>Deleted run %1.</source>
        <translation>Lauf %1 gelöscht.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="212"/>
        <source>name the new run with --run NAME.</source>
        <translation>benennen Sie den neuen Lauf mit --run NAME.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="226"/>
        <source>parameter &quot;%1&quot; is set by Fourfold itself; choose another key.</source>
        <translation>Parameter „%1“ setzt Fourfold selbst; wählen Sie einen anderen Schlüssel.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="231"/>
        <source>--version, --timeout and --idle-timeout are for --command and --from-file; a built-in baseline has its own version.</source>
        <translation>--version, --timeout und --idle-timeout gelten für --command und --from-file; eine eingebaute Baseline hat ihre eigene Version.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="238"/>
        <source>--articles does not apply to --from-file.</source>
        <translation>--articles gilt nicht für --from-file.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="246"/>
        <source>There is no article &quot;%1&quot; in the project.</source>
        <translation>Im Projekt gibt es keinen Artikel „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="252"/>
        <source>--articles names no article.</source>
        <translation>--articles nennt keinen Artikel.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="275"/>
        <source>unknown extractor &quot;%1&quot; (expected position or cues; use --command for your own).</source>
        <translation>unbekannter Extraktor „%1“ (erwartet: position oder cues; verwenden Sie --command für einen eigenen).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="285"/>
        <source>--timeout expects a number of seconds (0 for no limit), got &quot;%1&quot;.</source>
        <translation>--timeout erwartet eine Anzahl Sekunden (0 für keine Grenze), erhalten: „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="291"/>
        <source>--idle-timeout expects a number of seconds (0 for no limit), got &quot;%1&quot;.</source>
        <translation>--idle-timeout erwartet eine Anzahl Sekunden (0 für keine Grenze), erhalten: „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="310"/>
        <source>Run          %1 (%2, version %3)</source>
        <translation>Lauf         %1 (%2, Version %3)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="313"/>
        <source>Parameters   %1</source>
        <translation>Parameter    %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="314"/>
        <source>Spans        %1 in %2 articles (%3)</source>
        <translation>Textstellen  %1 in %2 Artikeln (%3)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="70"/>
        <source>chi-square undefined: %1</source>
        <translation>Chi-Quadrat nicht definiert: %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="71"/>
        <source>X² = %1, df = %2, p = %3, Cramér&apos;s V = %4%5</source>
        <translation>X² = %1, df = %2, p = %3, Cramérs V = %4%5</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_frames.cpp" line="77"/>
        <source>; %n cell(s) expect fewer than 5</source>
        <translation>
            <numerusform>; bei %n Zelle ist der Erwartungswert kleiner als 5</numerusform>
            <numerusform>; bei %n Zellen ist der Erwartungswert kleiner als 5</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="87"/>
        <location filename="../app/cli/command_frames.cpp" line="100"/>
        <source>%1 could not be written.</source>
        <translation>%1 konnte nicht geschrieben werden.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="137"/>
        <source>%1 holds no saved frame analysis (save one with frames PROJECT --save NAME).</source>
        <translation>%1 enthält keine gespeicherte Frame-Analyse (speichern Sie eine mit frames PROJEKT --save NAME).</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_frames.cpp" line="144"/>
        <source>%1  (%2; layer %3, k = %4, %n article(s))</source>
        <translation>
            <numerusform>%1  (%2; Ebene %3, k = %4, %n Artikel)</numerusform>
            <numerusform>%1  (%2; Ebene %3, k = %4, %n Artikel)</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_frames.cpp" line="150"/>
        <source>  F%1  %2  %n article(s)</source>
        <translation>
            <numerusform>  F%1  %2  %n Artikel</numerusform>
            <numerusform>  F%1  %2  %n Artikel</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="153"/>
        <source>(no name)</source>
        <translation>(ohne Namen)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="171"/>
        <source>Deleted the saved frame analysis &quot;%1&quot;.</source>
        <translation>Die gespeicherte Frame-Analyse „%1“ wurde gelöscht.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="182"/>
        <source>An articles × variables matrix: CSV with a header row &lt;id&gt;,&lt;variable&gt;,... and one row per article, its id first; every cell a number (0/1 for element indicators).</source>
        <translation>Eine Matrix Artikel × Variablen: CSV mit einer Kopfzeile &lt;id&gt;,&lt;Variable&gt;,... und einer Zeile je Artikel, seine ID zuerst; jede Zelle eine Zahl (0/1 für Elementindikatoren).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="187"/>
        <source>With a project: whose codings give the element variables: gold (default), consensus (an element counts when at least half of the article&apos;s coders coded it), coder:PSEUDONYM or run:NAME.</source>
        <translation>Mit einem Projekt: wessen Codierungen die Elementvariablen liefern: gold (Standard), consensus (ein Element zählt, wenn mindestens die Hälfte der Codierenden des Artikels es codiert hat), coder:PSEUDONYM oder run:NAME.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="193"/>
        <source>The number of frames (default: the one most k-choice indices point at).</source>
        <translation>Die Anzahl der Frames (Standard: die, auf die die meisten k-Wahl-Indizes zeigen).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="196"/>
        <source>Compute the k-choice indices for k = 2..K (default 10).</source>
        <translation>Die k-Wahl-Indizes für k = 2..K berechnen (Standard 10).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="199"/>
        <source>Bootstrap replicates for each frame&apos;s stability (Hennig 2007; default 0: none).</source>
        <translation>Bootstrap-Replikationen für die Stabilität jedes Frames (Hennig 2007; Standard 0: keine).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="206"/>
        <source>With a project: also cluster this layer on the articles both layers hold, with the same k, and compare the frames (adjusted Rand index, matched cross-table).</source>
        <translation>Mit einem Projekt: auch diese Ebene auf den Artikeln clustern, die beide Ebenen enthalten, mit demselben k, und die Frames vergleichen (bereinigter Rand-Index, zugeordnete Kreuztabelle).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="213"/>
        <source>Write each article&apos;s frame as CSV rows article,frame (frames counted from 1).</source>
        <translation>Den Frame jedes Artikels als CSV-Zeilen article,frame schreiben (Frames ab 1 gezählt).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="217"/>
        <source>Replace the --out file if it exists.</source>
        <translation>Die --out-Datei ersetzen, falls vorhanden.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="219"/>
        <source>With a project: save the analysis in the project under this name (its settings, each frame&apos;s profile and name, each article&apos;s frame).</source>
        <translation>Mit einem Projekt: die Analyse unter diesem Namen im Projekt speichern (ihre Einstellungen, Profil und Name jedes Frames, den Frame jedes Artikels).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="224"/>
        <source>With --save: the name of the next frame (give it once per frame, largest first).</source>
        <translation>Mit --save: der Name des nächsten Frames (einmal je Frame angeben, größter zuerst).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="228"/>
        <source>List the frame analyses saved in the project.</source>
        <translation>Die im Projekt gespeicherten Frame-Analysen auflisten.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="230"/>
        <source>Delete the saved frame analysis of this name from the project.</source>
        <translation>Die gespeicherte Frame-Analyse dieses Namens aus dem Projekt löschen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="237"/>
        <source>Frames as clusters of articles by their frame elements: Ward&apos;s method, then k-means from Ward&apos;s centroids (Matthes &amp; Kohring 2008); k-choice indices (silhouette, Calinski–Harabasz, fusion-coefficient elbow), bootstrap stability, frames by outlet, month and language.</source>
        <translation>Frames als Cluster von Artikeln nach ihren Frame-Elementen: Ward-Verfahren, dann k-Means ab den Ward-Zentroiden (Matthes &amp; Kohring 2008); k-Wahl-Indizes (Silhouette, Calinski–Harabasz, Ellbogen des Fusionskoeffizienten), Bootstrap-Stabilität, Frames nach Medium, Monat und Sprache.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="249"/>
        <source>--saved and --delete-saved expect a project file.</source>
        <translation>--saved und --delete-saved erwarten eine Projektdatei.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="255"/>
        <source>--save is for a project, not --data.</source>
        <translation>--save gilt für ein Projekt, nicht für --data.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="257"/>
        <source>--frame-name goes with --save.</source>
        <translation>--frame-name gehört zu --save.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="265"/>
        <source>--k expects a whole number of frames from 1 up.</source>
        <translation>--k erwartet eine ganze Zahl von Frames ab 1.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="269"/>
        <source>--max-k expects a whole number from 2 to 100.</source>
        <translation>--max-k erwartet eine ganze Zahl von 2 bis 100.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="273"/>
        <source>--bootstrap expects a number of replicates from 0 to 100000.</source>
        <translation>--bootstrap erwartet eine Anzahl Replikationen von 0 bis 100000.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="279"/>
        <location filename="../app/cli/command_report.cpp" line="103"/>
        <source>%1 exists already; choose another name or replace it with --force.</source>
        <translation>%1 existiert bereits; wählen Sie einen anderen Namen oder ersetzen Sie es mit --force.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="291"/>
        <source>--layer and --compare are for a project, not --data.</source>
        <translation>--layer und --compare gelten für ein Projekt, nicht für --data.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_frames.cpp" line="323"/>
        <source>%1 holds %n article(s); frames need at least 3.</source>
        <translation>
            <numerusform>%1 enthält %n Artikel; Frames brauchen mindestens 3.</numerusform>
            <numerusform>%1 enthält %n Artikel; Frames brauchen mindestens 3.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="330"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_frames.cpp" line="372"/>
        <source>%1 and %2 share %n article(s); comparing %3 frames needs more.</source>
        <translation>
            <numerusform>%1 und %2 teilen %n Artikel; der Vergleich von %3 Frames braucht mehr.</numerusform>
            <numerusform>%1 und %2 teilen %n Artikel; der Vergleich von %3 Frames braucht mehr.</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_frames.cpp" line="407"/>
        <source>Frames of %1 against %2 on the %n article(s) both hold (k = %3 for both)</source>
        <translation>
            <numerusform>Frames von %1 gegen %2 auf dem %n Artikel, den beide enthalten (k = %3 für beide)</numerusform>
            <numerusform>Frames von %1 gegen %2 auf den %n Artikeln, die beide enthalten (k = %3 für beide)</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="414"/>
        <source>  Adjusted Rand index (Hubert &amp; Arabie 1985)  %1</source>
        <translation>  Bereinigter Rand-Index (Hubert &amp; Arabie 1985) %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="415"/>
        <source>  Articles on matched frames                   %1%</source>
        <translation>  Artikel in zugeordneten Frames               %1%</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="419"/>
        <location filename="../app/cli/command_frames.cpp" line="424"/>
        <location filename="../app/cli/command_frames.cpp" line="638"/>
        <source>F%1</source>
        <translation>F%1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="421"/>
        <source>   (rows: %1; columns: %2; * matched)</source>
        <translation>   (Zeilen: %1; Spalten: %2; * zugeordnet)</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_frames.cpp" line="437"/>
        <source>%n --frame-name given for %1 frame(s).</source>
        <translation>
            <numerusform>%n --frame-name angegeben für %1 Frame(s).</numerusform>
            <numerusform>%n --frame-name angegeben für %1 Frame(s).</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="448"/>
        <source>Saved the frames as &quot;%1&quot; in %2.</source>
        <translation>Die Frames wurden als „%1“ in %2 gespeichert.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="545"/>
        <source>Frames of %1: %2 articles × %3 variables</source>
        <translation>Frames von %1: %2 Artikel × %3 Variablen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="558"/>
        <source>Consensus: an element counts when at least half of the article&apos;s coders coded it; %1 of the %2 elements present rest on exactly half.</source>
        <translation>Konsens: ein Element zählt, wenn mindestens die Hälfte der Codierenden des Artikels es codiert hat; %1 der %2 vorhandenen Elemente beruhen auf genau der Hälfte.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="564"/>
        <source>Choosing k (each k: Ward, then k-means from Ward&apos;s centroids)</source>
        <translation>Wahl von k (je k: Ward, dann k-Means ab den Ward-Zentroiden)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="565"/>
        <source>  %1 %2 %3 %4</source>
        <translation>  %1 %2 %3 %4</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="566"/>
        <source>k</source>
        <translation>k</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="567"/>
        <source>silhouette</source>
        <translation>Silhouette</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="568"/>
        <source>Calinski–Harabasz</source>
        <translation>Calinski–Harabasz</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="569"/>
        <source>fusion jump</source>
        <translation>Fusionssprung</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="576"/>
        <source>  Largest: silhouette at k = %1, Calinski–Harabasz at k = %2, fusion jump at k = %3</source>
        <translation>  Größte Werte: Silhouette bei k = %1, Calinski–Harabasz bei k = %2, Fusionssprung bei k = %3</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="581"/>
        <source>Frames (k = %1, given)</source>
        <translation>Frames (k = %1, vorgegeben)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="583"/>
        <source>Frames (k = %1, where most indices point)</source>
        <translation>Frames (k = %1, worauf die meisten Indizes zeigen)</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_frames.cpp" line="589"/>
        <source>  Frame %1  %n article(s) (%2%)</source>
        <translation>
            <numerusform>  Frame %1  %n Artikel (%2%)</numerusform>
            <numerusform>  Frame %1  %n Artikel (%2%)</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="593"/>
        <source>  stability %1%2</source>
        <translation>  Stabilität %1%2</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="597"/>
        <source> (dissolves on resampling)</source>
        <translation> (löst sich beim Neuziehen auf)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="616"/>
        <source>%1 %2 (all %3%4)</source>
        <translation>%1 %2 (alle %3%4)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="620"/>
        <source>, r = %1</source>
        <translation>, r = %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="625"/>
        <source>    elements: %1</source>
        <translation>    Elemente: %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="626"/>
        <source>none stands out</source>
        <translation>keines sticht heraus</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="632"/>
        <source>    closest to the centre: %1</source>
        <translation>    am nächsten am Zentrum: %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="635"/>
        <source>Frames by %1: %2</source>
        <translation>Frames nach %1: %2</translation>
    </message>
    <message>
        <location filename="../app/cli/command_handout.cpp" line="13"/>
        <source>The coder the copy is for: pseudonym (preferred) or name.</source>
        <translation>Die codierende Person, für die die Kopie ist: Pseudonym (bevorzugt) oder Name.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_handout.cpp" line="17"/>
        <source>The coder copy to write (a new file).</source>
        <translation>Die zu schreibende Kopie für Codierende (eine neue Datei).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_handout.cpp" line="27"/>
        <source>Write a coder copy: a project file holding only the articles assigned to the coder, the codebook and the coder&apos;s own annotations, links and answers, never another coder&apos;s. The coder codes in it with the same program; merge it back with &quot;fourfold-cli merge&quot;.</source>
        <translation>Eine Kopie für Codierende schreiben: eine Projektdatei, die nur die der Person zugewiesenen Artikel, das Codebuch und die eigenen Annotationen, Verknüpfungen und Antworten der Person enthält, nie die einer anderen. Die Person codiert darin mit demselben Programm; führen Sie sie mit „fourfold-cli merge“ wieder zusammen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_handout.cpp" line="40"/>
        <source>name the coder with --coder NAME.</source>
        <translation>nennen Sie die codierende Person mit --coder NAME.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_handout.cpp" line="43"/>
        <source>name the copy to write with --out FILE.</source>
        <translation>nennen Sie die zu schreibende Kopie mit --out DATEI.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_handout.cpp" line="64"/>
        <source>Wrote the coder copy %1 for %2 (copy %3).</source>
        <translation>Kopie für Codierende %1 für %2 geschrieben (Kopie %3).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_handout.cpp" line="66"/>
        <source>It holds %1 articles, %2 annotations, %3 links and %4 article judgements.</source>
        <translation>Sie enthält %1 Artikel, %2 Annotationen, %3 Verknüpfungen und %4 Urteile auf Artikelebene.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="50"/>
        <source>%1: %2 spans, %3 answers, %4 gold spans added</source>
        <translation>%1: %2 Textstellen, %3 Antworten, %4 Goldstandard-Textstellen hinzugefügt</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="56"/>
        <source>  %1 line(s) skipped: already in the project (the same annotation, or the same coder, function and range; the same answer; the same gold span)</source>
        <translation>  %1 Zeile(n) übersprungen: bereits im Projekt (dieselbe Annotation oder dieselbe Person, Funktion und derselbe Bereich; dieselbe Antwort; dieselbe Goldstandard-Textstelle)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="61"/>
        <source>  %1 article(s) marked done for their coders (imported codings count as finished)</source>
        <translation>  %1 Artikel für ihre Codierenden als erledigt markiert (importierte Codierungen gelten als abgeschlossen)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="66"/>
        <source>  new coders: %1</source>
        <translation>  neue Codierende: %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="83"/>
        <source>Read every file as txt, html, jsonl, csv, feed (RSS or Atom), newsxml (NITF or NewsML-G2), docx, odt, pdf or epub (default: from each file&apos;s suffix; .xml and unknown suffixes from the content).</source>
        <translation>Jede Datei als txt, html, jsonl, csv, feed (RSS oder Atom), newsxml (NITF oder NewsML-G2), docx, odt, pdf oder epub lesen (Standard: nach der Endung jeder Datei; .xml und unbekannte Endungen nach dem Inhalt).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="89"/>
        <source>Language (BCP 47 tag) of articles that name none (default: the project&apos;s).</source>
        <translation>Sprache (BCP-47-Kennzeichen) von Artikeln, die keine nennen (Standard: die des Projekts).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="93"/>
        <source>CSV: take FIELD (id, title, text, outlet, published, language) from the column HEADER. Repeatable.</source>
        <translation>CSV: FELD (id, title, text, outlet, published, language) aus der Spalte HEADER nehmen. Wiederholbar.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="98"/>
        <source>EPUB: import each book as one article instead of one article per chapter.</source>
        <translation>EPUB: jedes Buch als einen Artikel importieren statt eines Artikels je Kapitel.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="101"/>
        <source>txt, docx, odt, pdf: cut each document into articles at the lines matching REGEX; named groups (?&lt;title&gt;...), (?&lt;outlet&gt;...), (?&lt;date&gt;...) fill those fields, else the first line of each part is its title.</source>
        <translation>txt, docx, odt, pdf: jedes Dokument an den Zeilen, auf die REGEX passt, in Artikel teilen; benannte Gruppen (?&lt;title&gt;...), (?&lt;outlet&gt;...), (?&lt;date&gt;...) füllen diese Felder, sonst ist die erste Zeile jedes Teils sein Titel.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="107"/>
        <source>List and record an added article as a near copy of an article in the project when the estimated Jaccard similarity of their 5-word shingles is at least J, in (0, 1] (default 0.8).</source>
        <translation>Einen hinzugefügten Artikel als Beinahe-Kopie eines Artikels im Projekt auflisten und speichern, wenn die geschätzte Jaccard-Ähnlichkeit ihrer 5-Wort-Shingles mindestens J beträgt, in (0, 1] (Standard 0.8).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="113"/>
        <source>Print the report as JSON.</source>
        <translation>Den Bericht als JSON ausgeben.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="115"/>
        <source>The files hold W3C Web Annotations (from &quot;export --format w3c&quot;): import them as codings of the articles already in the project.</source>
        <translation>Die Dateien enthalten W3C-Web-Annotationen (aus „export --format w3c“): als Codierungen der bereits im Projekt vorhandenen Artikel importieren.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="119"/>
        <source>The files hold quote-anchored codings (JSON Lines, see sample-project/README.md).</source>
        <translation>Die Dateien enthalten an Zitaten verankerte Codierungen (JSON Lines, siehe sample-project/README.md).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="122"/>
        <source>With --w3c or --codings: the phase of the imported codings (training, pilot, reliability, production; default production).</source>
        <translation>Mit --w3c oder --codings: die Phase der importierten Codierungen (training, pilot, reliability, production; Standard production).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="131"/>
        <source>Files or folders to import. Each file is imported whole or not at all; a folder (with its subfolders) likewise, as one.</source>
        <translation>Zu importierende Dateien oder Ordner. Jede Datei wird ganz oder gar nicht importiert; ein Ordner (mit seinen Unterordnern) ebenso, als Ganzes.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="135"/>
        <source>Import articles into a project (or, with --w3c or --codings, codings of its articles).</source>
        <translation>Artikel in ein Projekt importieren (oder, mit --w3c oder --codings, Codierungen seiner Artikel).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="144"/>
        <source>expected a project file and at least one file to import.</source>
        <translation>Projektdatei und mindestens eine zu importierende Datei erwartet.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="152"/>
        <source>unknown format &quot;%1&quot; (expected txt, html, jsonl, csv, feed, newsxml, docx, odt, pdf or epub).</source>
        <translation>unbekanntes Format „%1“ (erwartet: txt, html, jsonl, csv, feed, newsxml, docx, odt, pdf oder epub).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="163"/>
        <source>--split-on: %1</source>
        <translation>--split-on: %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="171"/>
        <source>--near-copy-threshold expects a number in (0, 1], got &quot;%1&quot;.</source>
        <translation>--near-copy-threshold erwartet eine Zahl in (0, 1], erhalten: „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="179"/>
        <source>--column expects FIELD=HEADER, got &quot;%1&quot;.</source>
        <translation>--column erwartet FELD=HEADER, erhalten: „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="186"/>
        <source>choose either --w3c or --codings.</source>
        <translation>wählen Sie entweder --w3c oder --codings.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="192"/>
        <source>unknown phase &quot;%1&quot; (expected training, pilot, reliability or production).</source>
        <translation>unbekannte Phase „%1“ (erwartet: training, pilot, reliability oder production).</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_import.cpp" line="222"/>
        <source>fourfold-cli: the %n article(s) imported before this file stay in the project.</source>
        <translation>
            <numerusform>fourfold-cli: der %n vor dieser Datei importierte Artikel bleibt im Projekt.</numerusform>
            <numerusform>fourfold-cli: die %n vor dieser Datei importierten Artikel bleiben im Projekt.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="251"/>
        <source>%1: %2 added, %3 skipped</source>
        <translation>%1: %2 hinzugefügt, %3 übersprungen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="260"/>
        <source>  %1: %2</source>
        <translation>  %1: %2</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_import.cpp" line="267"/>
        <source>… %n more</source>
        <translation>
            <numerusform>… %n weiterer</numerusform>
            <numerusform>… %n weitere</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="268"/>
        <source>  %1: %2 added (%3), %4 skipped</source>
        <translation>  %1: %2 hinzugefügt (%3), %4 übersprungen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="275"/>
        <source>  line %1 (%2): skipped, %3</source>
        <translation>  Zeile %1 (%2): übersprungen, %3</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="279"/>
        <source>  line %1 (%2): added, a near copy of &quot;%3&quot; (similarity %4)</source>
        <translation>  Zeile %1 (%2): hinzugefügt, eine Beinahe-Kopie von „%3“ (Ähnlichkeit %4)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="40"/>
        <source>Show what a project holds. Coders appear by pseudonym only.</source>
        <translation>Zeigen, was ein Projekt enthält. Codierende erscheinen nur unter Pseudonym.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="106"/>
        <source>Project      %1 (%2)</source>
        <translation>Projekt       %1 (%2)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="108"/>
        <source>Schema       version %1; codebook version %2; default language %3</source>
        <translation>Schema        Version %1; Codebuchversion %2; Standardsprache %3</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="113"/>
        <source>Articles     %1 (%2)</source>
        <translation>Artikel       %1 (%2)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="116"/>
        <source>Near copies  %1 article(s) a near copy of an older one (%2 pair(s))</source>
        <translation>Kopien        %1 Artikel sind Beinahe-Kopie eines älteren (%2 Paar(e))</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="120"/>
        <source>Units        %1 paragraphs, %2 sentences, %3 tokens, %4 characters</source>
        <translation>Einheiten     %1 Absätze, %2 Sätze, %3 Tokens, %4 Zeichen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="126"/>
        <source>Coders       %1; %2 assignments</source>
        <translation>Codierende    %1; %2 Zuweisungen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="129"/>
        <source>Annotations  %1 (%2)</source>
        <translation>Annotationen  %1 (%2)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="133"/>
        <source>  %1 (%2)  %3 (%4)</source>
        <translation>  %1 (%2)  %3 (%4)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="137"/>
        <source>Links        %1; article judgements %2; gold spans %3; extractor runs %4</source>
        <translation>Verknüpfungen %1; Urteile auf Artikelebene %2; Goldstandard-Textstellen %3; Extraktorläufe %4</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="17"/>
        <source>(none)</source>
        <translation>(keine)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="31"/>
        <source> note &quot;%1&quot;</source>
        <translation> Notiz „%1“</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="34"/>
        <source> confidence %1</source>
        <translation> Konfidenz %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="43"/>
        <source> (deleted)</source>
        <translation> (gelöscht)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="58"/>
        <source>List the open merge conflicts instead of merging.</source>
        <translation>Stattdessen die offenen Konflikte beim Zusammenführen auflisten.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="60"/>
        <source>With --conflicts: list resolved conflicts too.</source>
        <translation>Mit --conflicts: auch gelöste Konflikte auflisten.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="62"/>
        <source>Resolve the open conflict UUID (the conflict&apos;s or the object&apos;s uuid).</source>
        <translation>Den offenen Konflikt UUID lösen (die UUID des Konflikts oder des Objekts).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="66"/>
        <source>With --resolve: keep &quot;mine&quot; (the version the project holds) or &quot;theirs&quot; (the version that lost).</source>
        <translation>Mit --resolve: „mine“ (die Version im Projekt) oder „theirs“ (die unterlegene Version) behalten.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="77"/>
        <source>Coder copies to merge, in this order.</source>
        <translation>Zusammenzuführende Kopien für Codierende, in dieser Reihenfolge.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="79"/>
        <source>Merge returned coder copies into the project, all in one transaction: new and changed annotations, links, answers and statuses are taken by uuid, deletions as tombstones, coding time is added. Merging a copy again changes nothing. A copy of another project, with changed article texts or with rows or log entries it cannot hold is refused. An object changed differently in the project and a copy, or in two copies, is a conflict: the later change is kept (in any order of merging), the other is stored until you resolve it with --resolve UUID --keep mine|theirs.</source>
        <translation>Zurückgegebene Kopien für Codierende in einer einzigen Transaktion in das Projekt zusammenführen: neue und geänderte Annotationen, Verknüpfungen, Antworten und Status werden nach UUID übernommen, Löschungen als Grabsteine, Codierzeit wird addiert. Eine Kopie erneut zusammenzuführen ändert nichts. Eine Kopie eines anderen Projekts, mit geänderten Artikeltexten oder mit Zeilen oder Protokolleinträgen, die sie nicht enthalten kann, wird abgelehnt. Ein Objekt, das im Projekt und in einer Kopie oder in zwei Kopien unterschiedlich geändert wurde, ist ein Konflikt: die spätere Änderung bleibt (in jeder Reihenfolge des Zusammenführens), die andere wird gespeichert, bis Sie sie mit --resolve UUID --keep mine|theirs lösen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="95"/>
        <source>name the project file.</source>
        <translation>nennen Sie die Projektdatei.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="100"/>
        <source>use either --conflicts or --resolve.</source>
        <translation>verwenden Sie entweder --conflicts oder --resolve.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="103"/>
        <source>--conflicts and --resolve take the project file only, no copies.</source>
        <translation>--conflicts und --resolve nehmen nur die Projektdatei, keine Kopien.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="107"/>
        <source>name at least one coder copy to merge.</source>
        <translation>nennen Sie mindestens eine zusammenzuführende Kopie für Codierende.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="110"/>
        <source>--resolve UUID needs --keep mine|theirs.</source>
        <translation>--resolve UUID braucht --keep mine|theirs.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="114"/>
        <source>--keep takes &quot;mine&quot; or &quot;theirs&quot;.</source>
        <translation>--keep nimmt „mine“ oder „theirs“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="117"/>
        <source>--all goes with --conflicts.</source>
        <translation>--all gehört zu --conflicts.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="131"/>
        <source>Resolved %1: kept %2.</source>
        <translation>%1 gelöst: %2 behalten.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="172"/>
        <source>No open merge conflicts.</source>
        <translation>Keine offenen Konflikte beim Zusammenführen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="177"/>
        <source>%1  %2 %3 of %4%5%6</source>
        <translation>%1  %2 %3 von %4%5%6</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="181"/>
        <source> on article %1</source>
        <translation> bei Artikel %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="184"/>
        <source> (resolved: kept %1)</source>
        <translation> (gelöst: %1 behalten)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="186"/>
        <source>    mine (kept):   %1</source>
        <translation>    mine (behalten):     %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="188"/>
        <source>    theirs (lost): %1</source>
        <translation>    theirs (unterlegen): %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="191"/>
        <source>    the assignment was withdrawn in the project while %1 coded the article in a copy: keep mine to leave it withdrawn, theirs to assign it again.</source>
        <translation>    die Zuweisung wurde im Projekt zurückgezogen, während %1 den Artikel in einer Kopie codierte: mine behält den Rückzug, theirs weist den Artikel erneut zu.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="227"/>
        <source>%1 (%2): nothing new; it was merged before.</source>
        <translation>%1 (%2): nichts Neues; wurde bereits zusammengeführt.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="230"/>
        <source>%1 (%2): added %3, changed %4 (of which deleted %5), conflicts %6, coding time %7 s.</source>
        <translation>%1 (%2): %3 hinzugefügt, %4 geändert (davon %5 gelöscht), %6 Konflikte, Codierzeit %7 s.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="243"/>
        <source>Open conflicts waiting for your decision: %1 (see fourfold-cli merge %2 --conflicts).</source>
        <translation>Offene Konflikte, die auf Ihre Entscheidung warten: %1 (siehe fourfold-cli merge %2 --conflicts).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_new.cpp" line="12"/>
        <source>Default language of articles that name none (BCP 47 tag, default en).</source>
        <translation>Standardsprache von Artikeln, die keine nennen (BCP-47-Kennzeichen, Standard en).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_new.cpp" line="16"/>
        <source>The project&apos;s name (default: the file name).</source>
        <translation>Der Name des Projekts (Standard: der Dateiname).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_new.cpp" line="21"/>
        <source>The project file to create (*.fourfold).</source>
        <translation>Die anzulegende Projektdatei (*.fourfold).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_new.cpp" line="23"/>
        <location filename="../app/cli/main.cpp" line="35"/>
        <source>Create an empty project file with the default codebook.</source>
        <translation>Eine leere Projektdatei mit dem Standard-Codebuch anlegen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_new.cpp" line="38"/>
        <source>Created %1 (default language %2).</source>
        <translation>%1 angelegt (Standardsprache %2).</translation>
    </message>
    <message>
        <location filename="../app/cli/passphrase_input.cpp" line="22"/>
        <source>The passphrase file %1 could not be read.</source>
        <translation>Die Passphrase-Datei %1 konnte nicht gelesen werden.</translation>
    </message>
    <message>
        <location filename="../app/cli/passphrase_input.cpp" line="31"/>
        <source>The passphrase in %1 is not UTF-8.</source>
        <translation>Die Passphrase in %1 ist kein UTF-8.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="40"/>
        <source>List everyone: pseudonym, role, enabled or disabled, and whether a lead&apos;s passphrase is set (names are not printed).</source>
        <translation>Alle auflisten: Pseudonym, Rolle, aktiviert oder deaktiviert und ob die Passphrase einer Leitung gesetzt ist (Namen werden nicht ausgegeben).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="44"/>
        <source>Add a person with this name (kept in the project, never printed or exported).</source>
        <translation>Eine Person mit diesem Namen hinzufügen (im Projekt gespeichert, nie ausgegeben oder exportiert).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="48"/>
        <source>The new person&apos;s pseudonym, unique in the project (the only name in exports).</source>
        <translation>Das Pseudonym der neuen Person, eindeutig im Projekt (der einzige Name in Exporten).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="52"/>
        <location filename="../app/cli/command_team_people.cpp" line="35"/>
        <source>coder (the default) or lead.</source>
        <translation>coder (Standard) oder lead.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="55"/>
        <source>A new lead&apos;s passphrase: the first line of FILE, or of standard input when FILE is -.</source>
        <translation>Die Passphrase einer neuen Leitung: die erste Zeile von DATEI oder der Standardeingabe, wenn DATEI - ist.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="60"/>
        <source>Give the person with pseudonym P the name NAME (the second argument).</source>
        <translation>Der Person mit dem Pseudonym P den Namen NAME (das zweite Argument) geben.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="63"/>
        <source>Disable the person with pseudonym P: their codings stay; they take no new assignments and cannot be chosen on the desk.</source>
        <translation>Die Person mit dem Pseudonym P deaktivieren: ihre Codierungen bleiben; sie erhält keine neuen Zuweisungen und kann beim Codieren nicht gewählt werden.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="67"/>
        <location filename="../app/cli/command_team_people.cpp" line="46"/>
        <source>Enable a disabled person again.</source>
        <translation>Eine deaktivierte Person wieder aktivieren.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="69"/>
        <source>The lead making the change (needed once the project has a lead).</source>
        <translation>Die Leitung, die die Änderung vornimmt (nötig, sobald das Projekt eine Leitung hat).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="72"/>
        <location filename="../app/cli/command_team_people.cpp" line="51"/>
        <source>That lead&apos;s passphrase: the first line of FILE (- or left out: standard input).</source>
        <translation>Die Passphrase dieser Leitung: die erste Zeile von DATEI (- oder weggelassen: Standardeingabe).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="76"/>
        <source>Print the list or the result as JSON.</source>
        <translation>Die Liste oder das Ergebnis als JSON ausgeben.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="82"/>
        <source>The new name, with --rename.</source>
        <translation>Der neue Name, mit --rename.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="84"/>
        <source>List and change the people of a project. Changes need a lead (--lead and its passphrase) once the project has one; each is logged. Output names people by pseudonym only.</source>
        <translation>Die Personen eines Projekts auflisten und ändern. Änderungen brauchen eine Leitung (--lead und ihre Passphrase), sobald das Projekt eine hat; jede wird protokolliert. Die Ausgabe nennt Personen nur beim Pseudonym.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="96"/>
        <source>give exactly one of --list, --add, --rename, --disable and --enable.</source>
        <translation>geben Sie genau eine der Optionen --list, --add, --rename, --disable und --enable an.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="100"/>
        <source>expected the project file and the new name.</source>
        <translation>Projektdatei und neuer Name erwartet.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="107"/>
        <location filename="../app/cli/command_team_people.cpp" line="92"/>
        <source>--role takes coder or lead, not &quot;%1&quot;.</source>
        <translation>--role nimmt coder oder lead, nicht „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="110"/>
        <location filename="../app/cli/command_team_people.cpp" line="95"/>
        <source>name the new person&apos;s pseudonym with --pseudonym.</source>
        <translation>nennen Sie das Pseudonym der neuen Person mit --pseudonym.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="113"/>
        <location filename="../app/cli/command_team_people.cpp" line="98"/>
        <source>a lead needs a passphrase: give it with --passphrase-file FILE (- for standard input).</source>
        <translation>eine Leitung braucht eine Passphrase: geben Sie sie mit --passphrase-file DATEI an (- für die Standardeingabe).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="121"/>
        <location filename="../app/cli/command_team_people.cpp" line="104"/>
        <source>only one passphrase can come from standard input; give the other in a file.</source>
        <translation>nur eine Passphrase kann aus der Standardeingabe kommen; geben Sie die andere in einer Datei an.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="145"/>
        <source>disabled</source>
        <translation>deaktiviert</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="145"/>
        <source>enabled</source>
        <translation>aktiviert</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="147"/>
        <source>passphrase set</source>
        <translation>Passphrase gesetzt</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="148"/>
        <source>no passphrase yet (set when first chosen)</source>
        <translation>noch keine Passphrase (wird bei der ersten Wahl gesetzt)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="175"/>
        <location filename="../app/cli/command_team_people.cpp" line="85"/>
        <source>changing people needs a lead: name yourself with --lead L (your passphrase on standard input or with --lead-passphrase-file FILE).</source>
        <translation>Personen zu ändern braucht eine Leitung: nennen Sie sich mit --lead L (Ihre Passphrase über die Standardeingabe oder mit --lead-passphrase-file DATEI).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="194"/>
        <source>Added %1 (%2).</source>
        <translation>%1 (%2) hinzugefügt.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="198"/>
        <source>Renamed %1.</source>
        <translation>%1 umbenannt.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="205"/>
        <source>Disabled %1: their codings stay; they take no new assignments.</source>
        <translation>%1 deaktiviert: die Codierungen bleiben; die Person erhält keine neuen Zuweisungen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="206"/>
        <source>Enabled %1.</source>
        <translation>%1 aktiviert.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="34"/>
        <source>The report file: FILE.html (self-contained) or FILE.pdf; give --out twice for both.</source>
        <translation>Die Berichtsdatei: DATEI.html (eigenständig) oder DATEI.pdf; geben Sie --out zweimal für beide an.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="38"/>
        <source>The unit of the four function variables: paragraph, sentence (default) or token.</source>
        <translation>Die Einheit der vier Funktionsvariablen: paragraph, sentence (Standard) oder token.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="42"/>
        <source>Only this phase (training, pilot, reliability, production); default all.</source>
        <translation>Nur diese Phase (training, pilot, reliability, production); Standard: alle.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="45"/>
        <source>The coders&apos; pseudonyms (default: everyone who coded).</source>
        <translation>Die Pseudonyme der Codierenden (Standard: alle, die codiert haben).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="48"/>
        <source>Bootstrap replicates for alpha&apos;s 95% intervals (default 1000; 0 = none).</source>
        <translation>Bootstrap-Replikationen für die 95%-Intervalle von Alpha (Standard 1000; 0 = keine).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="54"/>
        <source>The report&apos;s title.</source>
        <translation>Der Titel des Berichts.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="56"/>
        <source>Also print the report&apos;s figures as JSON on stdout.</source>
        <translation>Die Werte des Berichts zusätzlich als JSON auf stdout ausgeben.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="58"/>
        <source>Replace report files that exist already.</source>
        <translation>Bereits vorhandene Berichtsdateien ersetzen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="60"/>
        <source>The report&apos;s language: en, nl or de (default: the language of the messages, from LANGUAGE or LANG).</source>
        <translation>Die Sprache des Berichts: en, nl oder de (Standard: die Sprache der Meldungen, aus LANGUAGE oder LANG).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="64"/>
        <source>Also count articles that coders started but did not mark done (left out and listed by default).</source>
        <translation>Auch Artikel zählen, die Codierende begonnen, aber nicht als erledigt markiert haben (standardmäßig ausgelassen und aufgelistet).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="71"/>
        <source>Write the reliability report: method text with the items of Lombard, Snyder-Duch &amp; Bracken (2002), Krippendorff&apos;s alpha per variable with bootstrap intervals, coders and pairs, charts. Every figure equals what &quot;fourfold-cli agree&quot; prints for the same selection.</source>
        <translation>Den Reliabilitätsbericht schreiben: Methodentext mit den Punkten von Lombard, Snyder-Duch &amp; Bracken (2002), Krippendorffs Alpha je Variable mit Bootstrap-Intervallen, Codierende und Paare, Diagramme. Jeder Wert entspricht dem, was „fourfold-cli agree“ für dieselbe Auswahl ausgibt.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="84"/>
        <source>say where to write the report: --out FILE.html|FILE.pdf.</source>
        <translation>sagen Sie, wohin der Bericht geschrieben wird: --out DATEI.html|DATEI.pdf.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="90"/>
        <source>the report file &quot;%1&quot; must end in .html or .pdf.</source>
        <translation>die Berichtsdatei „%1“ muss auf .html oder .pdf enden.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="96"/>
        <source>The report file %1 is a symbolic link; name a real file.</source>
        <translation>Die Berichtsdatei %1 ist ein symbolischer Link; nennen Sie eine echte Datei.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="100"/>
        <source>%1 exists and is not a file.</source>
        <translation>%1 existiert und ist keine Datei.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="112"/>
        <source>--language takes en, nl or de, not &quot;%1&quot;.</source>
        <translation>--language nimmt en, nl oder de, nicht „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="125"/>
        <location filename="../app/cli/command_score.cpp" line="169"/>
        <source>unknown unit &quot;%1&quot; (expected paragraph, sentence or token).</source>
        <translation>unbekannte Einheit „%1“ (erwartet: paragraph, sentence oder token).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="168"/>
        <source>Wrote %1</source>
        <translation>%1 geschrieben</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="181"/>
        <source>Write the reliability report (needs a build with FOURFOLD_BUILD_DESKTOP=ON).</source>
        <translation>Den Reliabilitätsbericht schreiben (braucht einen Build mit FOURFOLD_BUILD_DESKTOP=ON).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="187"/>
        <source>This fourfold-cli was built without the graphical libraries, so it cannot write reports; rebuild with FOURFOLD_BUILD_DESKTOP=ON.</source>
        <translation>Dieses fourfold-cli wurde ohne die Grafikbibliotheken gebaut und kann daher keine Berichte schreiben; bauen Sie es mit FOURFOLD_BUILD_DESKTOP=ON neu.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="108"/>
        <source>The extractor run to score (its name).</source>
        <translation>Der zu bewertende Extraktorlauf (sein Name).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="110"/>
        <source>The reference: gold (default) or a coder&apos;s pseudonym.</source>
        <translation>Die Referenz: gold (Standard) oder das Pseudonym einer codierenden Person.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="113"/>
        <source>Span matching (SemEval-2013 Task 9.1): strict (same boundaries and function, default), exact (same boundaries), partial (overlap counts half), type (same function, any overlap).</source>
        <translation>Zuordnung der Textstellen (SemEval-2013 Task 9.1): strict (gleiche Grenzen und Funktion, Standard), exact (gleiche Grenzen), partial (Überlappung zählt halb), type (gleiche Funktion, beliebige Überlappung).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="118"/>
        <source>Bootstrap replicates over articles for the 95% intervals (default 1000; 0 = none).</source>
        <translation>Bootstrap-Replikationen über Artikel für die 95%-Intervalle (Standard 1000; 0 = keine).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="125"/>
        <source>Units on which the run joins the humans for alpha: paragraph, sentence (default) or token.</source>
        <translation>Einheiten, auf denen sich der Lauf für Alpha den Menschen anschließt: paragraph, sentence (Standard) oder token.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="130"/>
        <source>The human coders for alpha (default: everyone who coded).</source>
        <translation>Die menschlichen Codierenden für Alpha (Standard: alle, die codiert haben).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="137"/>
        <source>Scores an extractor run against the gold standard or one coder: precision, recall and F1 per function, micro and macro, with bootstrap intervals over articles; and the run&apos;s alpha with the humans beside their pairwise range.</source>
        <translation>Bewertet einen Extraktorlauf gegen den Goldstandard oder eine codierende Person: Precision, Recall und F1 je Funktion, mikro und makro, mit Bootstrap-Intervallen über Artikel; und das Alpha des Laufs mit den Menschen neben deren paarweiser Spannweite.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="147"/>
        <source>say which run to score: --run NAME.</source>
        <translation>sagen Sie, welcher Lauf bewertet wird: --run NAME.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="151"/>
        <source>unknown match mode &quot;%1&quot; (expected strict, exact, partial or type).</source>
        <translation>unbekannter Zuordnungsmodus „%1“ (erwartet: strict, exact, partial oder type).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="235"/>
        <source>Run %1 against %2, %3 matching, %4 articles</source>
        <translation>Lauf %1 gegen %2, Zuordnung %3, %4 Artikel</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="237"/>
        <source>gold</source>
        <translation>Goldstandard</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="253"/>
        <source>  F1 95% interval (articles resampled)</source>
        <translation>  F1 95%-Intervall (Artikel neu gezogen)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="258"/>
        <source>micro</source>
        <translation>mikro</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="261"/>
        <source>macro</source>
        <translation>makro</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="272"/>
        <source>Intervals: %1 bootstrap replicates over articles, seed %2, percentile method.</source>
        <translation>Intervalle: %1 Bootstrap-Replikationen über Artikel, Seed %2, Perzentilmethode.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="278"/>
        <source>Alpha with the humans: not available (%1)</source>
        <translation>Alpha mit den Menschen: nicht verfügbar (%1)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="281"/>
        <source>Alpha with the humans (%1 units present/absent, nominal; humans: %2)</source>
        <translation>Alpha mit den Menschen (%1-Einheiten vorhanden/nicht vorhanden, nominal; Menschen: %2)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="285"/>
        <source>human band</source>
        <translation>Spanne der Menschen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="286"/>
        <source>run (mean)</source>
        <translation>Lauf (Mittel)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="287"/>
        <source>all+run</source>
        <translation>alle+Lauf</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="288"/>
        <source>position</source>
        <translation>Position</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="20"/>
        <source>The empty database to publish into, as a libpq connection string or URI (postgresql://ADMIN@HOST/DATABASE). Its login must own the database and may create roles; its password comes from ~/.pgpass, PGPASSFILE or PGPASSWORD.</source>
        <translation>Die leere Datenbank, in die veröffentlicht wird, als libpq-Verbindungszeichenkette oder URI (postgresql://ADMIN@HOST/DATABASE). Ihre Anmeldung muss die Datenbank besitzen und Rollen anlegen dürfen; ihr Passwort kommt aus ~/.pgpass, PGPASSFILE oder PGPASSWORD.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="26"/>
        <source>The new (or empty) folder for the people&apos;s password files, one PSEUDONYM.pgpass each (default: PROJECT.credentials beside the project).</source>
        <translation>Der neue (oder leere) Ordner für die Passwortdateien der Personen, je eine PSEUDONYM.pgpass (Standard: PROJECT.credentials neben dem Projekt).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="31"/>
        <source>The lead whose working file the project becomes (needed with several leads).</source>
        <translation>Die Leitung, deren Arbeitsdatei das Projekt wird (nötig bei mehreren Leitungen).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="40"/>
        <source>Create the team project of PROJECT on a PostgreSQL server: the schema, one login role per person with a random password (written to a password file per person), the row-level security that keeps coders blind, and every shared row. No password is stored in the project file.</source>
        <translation>Das Teamprojekt von PROJECT auf einem PostgreSQL-Server anlegen: das Schema, je Person eine Anmelderolle mit zufälligem Passwort (in eine Passwortdatei je Person geschrieben), die Sicherheit auf Zeilenebene, die Codierende blind hält, und jede gemeinsame Zeile. In der Projektdatei wird kein Passwort gespeichert.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="53"/>
        <source>name the database with --server URL.</source>
        <translation>nennen Sie die Datenbank mit --server URL.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="84"/>
        <source>Published %1 to %2 (server schema version %3): %4 articles, %5 annotations, %6 links, %7 article judgements, %8 gold decisions, %9 events.</source>
        <translation>%1 nach %2 veröffentlicht (Server-Schemaversion %3): %4 Artikel, %5 Annotationen, %6 Verknüpfungen, %7 Urteile auf Artikelebene, %8 Goldstandard-Entscheidungen, %9 Ereignisse.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="95"/>
        <source>One login per person; hand each person their own password file (mode 0600) and nothing else:</source>
        <translation>Eine Anmeldung je Person; geben Sie jeder Person ihre eigene Passwortdatei (Modus 0600) und sonst nichts:</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="102"/>
        <source>  (lead)</source>
        <translation>  (Leitung)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="111"/>
        <source>Your pseudonym in the team project.</source>
        <translation>Ihr Pseudonym im Teamprojekt.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="114"/>
        <source>The working file to write (a new file).</source>
        <translation>Die zu schreibende Arbeitsdatei (eine neue Datei).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="120"/>
        <source>The team project&apos;s database with your login role, as a libpq connection string or URI (postgresql://ROLE@HOST/DATABASE); the password from your password file (PGPASSFILE=PSEUDONYM.pgpass or ~/.pgpass).</source>
        <translation>Die Datenbank des Teamprojekts mit Ihrer Anmelderolle, als libpq-Verbindungszeichenkette oder URI (postgresql://ROLE@HOST/DATABASE); das Passwort aus Ihrer Passwortdatei (PGPASSFILE=PSEUDONYM.pgpass oder ~/.pgpass).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="125"/>
        <source>Write your working file of a team project: what your login role may read on the server (for a coder: the codebook, your articles and your own codings).</source>
        <translation>Ihre Arbeitsdatei eines Teamprojekts schreiben: was Ihre Anmelderolle auf dem Server lesen darf (für Codierende: das Codebuch, Ihre Artikel und Ihre eigenen Codierungen).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="133"/>
        <source>expected exactly one server URL.</source>
        <translation>genau eine Server-URL erwartet.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="136"/>
        <source>name yourself with --as PSEUDONYM.</source>
        <translation>nennen Sie sich mit --as PSEUDONYM.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="139"/>
        <source>name the working file with --out FILE.</source>
        <translation>nennen Sie die Arbeitsdatei mit --out DATEI.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="159"/>
        <source>Wrote %1, the working file of %2 from %3: %4 articles, %5 annotations, %6 links, %7 article judgements (through change %8).</source>
        <translation>%1 geschrieben, die Arbeitsdatei von %2 aus %3: %4 Artikel, %5 Annotationen, %6 Verknüpfungen, %7 Urteile auf Artikelebene (bis Änderung %8).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="179"/>
        <location filename="../app/cli/command_team.cpp" line="224"/>
        <source>Your team working file.</source>
        <translation>Ihre Team-Arbeitsdatei.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="181"/>
        <source>Push your changed codings to the team project&apos;s server and pull the ones you may see, once (assignments, spans, links, answers; coding time adds up). An object changed on both sides keeps the later version and is listed as a conflict for the lead.</source>
        <translation>Ihre geänderten Codierungen einmal an den Server des Teamprojekts senden und die abholen, die Sie sehen dürfen (Zuweisungen, Textstellen, Verknüpfungen, Antworten; Codierzeit wird addiert). Ein auf beiden Seiten geändertes Objekt behält die spätere Version und wird der Leitung als Konflikt gelistet.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="191"/>
        <location filename="../app/cli/command_team.cpp" line="234"/>
        <location filename="../app/cli/command_team_people.cpp" line="82"/>
        <source>expected exactly one working file.</source>
        <translation>genau eine Arbeitsdatei erwartet.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="206"/>
        <source>Synced with %1: %2 sent, %3 received, %4 conflicts (through change %5).</source>
        <translation>Mit %1 synchronisiert: %2 gesendet, %3 empfangen, %4 Konflikte (bis Änderung %5).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="226"/>
        <source>Show a working file&apos;s team project: its server, whose file it is, when it last synced and what the next sync would send. Reads the file only (works offline).</source>
        <translation>Das Teamprojekt einer Arbeitsdatei zeigen: seinen Server, wem die Datei gehört, wann sie zuletzt synchronisiert wurde und was die nächste Synchronisation senden würde. Liest nur die Datei (funktioniert offline).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="256"/>
        <source>Working file of %1 (%2) on %3, through change %4.</source>
        <translation>Arbeitsdatei von %1 (%2) auf %3, bis Änderung %4.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="258"/>
        <source>lead</source>
        <translation>Leitung</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="263"/>
        <source>Not synced since it was made.</source>
        <translation>Seit der Erstellung nicht synchronisiert.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="264"/>
        <source>Last synced %1.</source>
        <translation>Zuletzt synchronisiert %1.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="269"/>
        <source>Nothing waiting to be sent.</source>
        <translation>Nichts wartet auf das Senden.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_team.cpp" line="270"/>
        <source>%n change(s) waiting to be sent (%1).</source>
        <translation>
            <numerusform>%n Änderung wartet auf das Senden (%1).</numerusform>
            <numerusform>%n Änderungen warten auf das Senden (%1).</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_team.cpp" line="274"/>
        <source>%n conflict(s) from syncs wait for the lead.</source>
        <translation>
            <numerusform>%n Konflikt aus Synchronisationen wartet auf die Leitung.</numerusform>
            <numerusform>%n Konflikte aus Synchronisationen warten auf die Leitung.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="295"/>
        <source>Usage: fourfold-cli team SUBCOMMAND [options]</source>
        <translation>Aufruf: fourfold-cli team UNTERBEFEHL [Optionen]</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="296"/>
        <source>  publish   Create the team project of a project file on a PostgreSQL server.</source>
        <translation>  publish   Das Teamprojekt einer Projektdatei auf einem PostgreSQL-Server anlegen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="298"/>
        <source>  join      Write your working file of a team project from its server.</source>
        <translation>  join      Ihre Arbeitsdatei eines Teamprojekts von seinem Server schreiben.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="300"/>
        <source>  sync      Push and pull a working file&apos;s codings once.</source>
        <translation>  sync      Die Codierungen einer Arbeitsdatei einmal senden und abholen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="302"/>
        <source>  status    What a working file last synced and what waits to be sent.</source>
        <translation>  status    Was eine Arbeitsdatei zuletzt synchronisiert hat und was auf das Senden wartet.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="309"/>
        <source>unknown subcommand &quot;%1&quot;.</source>
        <translation>unbekannter Unterbefehl „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="38"/>
        <source>Import articles from text, HTML, JSON Lines or CSV files.</source>
        <translation>Artikel aus Text-, HTML-, JSON-Lines- oder CSV-Dateien importieren.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="41"/>
        <source>Show what a project holds: articles, units, coders, annotations.</source>
        <translation>Zeigen, was ein Projekt enthält: Artikel, Einheiten, Codierende, Annotationen.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="45"/>
        <source>Check a project file&apos;s integrity.</source>
        <translation>Die Integrität einer Projektdatei prüfen.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="47"/>
        <source>Inter-coder reliability of a matrix file or of a project&apos;s codings.</source>
        <translation>Intercoder-Reliabilität einer Matrixdatei oder der Codierungen eines Projekts.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="51"/>
        <source>Frames as clusters of articles by their frame elements (Ward, then k-means).</source>
        <translation>Frames als Cluster von Artikeln nach ihren Frame-Elementen (Ward, dann k-Means).</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="55"/>
        <source>Run an extractor (built-in baseline or external command) over a project&apos;s articles.</source>
        <translation>Einen Extraktor (eingebaute Baseline oder externer Befehl) über die Artikel eines Projekts laufen lassen.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="60"/>
        <source>Score an extractor run against gold or a coder.</source>
        <translation>Einen Extraktorlauf gegen den Goldstandard oder eine codierende Person bewerten.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="63"/>
        <source>Export gold, codings or a run as JSON Lines, W3C Web Annotation, IOB2 or CSV.</source>
        <translation>Goldstandard, Codierungen oder einen Lauf als JSON Lines, W3C Web Annotation, IOB2 oder CSV exportieren.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="67"/>
        <source>Write the reliability report (HTML or PDF).</source>
        <translation>Den Reliabilitätsbericht schreiben (HTML oder PDF).</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="69"/>
        <source>Assign articles to coders and draw the reliability subsample.</source>
        <translation>Artikel Codierenden zuweisen und die Reliabilitäts-Teilstichprobe ziehen.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="73"/>
        <source>List codebook versions, add one from a JSON file, and show what changed.</source>
        <translation>Codebuchversionen auflisten, eine aus einer JSON-Datei hinzufügen und zeigen, was sich geändert hat.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="77"/>
        <source>Write a coder copy holding only that coder&apos;s articles and annotations.</source>
        <translation>Eine Kopie für Codierende schreiben, die nur die Artikel und Annotationen dieser Person enthält.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="81"/>
        <source>Merge returned coder copies into the project.</source>
        <translation>Zurückgegebene Kopien für Codierende in das Projekt zusammenführen.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="83"/>
        <source>Team projects on a PostgreSQL server: publish a project, join one (team publish, team join).</source>
        <translation>Teamprojekte auf einem PostgreSQL-Server: ein Projekt veröffentlichen, einem beitreten (team publish, team join).</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="88"/>
        <source>List, add, rename, disable and enable the people of a project (by pseudonym).</source>
        <translation>Die Personen eines Projekts auflisten, hinzufügen, umbenennen, deaktivieren und aktivieren (nach Pseudonym).</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="92"/>
        <source>Build the demo project from its source files.</source>
        <translation>Das Demoprojekt aus seinen Quelldateien erstellen.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="100"/>
        <source>Usage: fourfold-cli COMMAND [options] [arguments]</source>
        <translation>Aufruf: fourfold-cli BEFEHL [Optionen] [Argumente]</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="102"/>
        <source>Commands:</source>
        <translation>Befehle:</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="108"/>
        <source>Run &quot;fourfold-cli COMMAND --help&quot; for a command&apos;s options.</source>
        <translation>„fourfold-cli BEFEHL --help“ zeigt die Optionen eines Befehls.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="163"/>
        <source>fourfold-cli: unknown command &quot;%1&quot;.</source>
        <translation>fourfold-cli: unbekannter Befehl „%1“.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="164"/>
        <source>Run &quot;fourfold-cli --help&quot; for the list of commands.</source>
        <translation>„fourfold-cli --help“ zeigt die Liste der Befehle.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="30"/>
        <source>Add a person with this name (kept in the project files, never printed).</source>
        <translation>Eine Person mit diesem Namen hinzufügen (bleibt in den Projektdateien, wird nie ausgegeben).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="33"/>
        <source>The new person&apos;s pseudonym, unique in the project.</source>
        <translation>Das Pseudonym der neuen Person, eindeutig im Projekt.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="38"/>
        <source>A new lead&apos;s passphrase for the desk: the first line of FILE (- for standard input).</source>
        <translation>Die Passphrase einer neuen Leitung für den Arbeitsplatz: die erste Zeile von FILE (- für die Standardeingabe).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="42"/>
        <source>Disable the person with pseudonym P: their codings stay; their login may no longer reach the server.</source>
        <translation>Die Person mit dem Pseudonym P deaktivieren: ihre Codierungen bleiben; ihre Anmeldung erreicht den Server nicht mehr.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="48"/>
        <source>The lead making the change (your pseudonym in the working file).</source>
        <translation>Die Leitung, die die Änderung vornimmt (Ihr Pseudonym in der Arbeitsdatei).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="55"/>
        <source>The administrator&apos;s login that may create roles, as a libpq connection string or URI (default: the working file&apos;s server); its password comes from ~/.pgpass, PGPASSFILE or PGPASSWORD.</source>
        <translation>Die Anmeldung der Administration, die Rollen anlegen darf, als libpq-Verbindungszeichenfolge oder URI (Standard: der Server der Arbeitsdatei); ihr Passwort kommt aus ~/.pgpass, PGPASSFILE oder PGPASSWORD.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="60"/>
        <source>The folder for a new person&apos;s password file (default: FILE.credentials beside the working file; created private if new).</source>
        <translation>Der Ordner für die Passwortdatei einer neuen Person (Standard: FILE.credentials neben der Arbeitsdatei; neu angelegt nur für Sie lesbar).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="67"/>
        <source>The lead&apos;s working file of the team project.</source>
        <translation>Die Arbeitsdatei der Leitung im Teamprojekt.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="69"/>
        <source>Add a person to a running team project (in the working file, on the server and as a login role with its own password file), or disable or enable one. Needs a lead of the project and the administrator&apos;s login.</source>
        <translation>Einem laufenden Teamprojekt eine Person hinzufügen (in der Arbeitsdatei, auf dem Server und als Anmelderolle mit eigener Passwortdatei) oder eine deaktivieren oder aktivieren. Erfordert eine Leitung des Projekts und die Anmeldung der Administration.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="80"/>
        <source>give exactly one of --add, --disable and --enable.</source>
        <translation>geben Sie genau eines von --add, --disable und --enable an.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="157"/>
        <source>Added %1 with the login %2; the password is in %3 (hand it to them alone).</source>
        <translation>%1 mit der Anmeldung %2 hinzugefügt; das Passwort steht in %3 (nur dieser Person geben).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="161"/>
        <source>Enabled %1: the login %2 may log in again.</source>
        <translation>%1 aktiviert: die Anmeldung %2 darf sich wieder anmelden.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="164"/>
        <source>Disabled %1: the login %2 may no longer log in; their codings stay.</source>
        <translation>%1 deaktiviert: die Anmeldung %2 darf sich nicht mehr anmelden; die Codierungen bleiben.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="304"/>
        <source>  people    Add a person to a running team project, or disable one.</source>
        <translation>  people    Einem laufenden Teamprojekt eine Person hinzufügen oder eine deaktivieren.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="253"/>
        <source>Withdraw the committed subsample of this phase (reliability or pilot) while nobody has coded any of its assignments yet.</source>
        <translation>Die gespeicherte Teilstichprobe dieser Phase (reliability oder pilot) zurückziehen, solange noch niemand eine ihrer Zuweisungen codiert hat.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_assign.cpp" line="471"/>
        <source>The %1 subsample is withdrawn: %n assignment(s) removed.</source>
        <translation>
            <numerusform>Die Teilstichprobe der Phase %1 ist zurückgezogen: %n Zuweisung entfernt.</numerusform>
            <numerusform>Die Teilstichprobe der Phase %1 ist zurückgezogen: %n Zuweisungen entfernt.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="584"/>
        <source>Frames (k = %1, the largest mean silhouette: the three indices point at different k)</source>
        <translation>Frames (k = %1, die größte mittlere Silhouette: die drei Indizes zeigen auf verschiedene k)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="286"/>
        <source>The login that owns the team project&apos;s schema, as a libpq connection string: the administrator who published it.</source>
        <translation>Die Anmeldung, der das Schema des Teamprojekts gehört, als libpq-Verbindungszeichenkette: die Administration, die es veröffentlicht hat.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="294"/>
        <source>Bring a team project&apos;s server to the schema this version of Fourfold works with, in one transaction (a project published by an older version: its syncs and joins are refused until then).</source>
        <translation>Bringt den Server eines Teamprojekts in einer Transaktion auf das Schema, mit dem diese Version von Fourfold arbeitet (ein von einer älteren Version veröffentlichtes Projekt: seine Synchronisierungen und Beitritte werden bis dahin abgelehnt).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="303"/>
        <source>expected --server and no other argument.</source>
        <translation>erwartet --server und kein anderes Argument.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="313"/>
        <source>The team project on %1 has server schema version %2 already.</source>
        <translation>Das Teamprojekt auf %1 hat bereits die Server-Schemaversion %2.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="317"/>
        <source>Upgraded the team project on %1 from server schema version %2 to %3.</source>
        <translation>Das Teamprojekt auf %1 wurde von Server-Schemaversion %2 auf %3 aktualisiert.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="352"/>
        <source>  upgrade   Bring a team project&apos;s server to this version&apos;s schema.</source>
        <translation>  upgrade   Bringt den Server eines Teamprojekts auf das Schema dieser Version.</translation>
    </message>
</context>
<context>
    <name>fourfold::AnswerPanel</name>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="49"/>
        <source>Answers to article-level items</source>
        <translation>Antworten auf Items auf Artikelebene</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="62"/>
        <source>Gold answer</source>
        <translation>Goldstandard-Antwort</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="63"/>
        <source>Gold &amp;answer:</source>
        <translation>Goldstandard-&amp;Antwort:</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="65"/>
        <source>Why this answer, for the method section</source>
        <translation>Warum diese Antwort, für den Methodenteil</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="66"/>
        <source>Ra&amp;tionale:</source>
        <translation>Begrün&amp;dung:</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="69"/>
        <source>&amp;Decide gold answer</source>
        <translation>Goldstandard-Antwort &amp;entscheiden</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="70"/>
        <source>Put the chosen value into gold as the answer to this item; it replaces a gold answer decided before</source>
        <translation>Den gewählten Wert als Antwort auf dieses Item in den Goldstandard übernehmen; er ersetzt eine zuvor entschiedene Goldstandard-Antwort</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="72"/>
        <source>&amp;Withdraw gold answer</source>
        <translation>Goldstandard-Antwort &amp;zurückziehen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="73"/>
        <source>Withdraw the gold answer to this item</source>
        <translation>Die Goldstandard-Antwort auf dieses Item zurückziehen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="97"/>
        <source>No article open.</source>
        <translation>Kein Artikel geöffnet.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="140"/>
        <source>Item</source>
        <translation>Item</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="141"/>
        <source>Agreement</source>
        <translation>Übereinstimmung</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="141"/>
        <source>Gold</source>
        <translation>Goldstandard</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="153"/>
        <source>%1 has not answered</source>
        <translation>%1 hat nicht geantwortet</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="158"/>
        <source>no answers</source>
        <translation>keine Antworten</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="161"/>
        <source>✓ agree</source>
        <translation>✓ übereinstimmend</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="164"/>
        <source>agree, not all answered</source>
        <translation>übereinstimmend, nicht alle geantwortet</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="167"/>
        <source>≠ differ</source>
        <translation>≠ abweichend</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="177"/>
        <source>Decided by %1.</source>
        <translation>Entschieden von %1.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="178"/>
        <source>Decided by %1: “%2”</source>
        <translation>Entschieden von %1: „%2“</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="183"/>
        <source>The codebook has no article-level items.</source>
        <translation>Das Codebuch hat keine Items auf Artikelebene.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="248"/>
        <source>%1 (given by %2)</source>
        <translation>%1 (von %2)</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="248"/>
        <source>, </source>
        <translation>, </translation>
    </message>
</context>
<context>
    <name>fourfold::ArticleListModel</name>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="50"/>
        <source>done</source>
        <translation>erledigt</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="52"/>
        <source>in progress</source>
        <translation>in Arbeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="53"/>
        <source>not started</source>
        <translation>nicht begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="91"/>
        <source>%1
Near copy of %2</source>
        <translation>%1
Beinahe-Kopie von %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="124"/>
        <source>Title</source>
        <translation>Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="126"/>
        <source>Outlet</source>
        <translation>Medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="128"/>
        <source>Lang.</source>
        <translation>Spr.</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="132"/>
        <source>Status</source>
        <translation>Status</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="134"/>
        <source>Time</source>
        <translation>Zeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="130"/>
        <source>Characters</source>
        <translation>Zeichen</translation>
    </message>
</context>
<context>
    <name>fourfold::BackgroundSync</name>
    <message numerus="yes">
        <location filename="../app/desktop/team/background_sync.cpp" line="104"/>
        <source>offline — %n change(s) waiting</source>
        <translation>
            <numerusform>offline — %n Änderung wartet</numerusform>
            <numerusform>offline — %n Änderungen warten</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/team/background_sync.cpp" line="106"/>
        <source>syncing…</source>
        <translation>wird synchronisiert…</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/team/background_sync.cpp" line="110"/>
        <source>synced %n s ago</source>
        <translation>
            <numerusform>vor %n s synchronisiert</numerusform>
            <numerusform>vor %n s synchronisiert</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/team/background_sync.cpp" line="112"/>
        <source>conflict — lead decides</source>
        <translation>Konflikt — die Leitung entscheidet</translation>
    </message>
</context>
<context>
    <name>fourfold::CodebookEditor</name>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="79"/>
        <source>nominal</source>
        <translation>nominalskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="81"/>
        <source>ordinal</source>
        <translation>ordinalskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="83"/>
        <source>interval</source>
        <translation>intervallskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="85"/>
        <source>ratio</source>
        <translation>verhältnisskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="274"/>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="344"/>
        <source>Codebook</source>
        <translation>Codebuch</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="281"/>
        <source>&amp;Name:</source>
        <translation>&amp;Name:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="317"/>
        <source>Article-level items</source>
        <translation>Items auf Artikelebene</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="322"/>
        <source>&amp;Undo:</source>
        <translation>&amp;Rückgängig:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="324"/>
        <source>&amp;Redo:</source>
        <translation>&amp;Wiederholen:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="338"/>
        <source>&amp;Save as new version…</source>
        <translation>Als neue Version &amp;speichern…</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="344"/>
        <source>Codebook (changed)</source>
        <translation>Codebuch (geändert)</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="348"/>
        <source>Edit the codebook&apos;s name</source>
        <translation>Namen des Codebuchs bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="409"/>
        <source>Level of measurement: it decides which agreement coefficient compares the values (Krippendorff 2004, ch. 11).</source>
        <translation>Skalenniveau: es entscheidet, welcher Übereinstimmungskoeffizient die Werte vergleicht (Krippendorff 2004, Kap. 11).</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="425"/>
        <source>&amp;Label:</source>
        <translation>&amp;Bezeichnung:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="428"/>
        <source>&amp;Definition:</source>
        <translation>&amp;Definition:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="142"/>
        <source>One decision rule per paragraph (an empty line between two).</source>
        <translation>Eine Entscheidungsregel je Absatz (eine Leerzeile dazwischen).</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="431"/>
        <source>Decision &amp;rules:</source>
        <translation>Entscheidungs&amp;regeln:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="147"/>
        <source>One example per paragraph (an empty line between two).</source>
        <translation>Ein Beispiel je Absatz (eine Leerzeile dazwischen).</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="154"/>
        <source>Base language</source>
        <translation>Basissprache</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="286"/>
        <source>Texts &amp;in:</source>
        <translation>Te&amp;xte in:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="290"/>
        <source>The language whose texts the fields show and edit. Coders whose program speaks that language read these texts.</source>
        <translation>Die Sprache, deren Texte die Felder zeigen und bearbeiten. Codierende, deren Programm diese Sprache spricht, lesen diese Texte.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="434"/>
        <source>E&amp;xamples:</source>
        <translation>&amp;Beispiele:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="437"/>
        <source>Attributes of %1 spans</source>
        <translation>Merkmale von %1-Textstellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="444"/>
        <source>&amp;Add attribute</source>
        <translation>Merkmal &amp;hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="445"/>
        <source>Re&amp;move attribute</source>
        <translation>Merkmal &amp;entfernen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="454"/>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="591"/>
        <source>&amp;Key:</source>
        <translation>&amp;Schlüssel:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="457"/>
        <source>La&amp;bel:</source>
        <translation>Be&amp;zeichnung:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="459"/>
        <source>closed list of values</source>
        <translation>geschlossene Werteliste</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="460"/>
        <source>free text</source>
        <translation>Freitext</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="461"/>
        <source>&amp;Type:</source>
        <translation>&amp;Typ:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="463"/>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="598"/>
        <source>Le&amp;vel:</source>
        <translation>&amp;Niveau:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="465"/>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="595"/>
        <source>One value per line, in order.</source>
        <translation>Ein Wert je Zeile, in Reihenfolge.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="467"/>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="596"/>
        <source>&amp;Values:</source>
        <translation>&amp;Werte:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="489"/>
        <source>Edit the label of %1</source>
        <translation>Bezeichnung von %1 bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="496"/>
        <source>Edit the definition of %1</source>
        <translation>Definition von %1 bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="503"/>
        <source>Edit the decision rules of %1</source>
        <translation>Entscheidungsregeln von %1 bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="510"/>
        <source>Edit the examples of %1</source>
        <translation>Beispiele von %1 bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="516"/>
        <source>Edit an attribute&apos;s key</source>
        <translation>Schlüssel eines Merkmals bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="529"/>
        <source>Edit an attribute&apos;s label</source>
        <translation>Bezeichnung eines Merkmals bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="538"/>
        <source>Change an attribute&apos;s type</source>
        <translation>Typ eines Merkmals ändern</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="546"/>
        <source>Change an attribute&apos;s level</source>
        <translation>Niveau eines Merkmals ändern</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="551"/>
        <source>Edit an attribute&apos;s values</source>
        <translation>Werte eines Merkmals bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="572"/>
        <source>Questions answered once per article, such as which function dominates it.</source>
        <translation>Fragen, die einmal je Artikel beantwortet werden, etwa welche Funktion ihn dominiert.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="579"/>
        <source>&amp;Add item</source>
        <translation>Item &amp;hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="580"/>
        <source>Re&amp;move item</source>
        <translation>Item &amp;entfernen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="593"/>
        <source>&amp;Question:</source>
        <translation>&amp;Frage:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="615"/>
        <source>Edit an item&apos;s key</source>
        <translation>Schlüssel eines Items bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="629"/>
        <source>Edit an item&apos;s question</source>
        <translation>Frage eines Items bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="637"/>
        <source>Edit an item&apos;s values</source>
        <translation>Werte eines Items bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="643"/>
        <source>Change an item&apos;s level</source>
        <translation>Niveau eines Items ändern</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="689"/>
        <source>%1 (%2)</source>
        <translation>%1 (%2)</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="733"/>
        <source>“%1” is not a language code: a codebook names a language by two or three lower-case letters (ISO 639), such as “fr” or “pl”.</source>
        <translation>„%1“ ist kein Sprachcode: Ein Codebuch benennt eine Sprache mit zwei oder drei Kleinbuchstaben (ISO 639), etwa „fr“ oder „pl“.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="749"/>
        <source>Add a language</source>
        <translation>Sprache hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="750"/>
        <source>Language code (ISO 639: two or three lower-case letters, such as “fr” or “pl”):</source>
        <translation>Sprachcode (ISO 639: zwei oder drei Kleinbuchstaben, etwa „fr“ oder „pl“):</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="766"/>
        <source>Add a language…</source>
        <translation>Sprache hinzufügen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="770"/>
        <source>Showing the texts in %1. A field left empty shows the base text in grey, and coders read that one. Keys, values, levels and the lists of attributes and items are the same in every language: change them in the base language.</source>
        <translation>Angezeigt werden die Texte in %1. Ein leer gelassenes Feld zeigt den Text der Basissprache in Grau, und diesen lesen die Codierenden. Schlüssel, Werte, Niveaus und die Listen der Merkmale und Items sind in jeder Sprache dieselben: Ändern Sie sie in der Basissprache.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="828"/>
        <source>Editing a draft of version %1; saving makes version %2.</source>
        <translation>Sie bearbeiten einen Entwurf von Version %1; Speichern erstellt Version %2.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="933"/>
        <source>Add an item</source>
        <translation>Ein Item hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="942"/>
        <source>Add an attribute to %1</source>
        <translation>%1 ein Merkmal hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="962"/>
        <source>Remove the item “%1”</source>
        <translation>Das Item „%1“ entfernen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="976"/>
        <source>Remove the attribute “%1”</source>
        <translation>Das Merkmal „%1“ entfernen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1066"/>
        <source>The translation of this text may need updating too: %1 (choose the language under “Texts in”).</source>
        <translation>Die Übersetzung dieses Textes muss vielleicht ebenfalls angepasst werden: %1 (wählen Sie die Sprache unter „Texte in“).</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1106"/>
        <source>Fix the marked field first.</source>
        <translation>Korrigieren Sie zuerst das markierte Feld.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1168"/>
        <source>Version %1 was added since this draft was started from version %2; nothing was saved. Close the editor and open it again to edit the new version.</source>
        <translation>Version %1 wurde hinzugefügt, seit dieser Entwurf von Version %2 aus begonnen wurde; nichts wurde gespeichert. Schließen Sie den Editor und öffnen Sie ihn erneut, um die neue Version zu bearbeiten.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1182"/>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1229"/>
        <source>The codebook was not saved: the marked field needs a change first.</source>
        <translation>Das Codebuch wurde nicht gespeichert: das markierte Feld muss zuerst geändert werden.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1187"/>
        <source>Nothing was saved: the draft is the same as version %1.</source>
        <translation>Nichts wurde gespeichert: der Entwurf ist identisch mit Version %1.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1214"/>
        <source>Codebook version %1 saved. %n annotation(s) made under an older version are now outdated; %2 of them belong to a function that changed and need a re-check.</source>
        <translation>
            <numerusform>Codebuchversion %1 gespeichert. %n unter einer älteren Version erstellte Annotation ist jetzt veraltet; %2 davon gehören zu einer geänderten Funktion und müssen erneut geprüft werden.</numerusform>
            <numerusform>Codebuchversion %1 gespeichert. %n unter einer älteren Version erstellte Annotationen sind jetzt veraltet; %2 davon gehören zu einer geänderten Funktion und müssen erneut geprüft werden.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1233"/>
        <source>Save as version %1</source>
        <translation>Als Version %1 speichern</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1235"/>
        <source>What changes against version %1:</source>
        <translation>Was sich gegenüber Version %1 ändert:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1241"/>
        <source>&amp;Note (what changed and why):</source>
        <translation>&amp;Notiz (was sich geändert hat und warum):</translation>
    </message>
</context>
<context>
    <name>fourfold::CodebookPanel</name>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="22"/>
        <source>nominal</source>
        <translation>nominalskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="24"/>
        <source>ordinal</source>
        <translation>ordinalskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="26"/>
        <source>interval</source>
        <translation>intervallskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="28"/>
        <source>ratio</source>
        <translation>verhältnisskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="56"/>
        <source>Codebook</source>
        <translation>Codebuch</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="58"/>
        <source>Framing function</source>
        <translation>Framing-Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="64"/>
        <source>Codebook entry</source>
        <translation>Codebucheintrag</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="106"/>
        <source>No codebook loaded.</source>
        <translation>Kein Codebuch geladen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="119"/>
        <source>%1, version %2</source>
        <translation>%1, Version %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="127"/>
        <source>Decision rules</source>
        <translation>Entscheidungsregeln</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="134"/>
        <source>Examples</source>
        <translation>Beispiele</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="139"/>
        <source>Attributes</source>
        <translation>Merkmale</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="142"/>
        <source>None: marking the span is all this function asks for.</source>
        <translation>Keine: Für diese Funktion genügt es, die Textstelle zu markieren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="147"/>
        <source>free text</source>
        <translation>Freitext</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="148"/>
        <source>%1 (%2)</source>
        <translation>%1 (%2)</translation>
    </message>
</context>
<context>
    <name>fourfold::CoderDialog</name>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="61"/>
        <source>Who is coding?</source>
        <translation>Wer codiert?</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="23"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="221"/>
        <source>lead</source>
        <translation>Leitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="23"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="220"/>
        <source>coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="64"/>
        <source>&lt;b&gt;%1&lt;/b&gt;&lt;br&gt;Choose who you are. A coder sees only their own spans and the articles assigned to them; a lead sees every article and gives their passphrase.</source>
        <translation>&lt;b&gt;%1&lt;/b&gt;&lt;br&gt;Wählen Sie aus, wer Sie sind. Codierende sehen nur ihre eigenen Textstellen und die ihnen zugewiesenen Artikel; die Leitung sieht alle Artikel und gibt ihre Passphrase ein.</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="71"/>
        <source>People</source>
        <translation>Personen</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="79"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="228"/>
        <source>Repeat it:</source>
        <translation>Wiederholen Sie sie:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="89"/>
        <source>Start coding</source>
        <translation>Codierung starten</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="90"/>
        <source>Add a person…</source>
        <translation>Person hinzufügen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="171"/>
        <source>%1 has no passphrase yet. Set one (at least %2 characters):</source>
        <translation>%1 hat noch keine Passphrase. Legen Sie eine fest (mindestens %2 Zeichen):</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="174"/>
        <source>Passphrase of %1:</source>
        <translation>Passphrase von %1:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="190"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="276"/>
        <source>The two passphrases differ; type the same one twice.</source>
        <translation>Die beiden Passphrasen unterscheiden sich; geben Sie zweimal dieselbe ein.</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="208"/>
        <source>Add a person</source>
        <translation>Person hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="217"/>
        <source>e.g. C04 — the only name written to exports</source>
        <translation>z.&#xa0;B. C04 — der einzige Name, der in Exporte geschrieben wird</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="224"/>
        <source>Name:</source>
        <translation>Name:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="225"/>
        <source>Pseudonym:</source>
        <translation>Pseudonym:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="226"/>
        <source>Role:</source>
        <translation>Rolle:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="227"/>
        <source>New lead&apos;s passphrase:</source>
        <translation>Passphrase der neuen Leitung:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="240"/>
        <source>Only a lead adds people. Choose your lead entry and give its passphrase.</source>
        <translation>Nur die Leitung fügt Personen hinzu. Wählen Sie Ihren Leitungseintrag und geben Sie dessen Passphrase ein.</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="243"/>
        <source>Added by:</source>
        <translation>Hinzugefügt von:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="244"/>
        <source>Your passphrase:</source>
        <translation>Ihre Passphrase:</translation>
    </message>
</context>
<context>
    <name>fourfold::CoderLegend</name>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="15"/>
        <source>Coders of the spans shown</source>
        <translation>Codierende der gezeigten Textstellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="21"/>
        <source>Each span&apos;s badge carries its coder&apos;s pseudonym after the letter.</source>
        <translation>Das Kennzeichen jeder Textstelle trägt nach dem Buchstaben das Pseudonym der oder des Codierenden.</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="23"/>
        <source>Show the spans of</source>
        <translation>Textstellen zeigen von</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="24"/>
        <source>&amp;Show spans of:</source>
        <translation>Textstellen &amp;zeigen von:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="46"/>
        <source>All coders</source>
        <translation>Alle Codierenden</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="70"/>
        <source>unknown</source>
        <translation>unbekannt</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/coder_legend.cpp" line="76"/>
        <source>&lt;b&gt;%1&lt;/b&gt; %n span(s)</source>
        <translation>
            <numerusform>&lt;b&gt;%1&lt;/b&gt; %n Textstelle</numerusform>
            <numerusform>&lt;b&gt;%1&lt;/b&gt; %n Textstellen</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="82"/>
        <source>No coder has spans on this article.</source>
        <translation>Niemand hat in diesem Artikel Textstellen codiert.</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="83"/>
        <source>Spans by: %1</source>
        <translation>Textstellen von: %1</translation>
    </message>
</context>
<context>
    <name>fourfold::CodingSession</name>
    <message>
        <location filename="../app/desktop/coding_session.cpp" line="156"/>
        <source>“%1” (%2), similarity %3</source>
        <translation>„%1“ (%2), Ähnlichkeit %3</translation>
    </message>
    <message>
        <location filename="../app/desktop/coding_session.cpp" line="250"/>
        <source>%1 is read-only: you can read, compare and compute, but nothing is saved. To code, copy the file to a folder you may write to and open the copy.</source>
        <translation>%1 ist schreibgeschützt: Sie können lesen, vergleichen und berechnen, aber nichts wird gespeichert. Um zu codieren, kopieren Sie die Datei in einen Ordner, in den Sie schreiben dürfen, und öffnen Sie die Kopie.</translation>
    </message>
</context>
<context>
    <name>fourfold::ComparisonView</name>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="35"/>
        <source>Coders side by side</source>
        <translation>Codierende nebeneinander</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="187"/>
        <source>only one coder has a span here</source>
        <translation>nur eine codierende Person hat hier eine Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="188"/>
        <source>not every coder has a span here</source>
        <translation>nicht alle Codierenden haben hier eine Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="190"/>
        <source>different functions</source>
        <translation>unterschiedliche Funktionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="192"/>
        <source>different boundaries</source>
        <translation>unterschiedliche Grenzen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="194"/>
        <source>different attributes</source>
        <translation>unterschiedliche Merkmale</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="195"/>
        <source>The coders agree here.</source>
        <translation>Die Codierenden stimmen hier überein.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="196"/>
        <source>Disagreement: %1.</source>
        <translation>Abweichung: %1.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="196"/>
        <source>; </source>
        <translation>; </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="198"/>
        <source>Decided.</source>
        <translation>Entschieden.</translation>
    </message>
</context>
<context>
    <name>fourfold::ComparisonWindow</name>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="95"/>
        <source>Compare coders and decide gold — %1</source>
        <translation>Codierende vergleichen und Goldstandard entscheiden — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="97"/>
        <source>Only a lead compares coders and decides the gold standard. Open the project as a lead to use this window.</source>
        <translation>Nur die Leitung vergleicht Codierende und entscheidet über den Goldstandard. Öffnen Sie das Projekt als Leitung, um dieses Fenster zu verwenden.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="121"/>
        <source>Nothing to compare yet. An article comes here once at least two coders have coded it and marked it done (or tick “Articles in progress” above). Plan double coding in Lead → Study design; the progress board shows who is done.</source>
        <translation>Noch nichts zu vergleichen. Ein Artikel erscheint hier, sobald mindestens zwei Codierende ihn codiert und als erledigt markiert haben (oder setzen Sie oben „Artikel in Bearbeitung“). Planen Sie Doppelcodierung unter Leitung → Studiendesign; die Fortschrittsübersicht zeigt, wer fertig ist.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="183"/>
        <source>Articles to adjudicate</source>
        <translation>Zu entscheidende Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="202"/>
        <source>Margin: ∅ a coder has no span here · ≠ different functions · ↔ different boundaries · ≈ different attributes · ✓ decided. Lanes under each line: problem (solid), cause (dashed), evaluation (dotted), remedy (dash-dot). Hatched: this coder has no span in the passage.</source>
        <translation>Rand: ∅ eine codierende Person hat hier keine Textstelle · ≠ unterschiedliche Funktionen · ↔ unterschiedliche Grenzen · ≈ unterschiedliche Merkmale · ✓ entschieden. Spuren unter jeder Zeile: Problem (durchgezogen), Ursache (gestrichelt), Bewertung (gepunktet), Lösung (Strich-Punkt). Schraffiert: diese codierende Person hat in der Passage keine Textstelle.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="239"/>
        <source>Who</source>
        <translation>Wer</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="239"/>
        <source>Span</source>
        <translation>Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="239"/>
        <source>Decision</source>
        <translation>Entscheidung</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="244"/>
        <source>Spans of the passage</source>
        <translation>Textstellen der Passage</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="255"/>
        <source>&amp;Rationale (optional, kept with the decision):</source>
        <translation>&amp;Begründung (optional, wird mit der Entscheidung gespeichert):</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="257"/>
        <source>Why this decision, for the method section</source>
        <translation>Warum diese Entscheidung, für den Methodenteil</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="184"/>
        <source>Articles coded by several coders, most undecided disagreements first when sorted; the order is kept while you decide until you re-sort. Open: undecided disagreements; Agreed: passages all coders agree on that are not yet in gold.</source>
        <translation>Von mehreren Codierenden codierte Artikel, sortiert die mit den meisten nicht entschiedenen Abweichungen zuerst; während Sie entscheiden, bleibt die Reihenfolge, bis Sie neu sortieren. Offen: nicht entschiedene Abweichungen; Übereinstimmend: Passagen, in denen alle Codierenden übereinstimmen und die noch nicht im Goldstandard sind.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="275"/>
        <source>Keys: N / P next and previous disagreement, %1 / %2 next and previous article, %3 re-sort the queue; A accept the chosen span, M merge the chosen spans, E edit, R reject, W withdraw a gold span; %4 accept all agreed; %5 rationale; %6 undo; %7 every key.</source>
        <translation>Tasten: N / P nächste und vorherige Abweichung, %1 / %2 nächster und vorheriger Artikel, %3 Warteschlange neu sortieren; A gewählte Textstelle übernehmen, M gewählte Textstellen vereinen, E bearbeiten, R verwerfen, W Goldstandard-Textstelle zurückziehen; %4 alle übereinstimmenden übernehmen; %5 Begründung; %6 rückgängig; %7 alle Tasten.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="312"/>
        <source>Comparison</source>
        <translation>Vergleich</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="326"/>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="684"/>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="744"/>
        <source>, </source>
        <translation>, </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="332"/>
        <source>Function: </source>
        <translation>Funktion: </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="334"/>
        <source>All functions</source>
        <translation>Alle Funktionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="337"/>
        <source>Function filter</source>
        <translation>Funktionsfilter</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="343"/>
        <source>  Coders: </source>
        <translation>  Codierende: </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="345"/>
        <source>All coders</source>
        <translation>Alle Codierenden</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="352"/>
        <source>%1 and %2</source>
        <translation>%1 und %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="354"/>
        <source>Coder pair filter</source>
        <translation>Filter nach Codierpaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="360"/>
        <source>Show decided</source>
        <translation>Entschiedene zeigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="361"/>
        <source>Also step through disagreements already decided</source>
        <translation>Auch bereits entschiedene Abweichungen durchgehen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="364"/>
        <source>Articles in progress</source>
        <translation>Artikel in Bearbeitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="365"/>
        <source>Also compare coders on articles they have started but not yet marked done</source>
        <translation>Codierer auch bei Artikeln vergleichen, die sie begonnen, aber noch nicht als fertig markiert haben</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="367"/>
        <source>Show articles in progress</source>
        <translation>Artikel in Bearbeitung zeigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="375"/>
        <source>Previous</source>
        <translation>Zurück</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="376"/>
        <source>Previous undecided disagreement</source>
        <translation>Vorherige nicht entschiedene Abweichung</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="377"/>
        <source>Next</source>
        <translation>Weiter</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="378"/>
        <source>Next undecided disagreement</source>
        <translation>Nächste nicht entschiedene Abweichung</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="379"/>
        <source>Previous article</source>
        <translation>Vorheriger Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="380"/>
        <source>Previous article in the queue</source>
        <translation>Vorheriger Artikel in der Warteschlange</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="386"/>
        <source>Next article</source>
        <translation>Nächster Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="386"/>
        <source>Next article in the queue</source>
        <translation>Nächster Artikel in der Warteschlange</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="391"/>
        <source>Re-sort queue</source>
        <translation>Warteschlange neu sortieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="392"/>
        <source>Sort the queue again, most undecided disagreements first; until then it keeps its order while you decide</source>
        <translation>Die Warteschlange neu sortieren, die meisten nicht entschiedenen Abweichungen zuerst; bis dahin behält sie ihre Reihenfolge, während Sie entscheiden</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="401"/>
        <source>Accept</source>
        <translation>Übernehmen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="402"/>
        <source>Accept the chosen coder&apos;s span into gold</source>
        <translation>Die Textstelle der gewählten codierenden Person in den Goldstandard übernehmen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="403"/>
        <source>Merge</source>
        <translation>Vereinen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="404"/>
        <source>Put one span covering the chosen spans into gold</source>
        <translation>Eine Textstelle, die die gewählten Textstellen umfasst, in den Goldstandard aufnehmen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="405"/>
        <source>Edit…</source>
        <translation>Bearbeiten…</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="406"/>
        <source>Decide a gold span with a function and boundaries of your own</source>
        <translation>Eine Goldstandard-Textstelle mit eigener Funktion und eigenen Grenzen festlegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="408"/>
        <source>Reject</source>
        <translation>Verwerfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="409"/>
        <source>Record that the chosen spans do not belong in gold</source>
        <translation>Festhalten, dass die gewählten Textstellen nicht in den Goldstandard gehören</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="410"/>
        <source>Withdraw gold</source>
        <translation>Zurückziehen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="411"/>
        <source>Withdraw the chosen gold span</source>
        <translation>Die gewählte Goldstandard-Textstelle zurückziehen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="412"/>
        <source>Accept all agreed</source>
        <translation>Übereinstimmende übernehmen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="413"/>
        <source>Accept every span all coders of the article agree on</source>
        <translation>Jede Textstelle übernehmen, in der alle Codierenden des Artikels übereinstimmen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="419"/>
        <source>Undo</source>
        <translation>Rückgängig</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="421"/>
        <source>Redo</source>
        <translation>Wiederholen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="435"/>
        <source>Keys of the comparison window</source>
        <translation>Tasten des Vergleichsfensters</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/compare/comparison_window.cpp" line="489"/>
        <source>%n article(s) to adjudicate</source>
        <translation>
            <numerusform>%n Artikel zu entscheiden</numerusform>
            <numerusform>%n Artikel zu entscheiden</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="497"/>
        <source>Queue sorted again: most undecided disagreements first.</source>
        <translation>Warteschlange neu sortiert: die meisten nicht entschiedenen Abweichungen zuerst.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="579"/>
        <source>Gold (%1)</source>
        <translation>Goldstandard (%1)</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="579"/>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="736"/>
        <source>Gold</source>
        <translation>Goldstandard</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="640"/>
        <source>No undecided disagreement left in this article. %1 opens the next article.</source>
        <translation>Keine nicht entschiedene Abweichung mehr in diesem Artikel. %1 öffnet den nächsten Artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="657"/>
        <source>No undecided disagreement left in this article.</source>
        <translation>Keine nicht entschiedene Abweichung mehr in diesem Artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="673"/>
        <source>No spans to compare in this article.</source>
        <translation>Keine Textstellen zum Vergleichen in diesem Artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="674"/>
        <source>Click a passage or press N for the next disagreement.</source>
        <translation>Klicken Sie auf eine Passage oder drücken Sie N für die nächste Abweichung.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="684"/>
        <source>no span by %1</source>
        <translation>keine Textstelle von %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="687"/>
        <source>different functions</source>
        <translation>unterschiedliche Funktionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="689"/>
        <source>different boundaries</source>
        <translation>unterschiedliche Grenzen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="691"/>
        <source>different attributes</source>
        <translation>unterschiedliche Merkmale</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="703"/>
        <source>Passage %1 of %2 (paragraph %3): %4%5</source>
        <translation>Passage %1 von %2 (Absatz %3): %4%5</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="707"/>
        <source>the coders agree</source>
        <translation>die Codierenden stimmen überein</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="707"/>
        <source>; </source>
        <translation>; </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="708"/>
        <source> — decided</source>
        <translation> — entschieden</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="727"/>
        <source>Characters %1 to %2</source>
        <translation>Zeichen %1 bis %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="728"/>
        <source>rejected</source>
        <translation>verworfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="728"/>
        <source>in gold</source>
        <translation>im Goldstandard</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="744"/>
        <source>drawn by the lead</source>
        <translation>von der Leitung gezogen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="744"/>
        <source>from %1</source>
        <translation>von %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="746"/>
        <source>Decided by %1 at %2.%3</source>
        <translation>Entschieden von %1 am %2.%3</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="748"/>
        <source> Rationale: %1</source>
        <translation> Begründung: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="756"/>
        <source>Gold %1 decided by %2 at %3%4</source>
        <translation>Goldstandard %1 entschieden von %2 am %3%4</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="864"/>
        <source>%1. Undo with %2.</source>
        <translation>%1. Rückgängig mit %2.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="892"/>
        <source>Choose one coder&apos;s span to accept (or several to merge).</source>
        <translation>Wählen Sie die Textstelle einer codierenden Person zum Übernehmen (oder mehrere zum Vereinen).</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="920"/>
        <source>Choose a passage first.</source>
        <translation>Wählen Sie zuerst eine Passage.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="959"/>
        <source>Choose the spans to reject (that are not rejected yet).</source>
        <translation>Wählen Sie die zu verwerfenden Textstellen (die noch nicht verworfen sind).</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="971"/>
        <source>Choose one gold span to withdraw.</source>
        <translation>Wählen Sie eine Goldstandard-Textstelle zum Zurückziehen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="1017"/>
        <source>There is no agreed passage left to accept in this article.</source>
        <translation>In diesem Artikel ist keine übereinstimmende Passage mehr zu übernehmen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="261"/>
        <source>Answers to article-level items</source>
        <translation>Antworten auf Items auf Artikelebene</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="997"/>
        <source>Choose an item with a gold answer to withdraw.</source>
        <translation>Wählen Sie ein Item mit einer Goldstandard-Antwort, die zurückgezogen werden soll.</translation>
    </message>
</context>
<context>
    <name>fourfold::ConflictsWindow</name>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="47"/>
        <source>Merge conflicts — %1</source>
        <translation>Konflikte beim Zusammenführen — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="50"/>
        <source>A conflict is a coder&apos;s span, answer or link that was changed both in the project and in a coder copy (or on the team server). The later change was kept; the other version waits here. Keep the project&apos;s version or take the other one: each decision can be undone with Edit → Undo.</source>
        <translation>Ein Konflikt ist eine Textstelle, Antwort oder Verknüpfung einer codierenden Person, die sowohl im Projekt als auch in einer Kopie für Codierende (oder auf dem Teamserver) geändert wurde. Die spätere Änderung wurde behalten; die andere Version wartet hier. Behalten Sie die Version des Projekts oder übernehmen Sie die andere: jede Entscheidung lässt sich mit Bearbeiten → Rückgängig zurücknehmen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="57"/>
        <source>Show decided conflicts</source>
        <translation>Entschiedene Konflikte zeigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="62"/>
        <source>Coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="62"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="62"/>
        <source>What</source>
        <translation>Was</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="63"/>
        <source>Other version from</source>
        <translation>Andere Version von</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="63"/>
        <source>Found</source>
        <translation>Gefunden</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="63"/>
        <source>Decision</source>
        <translation>Entscheidung</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="69"/>
        <source>Conflicts</source>
        <translation>Konflikte</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="85"/>
        <source>In the project now</source>
        <translation>Jetzt im Projekt</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="85"/>
        <source>&amp;Keep the project&apos;s version</source>
        <translation>Version des Projekts &amp;behalten</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="86"/>
        <source>The other version</source>
        <translation>Die andere Version</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="86"/>
        <source>&amp;Take the other version</source>
        <translation>Andere Version &amp;übernehmen</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="134"/>
        <source>%1 span</source>
        <translation>%1-Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="136"/>
        <source>answer to %1</source>
        <translation>Antwort auf %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="138"/>
        <source>withdrawn assignment, coded in a copy</source>
        <translation>zurückgezogene Zuweisung, in einer Kopie codiert</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="140"/>
        <source>project&apos;s version kept</source>
        <translation>Version des Projekts behalten</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="141"/>
        <source>other version taken</source>
        <translation>andere Version übernommen</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="142"/>
        <source>open</source>
        <translation>offen</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="145"/>
        <source>the project</source>
        <translation>das Projekt</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="146"/>
        <source>the team server</source>
        <translation>der Teamserver</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="147"/>
        <source>copy %1</source>
        <translation>Kopie %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="162"/>
        <source>?</source>
        <translation>?</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="184"/>
        <source>&lt;p&gt;&lt;i&gt;(none)&lt;/i&gt;&lt;/p&gt;</source>
        <translation>&lt;p&gt;&lt;i&gt;(keine)&lt;/i&gt;&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="187"/>
        <source>&lt;p&gt;&lt;b&gt;Deleted&lt;/b&gt;&lt;/p&gt;</source>
        <translation>&lt;p&gt;&lt;b&gt;Gelöscht&lt;/b&gt;&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="203"/>
        <source>&lt;p&gt;Note: %1&lt;/p&gt;</source>
        <translation>&lt;p&gt;Notiz: %1&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="205"/>
        <source>&lt;p&gt;Confidence: %1&lt;/p&gt;</source>
        <translation>&lt;p&gt;Konfidenz: %1&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="207"/>
        <source>&lt;p&gt;Answer to %1: &lt;b&gt;%2&lt;/b&gt;&lt;/p&gt;</source>
        <translation>&lt;p&gt;Antwort auf %1: &lt;b&gt;%2&lt;/b&gt;&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="212"/>
        <source>&lt;p&gt;Status: &lt;b&gt;%1&lt;/b&gt;&lt;/p&gt;</source>
        <translation>&lt;p&gt;Status: &lt;b&gt;%1&lt;/b&gt;&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="214"/>
        <source>&lt;p&gt;Link: &lt;b&gt;%1&lt;/b&gt;&lt;/p&gt;</source>
        <translation>&lt;p&gt;Verknüpfung: &lt;b&gt;%1&lt;/b&gt;&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="218"/>
        <source>&lt;p&gt;&lt;small&gt;Changed %1&lt;/small&gt;&lt;/p&gt;</source>
        <translation>&lt;p&gt;&lt;small&gt;Geändert %1&lt;/small&gt;&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="234"/>
        <source>No merge has found a conflict.</source>
        <translation>Kein Zusammenführen hat einen Konflikt gefunden.</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="235"/>
        <source>No conflicts wait for a decision.</source>
        <translation>Keine Konflikte warten auf eine Entscheidung.</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="245"/>
        <source>&lt;p&gt;The project withdrew this assignment (a withdrawn draw) while %1 coded the article in a copy; the codings are in the project, but they do not count while the assignment stays withdrawn. Keep the project&apos;s version to leave it withdrawn, or take this version to assign the article to %1 again.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Das Projekt hat diese Zuweisung zurückgezogen (eine zurückgezogene Ziehung), während %1 den Artikel in einer Kopie codierte; die Codierungen sind im Projekt, zählen aber nicht, solange die Zuweisung zurückgezogen bleibt. Behalten Sie die Version des Projekts, damit sie zurückgezogen bleibt, oder übernehmen Sie diese Version, um den Artikel %1 erneut zuzuweisen.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="269"/>
        <source>Choose an open conflict first.</source>
        <translation>Wählen Sie zuerst einen offenen Konflikt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="285"/>
        <source>%1. Undo with Edit → Undo.</source>
        <translation>%1. Rückgängig mit Bearbeiten → Rückgängig.</translation>
    </message>
</context>
<context>
    <name>fourfold::DendrogramView</name>
    <message>
        <location filename="../app/desktop/frames/dendrogram_view.cpp" line="84"/>
        <source>No tree yet.</source>
        <translation>Noch kein Baum.</translation>
    </message>
</context>
<context>
    <name>fourfold::DisagreementQueueModel</name>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="74"/>
        <source>%1 passages: %2 with a disagreement (%3 undecided), %4 agreed and not yet in gold. Only one coder or not all: %5; function: %6; boundaries: %7; attributes: %8.</source>
        <translation>%1 Passagen: %2 mit Abweichung (%3 nicht entschieden), %4 übereinstimmend und noch nicht im Goldstandard. Nur eine codierende Person oder nicht alle: %5; Funktion: %6; Grenzen: %7; Merkmale: %8.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="96"/>
        <source>Passages with a disagreement not yet decided</source>
        <translation>Passagen mit noch nicht entschiedener Abweichung</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="98"/>
        <source>Passages with a disagreement, decided or not</source>
        <translation>Passagen mit Abweichung, entschieden oder nicht</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="100"/>
        <source>Passages all coders agree on that are not yet in gold</source>
        <translation>Passagen, in denen alle Codierenden übereinstimmen und die noch nicht im Goldstandard sind</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="109"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="111"/>
        <source>Open</source>
        <translation>Offen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="113"/>
        <source>All</source>
        <translation>Alle</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="115"/>
        <source>Agreed</source>
        <translation>Übereinst.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="117"/>
        <source>Coders</source>
        <translation>Codierende</translation>
    </message>
</context>
<context>
    <name>fourfold::ExtractorWindow</name>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="97"/>
        <source>Extractor runs</source>
        <translation>Extraktorläufe</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="107"/>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>Function</source>
        <translation>Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="107"/>
        <source>Precision</source>
        <translation>Precision</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="107"/>
        <source>Recall</source>
        <translation>Recall</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="107"/>
        <source>F1</source>
        <translation>F1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>F1 95% CI</source>
        <translation>F1 95-%-KI</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>COR</source>
        <translation>COR</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>INC</source>
        <translation>INC</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>PAR</source>
        <translation>PAR</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>MIS</source>
        <translation>MIS</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>SPU</source>
        <translation>SPU</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>α run–coders</source>
        <translation>α Lauf–Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="109"/>
        <source>Coders&apos; band</source>
        <translation>Band der Codierenden</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="109"/>
        <source>Run vs band</source>
        <translation>Lauf ggü. Band</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="110"/>
        <source>Correct: the run&apos;s span matches</source>
        <translation>Korrekt: die Textstelle des Laufs stimmt überein</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="112"/>
        <source>Incorrect: matched, but the boundaries or the function differ (strict/exact/type)</source>
        <translation>Inkorrekt: zugeordnet, aber Grenzen oder Funktion weichen ab (streng/exakt/Typ)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="114"/>
        <source>Partial: matched with other boundaries (partial mode; counts half)</source>
        <translation>Teilweise: zugeordnet mit anderen Grenzen (Modus teilweise; zählt halb)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="115"/>
        <source>Missing: a reference span the run missed</source>
        <translation>Fehlend: eine Referenz-Textstelle, die der Lauf verfehlt hat</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="117"/>
        <source>Spurious: a run span with no reference span (false positive)</source>
        <translation>Falsch: eine Textstelle des Laufs ohne Referenz-Textstelle (falsch positiv)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="119"/>
        <source>Mean Krippendorff&apos;s alpha (nominal) of the run with each coder, per unit</source>
        <translation>Mittleres Krippendorffs Alpha (nominal) des Laufs mit jeder codierenden Person, je Einheit</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="121"/>
        <source>Lowest to highest alpha of the pairs of human coders</source>
        <translation>Niedrigstes bis höchstes Alpha der Paare menschlicher Codierender</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="127"/>
        <source>Scores</source>
        <translation>Werte</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="129"/>
        <source>Errors</source>
        <translation>Fehler</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="150"/>
        <source>Function confusion</source>
        <translation>Funktionsverwechslung</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="184"/>
        <source>&lt;b&gt;Runs&lt;/b&gt; — select one or more to compare</source>
        <translation>&lt;b&gt;Läufe&lt;/b&gt; — einen oder mehrere zum Vergleichen auswählen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Name</source>
        <translation>Name</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Version</source>
        <translation>Version</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Made</source>
        <translation>Erstellt</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Parameters</source>
        <translation>Parameter</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Spans</source>
        <translation>Textstellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="203"/>
        <source>What the runs are scored against: gold or one coder</source>
        <translation>Wogegen die Läufe bewertet werden: Goldstandard oder eine codierende Person</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="204"/>
        <source>&amp;Reference</source>
        <translation>&amp;Referenz</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="207"/>
        <source>Strict — same boundaries and function</source>
        <translation>Streng — gleiche Grenzen und Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="208"/>
        <source>Exact — same boundaries, any function</source>
        <translation>Exakt — gleiche Grenzen, beliebige Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="209"/>
        <source>Partial — overlap counts half</source>
        <translation>Teilweise — Überlappung zählt halb</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="210"/>
        <source>Type — same function, any overlap</source>
        <translation>Typ — gleiche Funktion, beliebige Überlappung</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="214"/>
        <source>&amp;Matching</source>
        <translation>&amp;Abgleich</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="217"/>
        <source>Sentence</source>
        <translation>Satz</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="218"/>
        <source>Paragraph</source>
        <translation>Absatz</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="219"/>
        <source>Token (word)</source>
        <translation>Token (Wort)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="223"/>
        <source>The unit on which the run&apos;s alpha with the coders is computed</source>
        <translation>Die Einheit, auf der das Alpha des Laufs mit den Codierenden berechnet wird</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="224"/>
        <source>&amp;Unit for alpha</source>
        <translation>&amp;Einheit für Alpha</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>Reference spans</source>
        <translation>Referenz-Textstellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>Run spans</source>
        <translation>Textstellen des Laufs</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>False positives</source>
        <translation>Falsch positive</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="264"/>
        <source>Misses</source>
        <translation>Verfehlte</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="264"/>
        <source>Wrong function</source>
        <translation>Falsche Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="264"/>
        <source>Boundary</source>
        <translation>Grenze</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="265"/>
        <source>Click a count to list those errors</source>
        <translation>Klicken Sie auf eine Anzahl, um diese Fehler aufzulisten</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="274"/>
        <source>All functions</source>
        <translation>Alle Funktionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="279"/>
        <source>Every kind of error</source>
        <translation>Jede Fehlerart</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="284"/>
        <source>Article or text…</source>
        <translation>Artikel oder Text…</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="286"/>
        <source>&amp;Show</source>
        <translation>An&amp;zeigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="309"/>
        <source>Double-click or press Enter to open the passage</source>
        <translation>Doppelklicken oder Eingabetaste drücken, um die Passage zu öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="332"/>
        <source>Gold</source>
        <translation>Goldstandard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="338"/>
        <source>Coder %1</source>
        <translation>Codierende %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="376"/>
        <source>?</source>
        <translation>?</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="387"/>
        <source>This project has no extractor runs yet. Make one with “fourfold-cli extract”, or import an extractor&apos;s spans with it.</source>
        <translation>Dieses Projekt hat noch keine Extraktorläufe. Erstellen Sie einen mit „fourfold-cli extract“ oder importieren Sie damit die Textstellen eines Extraktors.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="419"/>
        <source>No run selected.</source>
        <translation>Kein Lauf ausgewählt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="423"/>
        <source>&lt;b&gt;%1&lt;/b&gt;, version %2, made %3, %4 spans&lt;br&gt;%5</source>
        <translation>&lt;b&gt;%1&lt;/b&gt;, Version %2, erstellt %3, %4 Textstellen&lt;br&gt;%5</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="475"/>
        <source>Select a run to score.</source>
        <translation>Wählen Sie einen Lauf zum Bewerten aus.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="481"/>
        <source>Scoring %n run(s)…</source>
        <translation>
            <numerusform>%n Lauf wird bewertet…</numerusform>
            <numerusform>%n Läufe werden bewertet…</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="533"/>
        <source>gold</source>
        <translation>Goldstandard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="533"/>
        <source>coder %1</source>
        <translation>Codierende %1</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="544"/>
        <source>%n article(s) with %1 scored.</source>
        <translation>
            <numerusform>%n Artikel mit %1 bewertet.</numerusform>
            <numerusform>%n Artikel mit %1 bewertet.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="592"/>
        <source>Precision %1, recall %2 (95% bootstrap intervals)</source>
        <translation>Precision %1, Recall %2 (95-%-Bootstrap-Intervalle)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="611"/>
        <source>▼ below</source>
        <translation>▼ darunter</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="613"/>
        <source>● inside</source>
        <translation>● innerhalb</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="615"/>
        <source>▲ above</source>
        <translation>▲ darüber</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="617"/>
        <source>undefined</source>
        <translation>nicht definiert</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="636"/>
        <source>Micro</source>
        <translation>Mikro</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="638"/>
        <source>Macro</source>
        <translation>Makro</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="641"/>
        <source>%1: alpha on %n unit(s) (%2) with coders %3.</source>
        <translation>
            <numerusform>%1: Alpha auf %n Einheit (%2) mit den Codierenden %3.</numerusform>
            <numerusform>%1: Alpha auf %n Einheiten (%2) mit den Codierenden %3.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="646"/>
        <source>%1: no band with the coders — %2</source>
        <translation>%1: kein Band mit den Codierenden — %2</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="649"/>
        <source>Scored against %1, %2 matching; intervals from %n bootstrap replicate(s) over articles.</source>
        <translation>
            <numerusform>Bewertet gegen %1, Abgleich %2; Intervalle aus %n Bootstrap-Replikation über Artikel.</numerusform>
            <numerusform>Bewertet gegen %1, Abgleich %2; Intervalle aus %n Bootstrap-Replikationen über Artikel.</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="666"/>
        <source>Errors of run &lt;b&gt;%1&lt;/b&gt; against %2 (%3 matching) on %n article(s). Double-click an error to see its passage.</source>
        <translation>
            <numerusform>Fehler des Laufs &lt;b&gt;%1&lt;/b&gt; gegen %2 (Abgleich %3) in %n Artikel. Doppelklicken Sie auf einen Fehler, um seine Passage zu sehen.</numerusform>
            <numerusform>Fehler des Laufs &lt;b&gt;%1&lt;/b&gt; gegen %2 (Abgleich %3) in %n Artikeln. Doppelklicken Sie auf einen Fehler, um seine Passage zu sehen.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="672"/>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="728"/>
        <source>No run scored.</source>
        <translation>Kein Lauf bewertet.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="686"/>
        <source>All</source>
        <translation>Alle</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="716"/>
        <source>reference</source>
        <translation>Referenz</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="721"/>
        <source>None (false positive)</source>
        <translation>Keine (falsch positiv)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="722"/>
        <source>None (miss)</source>
        <translation>Keine (verfehlt)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="733"/>
        <source>Rows: the function %1 gives a span; columns: the function run &lt;b&gt;%2&lt;/b&gt; gives it (%3 matching). The diagonal is agreement on the function.</source>
        <translation>Zeilen: die Funktion, die %1 einer Textstelle gibt; Spalten: die Funktion, die Lauf &lt;b&gt;%2&lt;/b&gt; ihr gibt (Abgleich %3). Die Diagonale ist Übereinstimmung in der Funktion.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="781"/>
        <source>%1 %2 → run %3: %4</source>
        <translation>%1 %2 → Lauf %3: %4</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="787"/>
        <source>The run gives no matched span another function.</source>
        <translation>Der Lauf gibt keiner zugeordneten Textstelle eine andere Funktion.</translation>
    </message>
</context>
<context>
    <name>fourfold::FrameCard</name>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="106"/>
        <source>%1 · %2</source>
        <translation>%1 · %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="194"/>
        <source>Frame card</source>
        <translation>Frame-Karte</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="241"/>
        <source>— nothing coded yet</source>
        <translation>— noch nichts codiert</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="313"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="314"/>
        <source>%1, coded by %2: %3</source>
        <translation>%1, codiert von %2: %3</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frame_card.cpp" line="330"/>
        <source>%n span(s)</source>
        <translation>
            <numerusform>%n Textstelle</numerusform>
            <numerusform>%n Textstellen</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frame_card.cpp" line="332"/>
        <source>%1: %n span(s)</source>
        <translation>
            <numerusform>%1: %n Textstelle</numerusform>
            <numerusform>%1: %n Textstellen</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>fourfold::FramesWindow</name>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="70"/>
        <source>Frames — %1</source>
        <translation>Frames — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="78"/>
        <source>Gold</source>
        <translation>Goldstandard</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="79"/>
        <source>Consensus of the coders</source>
        <translation>Konsens der Codierenden</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="84"/>
        <source>Coder %1</source>
        <translation>Codierende Person %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="87"/>
        <source>Extractor run %1</source>
        <translation>Extraktorlauf %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="88"/>
        <source>Layer</source>
        <translation>Ebene</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="91"/>
        <source>where the indices point</source>
        <translation>worauf die Indizes zeigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="92"/>
        <source>Number of frames</source>
        <translation>Anzahl der Frames</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="96"/>
        <source>Largest k for the indices</source>
        <translation>Größtes k für die Indizes</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="100"/>
        <source>none</source>
        <translation>keine</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="101"/>
        <source>Bootstrap replicates</source>
        <translation>Bootstrap-Replikationen</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="105"/>
        <source>Start value of the bootstrap</source>
        <translation>Seed des Bootstraps</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="106"/>
        <source>&amp;Compute</source>
        <translation>&amp;Berechnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="107"/>
        <source>Cancel</source>
        <translation>Abbrechen</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="112"/>
        <source>&amp;Layer:</source>
        <translation>&amp;Ebene:</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="115"/>
        <source>&amp;Frames (k):</source>
        <translation>&amp;Frames (k):</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="119"/>
        <source>Indices up to k =</source>
        <translation>Indizes bis k =</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="123"/>
        <source>&amp;Stability replicates:</source>
        <translation>&amp;Stabilitäts-Replikationen:</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="127"/>
        <source>start value:</source>
        <translation>Seed:</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="157"/>
        <source>Ward&apos;s tree: the last %1 merges (each leaf: its number of articles; dashed: the cut into the chosen k)</source>
        <translation>Ward-Baum: die letzten %1 Fusionen (jedes Blatt: seine Anzahl Artikel; gestrichelt: der Schnitt in das gewählte k)</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="174"/>
        <source>Choosing &amp;k</source>
        <translation>Wahl von &amp;k</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="184"/>
        <source>Frames</source>
        <translation>Frames</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="185"/>
        <source>Element profile of each frame</source>
        <translation>Elementprofil jedes Frames</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="187"/>
        <source>Share of each frame&apos;s articles holding the element, beside the share in all articles; bold: the element characterises the frame (adjusted residual above 1.96).</source>
        <translation>Anteil der Artikel jedes Frames, die das Element enthalten, neben dem Anteil an allen Artikeln; fett: das Element kennzeichnet den Frame (standardisiertes Residuum über 1.96).</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="194"/>
        <source>F&amp;rames</source>
        <translation>F&amp;rames</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="199"/>
        <source>By outlet</source>
        <translation>Nach Medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="200"/>
        <source>By month</source>
        <translation>Nach Monat</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="212"/>
        <source>By &amp;outlet and month</source>
        <translation>Nach &amp;Medium und Monat</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="219"/>
        <source>Frame</source>
        <translation>Frame</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="220"/>
        <source>Fr&amp;ame:</source>
        <translation>Fr&amp;ame:</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="224"/>
        <source>Double-click an article to open it on the desk.</source>
        <translation>Doppelklicken Sie auf einen Artikel, um ihn zum Codieren zu öffnen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="227"/>
        <source>Articles of the frame</source>
        <translation>Artikel des Frames</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="229"/>
        <source>&amp;Articles</source>
        <translation>&amp;Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="234"/>
        <location filename="../app/desktop/frames/frames_window.cpp" line="235"/>
        <source>Name of the analysis</source>
        <translation>Name der Analyse</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="236"/>
        <source>Sa&amp;ve frames</source>
        <translation>Frames &amp;speichern</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="238"/>
        <source>Saved analyses</source>
        <translation>Gespeicherte Analysen</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="240"/>
        <source>O&amp;pen</source>
        <translation>Ö&amp;ffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="241"/>
        <source>&amp;Delete</source>
        <translation>&amp;Löschen</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="242"/>
        <source>Save as:</source>
        <translation>Speichern als:</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="248"/>
        <source>Saved:</source>
        <translation>Gespeichert:</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="266"/>
        <location filename="../app/desktop/frames/frames_window.cpp" line="411"/>
        <location filename="../app/desktop/frames/frames_window.cpp" line="563"/>
        <source>F%1 %2</source>
        <translation>F%1 %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="281"/>
        <source>Choose a layer and the number of frames, then press Compute. Gold is the usual layer; the consensus of the coders or one coder serve before gold is adjudicated.</source>
        <translation>Wählen Sie eine Ebene und die Anzahl der Frames und klicken Sie dann auf Berechnen. Der Goldstandard ist die übliche Ebene; der Konsens der Codierenden oder eine codierende Person dienen, bevor der Goldstandard entschieden ist.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="344"/>
        <source>Computing the frames…</source>
        <translation>Die Frames werden berechnet…</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="372"/>
        <source>Cancelled; the frames shown are from before.</source>
        <translation>Abgebrochen; die angezeigten Frames sind die vorherigen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="372"/>
        <source>Cancelled.</source>
        <translation>Abgebrochen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="376"/>
        <source>%1

Adjudicate more articles into gold (Lead → Compare and adjudicate…), or choose the consensus of the coders or one coder as the layer above.</source>
        <translation>%1

Entscheiden Sie mehr Artikel in den Goldstandard (Leitung → Vergleichen und entscheiden…) oder wählen Sie oben den Konsens der Codierenden oder eine codierende Person als Ebene.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="420"/>
        <source>k-choice indices, each relative to its largest value</source>
        <translation>k-Wahl-Indizes, jeweils relativ zu ihrem größten Wert</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="422"/>
        <source>k (frames)</source>
        <translation>k (Frames)</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="425"/>
        <source>share of the largest value</source>
        <translation>Anteil am größten Wert</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="446"/>
        <source>mean silhouette</source>
        <translation>mittlere Silhouette</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="448"/>
        <source>Calinski–Harabasz</source>
        <translation>Calinski–Harabasz</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="450"/>
        <source>fusion jump (elbow)</source>
        <translation>Fusionssprung (Ellbogen)</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="453"/>
        <source>chosen k = %1</source>
        <translation>gewähltes k = %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="470"/>
        <location filename="../app/desktop/frames/frames_window.cpp" line="519"/>
        <location filename="../app/desktop/frames/frames_window.cpp" line="589"/>
        <source>–</source>
        <translation>–</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="472"/>
        <source>Largest mean silhouette at k = %1, Calinski–Harabasz at k = %2, fusion jump at k = %3. %4 %5 articles × %6 element variables of %7.</source>
        <translation>Größte mittlere Silhouette bei k = %1, Calinski–Harabasz bei k = %2, Fusionssprung bei k = %3. %4 %5 Artikel × %6 Elementvariablen von %7.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="475"/>
        <source>Frames: k = %1, as chosen.</source>
        <translation>Frames: k = %1, wie gewählt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="477"/>
        <source>Frames: k = %1, where most indices point.</source>
        <translation>Frames: k = %1, worauf die meisten Indizes zeigen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="478"/>
        <source>Frames: k = %1, the largest mean silhouette; the three indices point at different k.</source>
        <translation>Frames: k = %1, die größte mittlere Silhouette; die drei Indizes zeigen auf verschiedene k.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="499"/>
        <source>Name (double-click to edit)</source>
        <translation>Name (zum Bearbeiten doppelklicken)</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="499"/>
        <source>Articles</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="500"/>
        <source>Share</source>
        <translation>Anteil</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="500"/>
        <source>Stability</source>
        <translation>Stabilität</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="500"/>
        <source>Characteristic elements (share in frame, in all)</source>
        <translation>Kennzeichnende Elemente (Anteil im Frame, in allen)</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="517"/>
        <source>%1 — dissolves on resampling</source>
        <translation>%1 — löst sich beim Neuziehen auf</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="521"/>
        <source>Mean Jaccard similarity to the best-matching cluster over %1 bootstrap replicates (Hennig 2007); %2 dissolved (≤ 0.5), %3 recovered (≥ 0.75).</source>
        <translation>Mittlere Jaccard-Ähnlichkeit zum am besten passenden Cluster über %1 Bootstrap-Replikationen (Hennig 2007); %2 aufgelöst (≤ 0.5), %3 wiedergefunden (≥ 0.75).</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="527"/>
        <source>not computed</source>
        <translation>nicht berechnet</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="542"/>
        <source>%1 (%2, %3)</source>
        <translation>%1 (%2, %3)</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="549"/>
        <source>none stands out</source>
        <translation>keines sticht heraus</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="613"/>
        <source>F%1</source>
        <translation>F%1</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="564"/>
        <source>All</source>
        <translation>Alle</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="584"/>
        <source>%1: %2 of all articles</source>
        <translation>%1: %2 aller Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="585"/>
        <source>%1 in F%2: %3 of its articles, %4 of all; adjusted residual %5</source>
        <translation>%1 in F%2: %3 seiner Artikel, %4 aller; standardisiertes Residuum %5</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="614"/>
        <source>Total</source>
        <translation>Gesamt</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="625"/>
        <source>%1 (%2)</source>
        <translation>%1 (%2)</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="634"/>
        <source>Chi-square undefined: %1</source>
        <translation>Chi-Quadrat nicht definiert: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="637"/>
        <source>Pearson&apos;s X² = %1, df = %2, p = %3; Cramér&apos;s V = %4.</source>
        <translation>Pearsons X² = %1, df = %2, p = %3; Cramérs V = %4.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="640"/>
        <source>&lt; 0.001</source>
        <translation>&lt; 0.001</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frames/frames_window.cpp" line="644"/>
        <source>%n cell(s) expect fewer than 5 articles: read the test with care.</source>
        <translation>
            <numerusform>Bei %n Zelle ist der Erwartungswert kleiner als 5 Artikel: lesen Sie den Test mit Vorsicht.</numerusform>
            <numerusform>Bei %n Zellen ist der Erwartungswert kleiner als 5 Artikel: lesen Sie den Test mit Vorsicht.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="654"/>
        <source>Title</source>
        <translation>Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="654"/>
        <source>Outlet</source>
        <translation>Medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="654"/>
        <source>Date</source>
        <translation>Datum</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="654"/>
        <source>Id</source>
        <translation>ID</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="654"/>
        <source>Near the centre</source>
        <translation>Nahe am Zentrum</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="672"/>
        <source>%1.</source>
        <translation>%1.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="705"/>
        <location filename="../app/desktop/frames/frames_window.cpp" line="706"/>
        <source>Compute the frames before saving them.</source>
        <translation>Berechnen Sie die Frames, bevor Sie sie speichern.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frames/frames_window.cpp" line="722"/>
        <source>Saved the %n frame(s) as &quot;%1&quot; (Edit → Undo takes it back).</source>
        <translation>
            <numerusform>Der %n Frame wurde als „%1“ gespeichert (Bearbeiten → Rückgängig nimmt es zurück).</numerusform>
            <numerusform>Die %n Frames wurden als „%1“ gespeichert (Bearbeiten → Rückgängig nimmt es zurück).</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="747"/>
        <source>The layer %1 of &quot;%2&quot; is no longer in the project.</source>
        <translation>Die Ebene %1 von „%2“ ist nicht mehr im Projekt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="749"/>
        <source>The layer %1 is no longer in the project.</source>
        <translation>Die Ebene %1 ist nicht mehr im Projekt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="774"/>
        <source>Deleted the saved frames &quot;%1&quot; (Edit → Undo brings them back).</source>
        <translation>Die gespeicherten Frames „%1“ wurden gelöscht (Bearbeiten → Rückgängig holt sie zurück).</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frames/frames_window.cpp" line="789"/>
        <source>%1 — %2, k = %3, %n article(s)</source>
        <translation>
            <numerusform>%1 — %2, k = %3, %n Artikel</numerusform>
            <numerusform>%1 — %2, k = %3, %n Artikel</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>fourfold::GoldSpanDialog</name>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="30"/>
        <source>Edit the gold span</source>
        <translation>Goldstandard-Textstelle bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="35"/>
        <source>Select the span on the text: it snaps to whole words, as on the desk. Tick “Exact selection” to take the selection as it is, or set start and end to the character.</source>
        <translation>Markieren Sie die Textstelle im Text: sie rastet wie beim Codieren an ganzen Wörtern ein. Setzen Sie „Exakte Auswahl“, um die Auswahl so zu übernehmen, wie sie ist, oder setzen Sie Anfang und Ende zeichengenau.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="46"/>
        <source>Article text</source>
        <translation>Artikeltext</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="55"/>
        <source>&amp;Function:</source>
        <translation>&amp;Funktion:</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="56"/>
        <source>E&amp;xact selection (no snapping to words)</source>
        <translation>&amp;Exakte Auswahl (nicht an Wortgrenzen einrasten)</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="65"/>
        <source>&amp;Start (character):</source>
        <translation>&amp;Beginn (Zeichen):</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="66"/>
        <source>&amp;End (character, not included):</source>
        <translation>&amp;Ende (Zeichen, nicht enthalten):</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="71"/>
        <source>Text:</source>
        <translation>Text:</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="77"/>
        <source>Decide gold span</source>
        <translation>Goldstandard-Textstelle festlegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="158"/>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="165"/>
        <source>not set</source>
        <translation>nicht angegeben</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="169"/>
        <source>%1:</source>
        <translation>%1:</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="193"/>
        <source>(The end must come after the start.)</source>
        <translation>(Das Ende muss nach dem Beginn liegen.)</translation>
    </message>
</context>
<context>
    <name>fourfold::ImportOptionsDialog</name>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="53"/>
        <source>Import articles</source>
        <translation>Artikel importieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="56"/>
        <source>Import %1</source>
        <translation>%1 importieren</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/import_options_dialog.cpp" line="57"/>
        <source>Import %n files</source>
        <translation>
            <numerusform>%n Datei importieren</numerusform>
            <numerusform>%n Dateien importieren</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="64"/>
        <source>e.g. ^=+$ or ^Item \d+</source>
        <translation>z. B. ^=+$ oder ^Item \d+</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="66"/>
        <source>A regular expression. Each text, DOCX, ODT or PDF document is cut into articles at the lines where it is found. Named groups (?&lt;title&gt;…), (?&lt;outlet&gt;…) and (?&lt;date&gt;…) fill those fields; otherwise the first line of each part is its title. Leave empty for one article per document.</source>
        <translation>Ein regulärer Ausdruck. Jedes Text-, DOCX-, ODT- oder PDF-Dokument wird an den Zeilen, an denen er gefunden wird, in Artikel geteilt. Benannte Gruppen (?&lt;title&gt;…), (?&lt;outlet&gt;…) und (?&lt;date&gt;…) füllen diese Felder; sonst ist die erste Zeile jedes Teils sein Titel. Leer lassen für einen Artikel je Dokument.</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="70"/>
        <source>Split each document at lines matching:</source>
        <translation>Jedes Dokument an Zeilen teilen, auf die passt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="78"/>
        <source>Preview the cuts</source>
        <translation>Schnitte vorab ansehen</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="82"/>
        <source>Preview of the cuts</source>
        <translation>Vorschau der Schnitte</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="86"/>
        <source>Import</source>
        <translation>Importieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="118"/>
        <source>No pattern: each document is one article.</source>
        <translation>Kein Muster: jedes Dokument ist ein Artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="123"/>
        <source>None of the chosen files is a text, DOCX, ODT or PDF document.</source>
        <translation>Keine der gewählten Dateien ist ein Text-, DOCX-, ODT- oder PDF-Dokument.</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="130"/>
        <source>%1: not cut — %2</source>
        <translation>%1: nicht geteilt — %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="134"/>
        <source>(no title)</source>
        <translation>(ohne Titel)</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/import_options_dialog.cpp" line="139"/>
        <source>%1 (line %2): %3 (%n characters)</source>
        <translation>
            <numerusform>%1 (Zeile %2): %3 (%n Zeichen)</numerusform>
            <numerusform>%1 (Zeile %2): %3 (%n Zeichen)</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>fourfold::ItemForm</name>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="29"/>
        <source>Article-level items</source>
        <translation>Items auf Artikelebene</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="34"/>
        <source>The codebook asks no questions about the article as a whole.</source>
        <translation>Das Codebuch stellt keine Fragen zum Artikel als Ganzem.</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="73"/>
        <source>not answered</source>
        <translation>nicht beantwortet</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="94"/>
        <source>&amp;Withdraw answer</source>
        <translation>Antwort &amp;zurückziehen</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="119"/>
        <source>Withdraw the answer: the item is unanswered again</source>
        <translation>Antwort zurückziehen: die Frage ist wieder unbeantwortet</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="152"/>
        <source>Withdraw answer: %1 (%2)</source>
        <translation>Antwort zurückziehen: %1 (%2)</translation>
    </message>
</context>
<context>
    <name>fourfold::JoinTeamDialog</name>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="24"/>
        <source>Join a team project</source>
        <translation>Einem Teamprojekt beitreten</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="28"/>
        <source>Your lead gives you the server, your pseudonym and your password. Your working file is kept on this computer and syncs with the server while it is open.</source>
        <translation>Ihre Leitung nennt Ihnen den Server, Ihr Pseudonym und Ihr Passwort. Ihre Arbeitsdatei bleibt auf diesem Computer und wird mit dem Server synchronisiert, solange sie geöffnet ist.</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="36"/>
        <source>Host and database</source>
        <translation>Host und Datenbank</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="37"/>
        <source>Connection string</source>
        <translation>Verbindungszeichenfolge</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="43"/>
        <source>Server:</source>
        <translation>Server:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="46"/>
        <source>e.g. db.example.org</source>
        <translation>z. B. db.example.org</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="51"/>
        <source>Port</source>
        <translation>Port</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="54"/>
        <source>Port:</source>
        <translation>Port:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="56"/>
        <source>Host:</source>
        <translation>Host:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="58"/>
        <source>Database:</source>
        <translation>Datenbank:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="61"/>
        <source>Connection string:</source>
        <translation>Verbindungszeichenfolge:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="64"/>
        <source>Your pseudonym:</source>
        <translation>Ihr Pseudonym:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="67"/>
        <source>Kept in memory while Fourfold runs, never written to a file. Leave it empty when your password file (~/.pgpass) holds it.</source>
        <translation>Wird im Speicher gehalten, solange Fourfold läuft, und nie in eine Datei geschrieben. Leer lassen, wenn Ihre Passwortdatei (~/.pgpass) es enthält.</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="69"/>
        <source>Password:</source>
        <translation>Passwort:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="72"/>
        <source>Where to keep your working file</source>
        <translation>Wo Ihre Arbeitsdatei liegen soll</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="73"/>
        <source>Choose…</source>
        <translation>Wählen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="78"/>
        <source>Working file:</source>
        <translation>Arbeitsdatei:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="82"/>
        <source>&amp;Join</source>
        <translation>&amp;Beitreten</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="125"/>
        <source>Working file</source>
        <translation>Arbeitsdatei</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="125"/>
        <source>Fourfold projects (*.fourfold)</source>
        <translation>Fourfold-Projekte (*.fourfold)</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="136"/>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="144"/>
        <source>Name the server: its host and database, or a connection string.</source>
        <translation>Nennen Sie den Server: Host und Datenbank oder eine Verbindungszeichenfolge.</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="157"/>
        <source>Give your pseudonym, as your lead gave it to you.</source>
        <translation>Geben Sie Ihr Pseudonym an, wie Ihre Leitung es Ihnen genannt hat.</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="163"/>
        <source>Choose where to keep your working file.</source>
        <translation>Wählen Sie, wo Ihre Arbeitsdatei liegen soll.</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="177"/>
        <source>Joining the team project…</source>
        <translation>Dem Teamprojekt wird beigetreten…</translation>
    </message>
</context>
<context>
    <name>fourfold::LeadWindows</name>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="188"/>
        <source>Write the reliability report</source>
        <translation>Reliabilitätsbericht schreiben</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="189"/>
        <source>Web page (*.html);;PDF document (*.pdf)</source>
        <translation>Webseite (*.html);;PDF-Dokument (*.pdf)</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="196"/>
        <source>Reliability report</source>
        <translation>Reliabilitätsbericht</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="200"/>
        <source>The reliability report was written to %1.</source>
        <translation>Der Reliabilitätsbericht wurde nach %1 geschrieben.</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="201"/>
        <source>&amp;Open</source>
        <translation>&amp;Öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="202"/>
        <location filename="../app/desktop/lead_windows.cpp" line="241"/>
        <source>Open the &amp;folder</source>
        <translation>&amp;Ordner öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="213"/>
        <location filename="../app/desktop/lead_windows.cpp" line="221"/>
        <location filename="../app/desktop/lead_windows.cpp" line="234"/>
        <source>Coder copy</source>
        <translation>Kopie für Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="222"/>
        <source>A coder copy holds only the articles assigned to this coder, the codebook and the coder&apos;s own codings. Whose copy?</source>
        <translation>Eine Kopie für Codierende enthält nur die dieser Person zugewiesenen Artikel, das Codebuch und ihre eigenen Codierungen. Für wen ist die Kopie?</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="228"/>
        <source>Write the coder copy</source>
        <translation>Kopie für Codierende schreiben</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="229"/>
        <location filename="../app/desktop/lead_windows.cpp" line="251"/>
        <source>Fourfold project (*.fourfold)</source>
        <translation>Fourfold-Projekt (*.fourfold)</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/lead_windows.cpp" line="238"/>
        <source>Wrote %1 for %2: %n article(s), %3 span(s).</source>
        <translation>
            <numerusform>%1 für %2 geschrieben: %n Artikel, %3 Textstelle(n).</numerusform>
            <numerusform>%1 für %2 geschrieben: %n Artikel, %3 Textstelle(n).</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="251"/>
        <source>Merge returned coder copies</source>
        <translation>Zurückgegebene Kopien zusammenführen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="256"/>
        <source>Merge coder copies</source>
        <translation>Kopien zusammenführen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="257"/>
        <source>Nothing was merged.

%1</source>
        <translation>Es wurde nichts zusammengeführt.

%1</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="264"/>
        <source>%1 (%2): already merged, nothing new.</source>
        <translation>%1 (%2): bereits zusammengeführt, nichts Neues.</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="266"/>
        <source>%1 (%2): %3 new, %4 changed (%5 deleted), %6 conflict(s).</source>
        <translation>%1 (%2): %3 neu, %4 geändert (%5 gelöscht), %6 Konflikt(e).</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/lead_windows.cpp" line="276"/>
        <source>Merged %n copy(ies); %1 conflict(s): the later change is kept, the other waits for you to decide (Lead → Merge conflicts…).</source>
        <translation>
            <numerusform>%n Kopie zusammengeführt; %1 Konflikt(e): die spätere Änderung bleibt, die andere wartet auf Ihre Entscheidung (Leitung → Konflikte beim Zusammenführen…).</numerusform>
            <numerusform>%n Kopien zusammengeführt; %1 Konflikt(e): die spätere Änderung bleibt, die andere wartet auf Ihre Entscheidung (Leitung → Konflikte beim Zusammenführen…).</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="283"/>
        <source>&amp;Decide conflicts</source>
        <translation>Konflikte &amp;entscheiden</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/lead_windows.cpp" line="280"/>
        <source>Merged %n copy(ies).</source>
        <translation>
            <numerusform>%n Kopie zusammengeführt.</numerusform>
            <numerusform>%n Kopien zusammengeführt.</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>fourfold::MainWindow</name>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="930"/>
        <source>Fourfold</source>
        <translation>Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="200"/>
        <source>Articles</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="116"/>
        <source>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Manual frame analysis of news and opinion articles: problem, cause, evaluation, remedy.&lt;/p&gt;</source>
        <translation>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Manuelle Frame-Analyse von Nachrichten- und Meinungsartikeln: Problem, Ursache, Bewertung, Lösung.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="124"/>
        <source>New project…</source>
        <translation>Neues Projekt…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="125"/>
        <source>Start a study: a new project file, then import its articles.</source>
        <translation>Eine Studie beginnen: eine neue Projektdatei, dann ihre Artikel importieren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="128"/>
        <source>Open a project…</source>
        <translation>Projekt öffnen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="131"/>
        <source>Open the sample project</source>
        <translation>Beispielprojekt öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="133"/>
        <source>Invented demo data: three local controversies, three coders.</source>
        <translation>Erfundene Demodaten: drei lokale Streitfragen, drei Codierende.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="139"/>
        <location filename="../app/desktop/main_window.cpp" line="152"/>
        <source>Recent projects</source>
        <translation>Zuletzt geöffnete Projekte</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="171"/>
        <source>Search the texts…</source>
        <translation>Texte durchsuchen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="173"/>
        <source>Search articles</source>
        <translation>Artikel durchsuchen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="180"/>
        <source>Status filter</source>
        <translation>Statusfilter</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="181"/>
        <source>All articles</source>
        <translation>Alle Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="182"/>
        <source>Not started</source>
        <translation>Nicht begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="183"/>
        <source>In progress</source>
        <translation>In Arbeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="184"/>
        <source>Done</source>
        <translation>Erledigt</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="242"/>
        <source>Mark the selected text as %1 (key %2)</source>
        <translation>Ausgewählten Text als %1 markieren (Taste %2)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="253"/>
        <source>Mark as done</source>
        <translation>Als erledigt markieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="254"/>
        <source>Mark this article as done and open the next one (%1)</source>
        <translation>Diesen Artikel als erledigt markieren und den nächsten öffnen (%1)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="279"/>
        <source>Import articles…</source>
        <translation>Artikel importieren…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="355"/>
        <source>&amp;Project</source>
        <translation>&amp;Projekt</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="356"/>
        <source>&amp;New project…</source>
        <translation>&amp;Neues Projekt…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="357"/>
        <source>&amp;Open…</source>
        <translation>Ö&amp;ffnen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="358"/>
        <source>&amp;Import articles…</source>
        <translation>Artikel &amp;importieren…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="360"/>
        <source>Import a &amp;folder…</source>
        <translation>Einen &amp;Ordner importieren…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="361"/>
        <source>Import a folder</source>
        <translation>Einen Ordner importieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="367"/>
        <source>Open the &amp;sample project</source>
        <translation>Bei&amp;spielprojekt öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="368"/>
        <source>Join a &amp;team project…</source>
        <translation>Einem &amp;Teamprojekt beitreten…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="370"/>
        <source>&amp;Quit</source>
        <translation>&amp;Beenden</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="372"/>
        <source>&amp;Edit</source>
        <translation>&amp;Bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="373"/>
        <location filename="../app/desktop/main_window.cpp" line="544"/>
        <source>&amp;Undo</source>
        <translation>&amp;Rückgängig</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="376"/>
        <location filename="../app/desktop/main_window.cpp" line="547"/>
        <source>&amp;Redo</source>
        <translation>&amp;Wiederholen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="380"/>
        <source>&amp;Code</source>
        <translation>&amp;Codieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="384"/>
        <source>Mark as %1	%2</source>
        <translation>Als %1 markieren	%2</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="388"/>
        <source>Mark article as &amp;done</source>
        <translation>Artikel als &amp;erledigt markieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="389"/>
        <source>&amp;Next article</source>
        <translation>&amp;Nächster Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="391"/>
        <source>&amp;Find in texts</source>
        <translation>In Texten &amp;suchen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="392"/>
        <source>&amp;Training feedback…</source>
        <translation>&amp;Trainingsfeedback…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="399"/>
        <source>&amp;View</source>
        <translation>&amp;Ansicht</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="400"/>
        <source>E&amp;xact selection (no snapping to words)</source>
        <translation>E&amp;xakte Auswahl (nicht an Wörtern ausrichten)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="408"/>
        <source>Exact selection: spans take the text as selected.</source>
        <translation>Exakte Auswahl: Textstellen übernehmen den Text wie markiert.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="409"/>
        <source>Spans snap to whole words again.</source>
        <translation>Textstellen richten sich wieder an ganzen Wörtern aus.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="413"/>
        <source>Show &amp;every coder&apos;s spans (leads only)</source>
        <translation>Textstellen &amp;aller Codierenden zeigen (nur Leitung)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="423"/>
        <source>&amp;Lead</source>
        <translation>&amp;Leitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="425"/>
        <source>&amp;Compare and adjudicate…</source>
        <translation>&amp;Vergleichen und entscheiden…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="427"/>
        <source>&amp;Reliability…</source>
        <translation>&amp;Reliabilität…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="428"/>
        <source>&amp;Frames…</source>
        <translation>&amp;Frames…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="429"/>
        <source>Write the reliability &amp;report…</source>
        <translation>Reliabilitäts&amp;bericht schreiben…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="431"/>
        <source>&amp;Study design…</source>
        <translation>&amp;Studiendesign…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="432"/>
        <source>C&amp;odebook…</source>
        <translation>C&amp;odebuch…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="433"/>
        <source>&amp;Progress…</source>
        <translation>&amp;Fortschritt…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="434"/>
        <source>P&amp;eople…</source>
        <translation>P&amp;ersonen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="435"/>
        <source>&amp;Hand out a coder copy…</source>
        <translation>&amp;Kopie für Codierende ausgeben…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="436"/>
        <source>&amp;Merge returned coder copies…</source>
        <translation>Zurückgegebene Kopien &amp;zusammenführen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="437"/>
        <source>Merge co&amp;nflicts…</source>
        <translation>Ko&amp;nflikte beim Zusammenführen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="439"/>
        <source>&amp;Extractor runs…</source>
        <translation>&amp;Extraktorläufe…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="447"/>
        <source>&amp;Settings</source>
        <translation>&amp;Einstellungen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="448"/>
        <source>&amp;Language</source>
        <translation>&amp;Sprache</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="453"/>
        <source>System language</source>
        <translation>Systemsprache</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="464"/>
        <source>&amp;Help</source>
        <translation>&amp;Hilfe</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="466"/>
        <source>&amp;Keyboard shortcuts</source>
        <translation>&amp;Tastenkürzel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="483"/>
        <source>The project has no coder &quot;%1&quot;.</source>
        <translation>Im Projekt gibt es keine Codierenden mit dem Pseudonym „%1“.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="497"/>
        <source>Nobody was chosen to code.</source>
        <translation>Es wurde niemand zum Codieren ausgewählt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="526"/>
        <source>Span</source>
        <translation>Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="527"/>
        <source>Codebook</source>
        <translation>Codebuch</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="544"/>
        <source>&amp;Undo %1</source>
        <translation>&amp;Rückgängig: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="547"/>
        <source>&amp;Redo %1</source>
        <translation>&amp;Wiederholen: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="613"/>
        <source>The team server asks for your password to sync. Your work stays in this file until it can be sent.</source>
        <translation>Der Teamserver verlangt zum Synchronisieren Ihr Passwort. Ihre Arbeit bleibt in dieser Datei, bis sie gesendet werden kann.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="615"/>
        <source>Enter &amp;password…</source>
        <translation>&amp;Passwort eingeben…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="627"/>
        <source>Team server password</source>
        <translation>Passwort des Teamservers</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="628"/>
        <source>Password of %1 on the team server:</source>
        <translation>Passwort von %1 auf dem Teamserver:</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="764"/>
        <source>Every article in the list is done.</source>
        <translation>Alle Artikel in der Liste sind erledigt.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/main_window.cpp" line="786"/>
        <source>%n article(s) contain &quot;%1&quot;.</source>
        <translation>
            <numerusform>%n Artikel enthält „%1“.</numerusform>
            <numerusform>%n Artikel enthalten „%1“.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="792"/>
        <source>New project</source>
        <translation>Neues Projekt</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="802"/>
        <source>Cannot create project</source>
        <translation>Projekt kann nicht erstellt werden</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="814"/>
        <source>Import articles</source>
        <translation>Artikel importieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="815"/>
        <source>Articles (*.txt *.text *.html *.htm *.jsonl *.ndjson *.csv *.rss *.atom *.nitf *.newsml *.xml *.docx *.odt *.pdf *.epub)</source>
        <translation>Artikel (*.txt *.text *.html *.htm *.jsonl *.ndjson *.csv *.rss *.atom *.nitf *.newsml *.xml *.docx *.odt *.pdf *.epub)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="861"/>
        <source>&lt;h3&gt;Choose an article&lt;/h3&gt;&lt;p&gt;Pick an article in the list on the left to start coding it.&lt;/p&gt;</source>
        <translation>&lt;h3&gt;Wählen Sie einen Artikel&lt;/h3&gt;&lt;p&gt;Wählen Sie links in der Liste einen Artikel, um mit dem Codieren zu beginnen.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="864"/>
        <source>&lt;h3&gt;No articles yet&lt;/h3&gt;&lt;p&gt;Import the articles of the study: plain text, HTML, JSON Lines, CSV, DOCX, ODT, PDF, EPUB, RSS or Atom feeds, NITF or NewsML-G2. Then assign them to coders in Lead → Study design.&lt;/p&gt;</source>
        <translation>&lt;h3&gt;Noch keine Artikel&lt;/h3&gt;&lt;p&gt;Importieren Sie die Artikel der Studie: reiner Text, HTML, JSON Lines, CSV, DOCX, ODT, PDF, EPUB, RSS- oder Atom-Feeds, NITF oder NewsML-G2. Weisen Sie sie dann unter Leitung → Studiendesign Codierenden zu.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="869"/>
        <source>&lt;h3&gt;Nothing to code yet&lt;/h3&gt;&lt;p&gt;No articles are assigned to you in this project. Your lead assigns them; when they have, open the project again, or open the coder copy they send you.&lt;/p&gt;</source>
        <translation>&lt;h3&gt;Noch nichts zu codieren&lt;/h3&gt;&lt;p&gt;In diesem Projekt sind Ihnen keine Artikel zugewiesen. Ihre Leitung weist sie zu; öffnen Sie danach das Projekt erneut oder die Kopie, die sie Ihnen schickt.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="901"/>
        <source>The language changes when Fourfold starts again.</source>
        <translation>Die Sprache wechselt beim nächsten Start von Fourfold.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="914"/>
        <source>Not saved: %1. %2</source>
        <translation>Nicht gespeichert: %1. %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="915"/>
        <source>&amp;Retry</source>
        <translation>&amp;Erneut versuchen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="921"/>
        <source>&amp;Discard</source>
        <translation>&amp;Verwerfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="931"/>
        <source>No project open</source>
        <translation>Kein Projekt geöffnet</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="935"/>
        <source>lead</source>
        <translation>Leitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="935"/>
        <source>coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="937"/>
        <source>%1 — read-only, as %2 (%3) — Fourfold</source>
        <translation>%1 — schreibgeschützt, als %2 (%3) — Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="939"/>
        <source>%1 — coding as %2 (%3) — Fourfold</source>
        <translation>%1 — Codieren als %2 (%3) — Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="943"/>
        <source>Reading as %1 · %2 · read-only file: nothing is saved</source>
        <translation>Lesen als %1 · %2 · schreibgeschützte Datei: nichts wird gespeichert</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="946"/>
        <source>Coding as %1 · %2 · lead: every article</source>
        <translation>Codieren als %1 · %2 · Leitung: alle Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="947"/>
        <source>Coding as %1 · %2 · blind: only your own spans</source>
        <translation>Codieren als %1 · %2 · blind: nur eigene Textstellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="955"/>
        <source>The comparison window lists its own keys with %1.</source>
        <translation>Das Vergleichsfenster listet seine eigenen Tasten mit %1 auf.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="959"/>
        <source>Keyboard shortcuts</source>
        <translation>Tastenkürzel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="881"/>
        <source>Open project</source>
        <translation>Projekt öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="792"/>
        <location filename="../app/desktop/main_window.cpp" line="881"/>
        <source>Fourfold projects (*.fourfold)</source>
        <translation>Fourfold-Projekte (*.fourfold)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="146"/>
        <location filename="../app/desktop/main_window.cpp" line="646"/>
        <location filename="../app/desktop/main_window.cpp" line="807"/>
        <location filename="../app/desktop/main_window.cpp" line="885"/>
        <location filename="../app/desktop/main_window.cpp" line="894"/>
        <source>Cannot open project</source>
        <translation>Projekt kann nicht geöffnet werden</translation>
    </message>
</context>
<context>
    <name>fourfold::MessageBar</name>
    <message>
        <location filename="../app/desktop/message_bar.cpp" line="68"/>
        <source>Message</source>
        <translation>Meldung</translation>
    </message>
    <message>
        <location filename="../app/desktop/message_bar.cpp" line="83"/>
        <source>&amp;Details</source>
        <translation>&amp;Details</translation>
    </message>
    <message>
        <location filename="../app/desktop/message_bar.cpp" line="89"/>
        <location filename="../app/desktop/message_bar.cpp" line="90"/>
        <source>Close the message</source>
        <translation>Meldung schließen</translation>
    </message>
    <message>
        <location filename="../app/desktop/message_bar.cpp" line="95"/>
        <source>Details of the message</source>
        <translation>Details der Meldung</translation>
    </message>
</context>
<context>
    <name>fourfold::PeopleWindow</name>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="26"/>
        <source>People — %1</source>
        <translation>Personen — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="30"/>
        <source>Names stay in this project; everything that leaves it carries the pseudonym. A disabled person keeps their codings and takes no new assignments.</source>
        <translation>Namen bleiben in diesem Projekt; alles, was es verlässt, trägt das Pseudonym. Eine deaktivierte Person behält ihre Codierungen und erhält keine neuen Zuweisungen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="37"/>
        <source>Pseudonym</source>
        <translation>Pseudonym</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="37"/>
        <source>Name</source>
        <translation>Name</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="37"/>
        <source>Role</source>
        <translation>Rolle</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="37"/>
        <source>State</source>
        <translation>Status</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="44"/>
        <source>People</source>
        <translation>Personen</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="47"/>
        <source>&amp;Add a person…</source>
        <translation>Person &amp;hinzufügen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="48"/>
        <source>&amp;Rename…</source>
        <translation>&amp;Umbenennen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="49"/>
        <location filename="../app/desktop/people/people_window.cpp" line="111"/>
        <source>&amp;Disable</source>
        <translation>&amp;Deaktivieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="65"/>
        <location filename="../app/desktop/people/people_window.cpp" line="130"/>
        <source>Only a lead who chose themselves in &quot;Who is coding?&quot; can change people.</source>
        <translation>Nur eine Leitung, die sich unter „Wer codiert?“ selbst gewählt hat, kann Personen ändern.</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="81"/>
        <location filename="../app/desktop/people/people_window.cpp" line="171"/>
        <source>lead</source>
        <translation>Leitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="81"/>
        <location filename="../app/desktop/people/people_window.cpp" line="171"/>
        <source>coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="82"/>
        <source>disabled</source>
        <translation>deaktiviert</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="82"/>
        <source>enabled</source>
        <translation>aktiviert</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="111"/>
        <source>&amp;Enable</source>
        <translation>&amp;Aktivieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="138"/>
        <source>Added %1. Undo takes it back.</source>
        <translation>%1 hinzugefügt. Rückgängig nimmt es zurück.</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="147"/>
        <source>Renamed %1.</source>
        <translation>%1 umbenannt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="157"/>
        <source>Disabled %1: their codings stay; they take no new assignments.</source>
        <translation>%1 deaktiviert: die Codierungen bleiben; die Person erhält keine neuen Zuweisungen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="158"/>
        <source>Enabled %1.</source>
        <translation>%1 aktiviert.</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="164"/>
        <source>Add a person</source>
        <translation>Person hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="169"/>
        <source>e.g. C04 — the only name written to exports</source>
        <translation>z.&#xa0;B. C04 — der einzige Name, der in Exporte geschrieben wird</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="176"/>
        <source>Name:</source>
        <translation>Name:</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="177"/>
        <source>Pseudonym:</source>
        <translation>Pseudonym:</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="178"/>
        <source>Role:</source>
        <translation>Rolle:</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="179"/>
        <source>New lead&apos;s passphrase:</source>
        <translation>Passphrase der neuen Leitung:</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="180"/>
        <source>Repeat it:</source>
        <translation>Wiederholen Sie sie:</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="199"/>
        <source>The two passphrases differ; type the same one twice.</source>
        <translation>Die beiden Passphrasen unterscheiden sich; geben Sie zweimal dieselbe ein.</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="217"/>
        <source>Rename %1</source>
        <translation>%1 umbenennen</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="218"/>
        <source>New name of %1 (kept in this project only):</source>
        <translation>Neuer Name von %1 (bleibt nur in diesem Projekt):</translation>
    </message>
</context>
<context>
    <name>fourfold::ProgressBoardWindow</name>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="63"/>
        <source>Progress — %1</source>
        <translation>Fortschritt — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="73"/>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="96"/>
        <source>Phase</source>
        <translation>Phase</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="74"/>
        <source>All phases</source>
        <translation>Alle Phasen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="77"/>
        <source>Show:</source>
        <translation>Zeigen:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="79"/>
        <source>Reload</source>
        <translation>Neu laden</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <source>Coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <source>Assigned</source>
        <translation>Zugewiesen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <source>Started</source>
        <translation>Begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="182"/>
        <source>Done</source>
        <translation>Erledigt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="84"/>
        <source>Agreement so far (α)</source>
        <translation>Übereinstimmung (α)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="84"/>
        <source>Compared articles</source>
        <translation>Verglichene Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="84"/>
        <source>Active time</source>
        <translation>Aktive Zeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="87"/>
        <source>Krippendorff&apos;s alpha on the articles the coder finished: in training with the lead&apos;s master coding, in the other phases the mean over every coder who finished the same articles. ✓ at 0.800 or more, ~ from 0.667 (tentative), ✗ below.</source>
        <translation>Krippendorffs Alpha auf den Artikeln, die die Person abgeschlossen hat: im Training mit der Mastercodierung der Leitung, in den anderen Phasen der Mittelwert über alle Codierenden, die dieselben Artikel abgeschlossen haben. ✓ ab 0.800, ~ ab 0.667 (vorläufig), ✗ darunter.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="94"/>
        <source>Effort</source>
        <translation>Aufwand</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="96"/>
        <source>Articles done</source>
        <translation>Erledigte Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="96"/>
        <source>Active time, all coders</source>
        <translation>Aktive Zeit, alle Codierenden</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="97"/>
        <source>Mean per done article</source>
        <translation>Mittel je erledigtem Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="102"/>
        <source>Show active time per coder</source>
        <translation>Aktive Zeit je codierender Person zeigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="106"/>
        <source>Off by default: time is shown only summed over all coders. Recording and showing how long each person works can count as monitoring employees, which may need the coders&apos; agreement or a works council&apos;s consent. Turn it on only if your study has that agreement; the change is written to the project&apos;s log. Only a lead can switch it.</source>
        <translation>Standardmäßig aus: Zeit wird nur über alle Codierenden summiert angezeigt. Zu erfassen und anzuzeigen, wie lange jede Person arbeitet, kann als Beschäftigtenüberwachung gelten, die das Einverständnis der Codierenden oder die Zustimmung eines Betriebsrats erfordern kann. Schalten Sie es nur ein, wenn Ihre Studie dieses Einverständnis hat; die Änderung wird im Protokoll des Projekts vermerkt. Nur die Leitung kann es umschalten.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="181"/>
        <source>%1 of %2</source>
        <translation>%1 von %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="231"/>
        <source>&lt;b&gt;No assignments yet.&lt;/b&gt; Plan them in the study design window.</source>
        <translation>&lt;b&gt;Noch keine Zuweisungen.&lt;/b&gt; Planen Sie sie im Fenster Studiendesign.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="232"/>
        <source>&lt;b&gt;%1 of %2 assignments done&lt;/b&gt; · %3 of active coding time in all.</source>
        <translation>&lt;b&gt;%1 von %2 Zuweisungen erledigt&lt;/b&gt; · insgesamt %3 aktive Codierzeit.</translation>
    </message>
</context>
<context>
    <name>fourfold::ReadingView</name>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="38"/>
        <source>intro</source>
        <translation>Einleitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="40"/>
        <source>body</source>
        <translation>Hauptteil</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="42"/>
        <source>conclusion</source>
        <translation>Schluss</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="63"/>
        <source>Article text</source>
        <translation>Artikeltext</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="613"/>
        <source>Mark as %1</source>
        <translation>Als %1 markieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="614"/>
        <source>Change to %1</source>
        <translation>In %1 ändern</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="619"/>
        <source>Delete span</source>
        <translation>Textstelle löschen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="659"/>
        <source>%1: “%2”</source>
        <translation>%1: „%2“</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/reading_view.cpp" line="871"/>
        <source>%n span(s). Select text and press 1 to 4 to mark a framing function; Ctrl+Down and Ctrl+Up move between spans.</source>
        <translation>
            <numerusform>%n Textstelle. Markieren Sie Text und drücken Sie 1 bis 4, um eine Framing-Funktion zu vergeben; Strg+Runter und Strg+Hoch wechseln zwischen Textstellen.</numerusform>
            <numerusform>%n Textstellen. Markieren Sie Text und drücken Sie 1 bis 4, um eine Framing-Funktion zu vergeben; Strg+Runter und Strg+Hoch wechseln zwischen Textstellen.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="880"/>
        <source>Selected span: %1, “%2”. Press 1 to 4 to relabel, Delete to delete, Ctrl+Left/Right and Ctrl+Shift+Left/Right to resize.</source>
        <translation>Gewählte Textstelle: %1, „%2“. Drücken Sie 1 bis 4 zum Ändern der Funktion, Entf zum Löschen, Strg+Links/Rechts und Strg+Umschalt+Links/Rechts zum Ändern der Länge.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="662"/>
        <source>%1 · %2</source>
        <translation>%1 · %2</translation>
    </message>
</context>
<context>
    <name>fourfold::ReliabilityWindow</name>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="123"/>
        <source>0.800: rely on the variable</source>
        <translation>0.800: auf die Variable verlassen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="125"/>
        <source>0.667: tentative conclusions only</source>
        <translation>0.667: nur vorläufige Schlüsse</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="174"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="593"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="696"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="740"/>
        <source>undefined</source>
        <translation>nicht definiert</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="176"/>
        <source>reliable (≥ 0.800)</source>
        <translation>reliabel (≥ 0.800)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="178"/>
        <source>tentative (≥ 0.667)</source>
        <translation>vorläufig (≥ 0.667)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="182"/>
        <source>unreliable (&lt; 0.667)</source>
        <translation>nicht reliabel (&lt; 0.667)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="192"/>
        <source>Reliability — %1</source>
        <translation>Reliabilität — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="230"/>
        <source>Table</source>
        <translation>Tabelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="244"/>
        <source>Alpha without each coder</source>
        <translation>Alpha ohne jeweils eine codierende Person</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="247"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="725"/>
        <source>Alpha without each article (the costliest first)</source>
        <translation>Alpha ohne jeweils einen Artikel (der teuerste zuerst)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="251"/>
        <source>Change = alpha without it − alpha with everything: positive means leaving it out raises alpha, so it costs reliability (leave-one-out, common practice). A diagnostic for training and codebook work, not a licence to report the higher figure.</source>
        <translation>Änderung = Alpha ohne − Alpha mit allem: positiv heißt, Weglassen erhöht Alpha, es kostet also Reliabilität (Leave-one-out, gängige Praxis). Eine Diagnose für Schulung und Codebucharbeit, kein Freibrief, die höhere Zahl zu berichten.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="256"/>
        <source>Boundary habits on matched spans</source>
        <translation>Grenzgewohnheiten bei zugeordneten Textstellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="259"/>
        <source>Each span against the other coder&apos;s span of the same function that overlaps it most; differences are this coder&apos;s minus the other&apos;s, in characters (code points). Systematic: the mean differs from 0 by more than two standard errors over at least 5 matches (a rough screen, common practice).</source>
        <translation>Jede Textstelle gegen die am stärksten überlappende Textstelle derselben Funktion der anderen Person; Differenzen sind die dieser Person minus die der anderen, in Zeichen (Codepunkten). Systematisch: Der Mittelwert weicht über mindestens 5 Zuordnungen um mehr als zwei Standardfehler von 0 ab (grobe Prüfung, gängige Praxis).</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="266"/>
        <source>Diagnostics</source>
        <translation>Diagnose</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="271"/>
        <source>Alpha per function</source>
        <translation>Alpha je Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="273"/>
        <source>Coder pairs</source>
        <translation>Codierpaare</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="275"/>
        <source>Function confusion</source>
        <translation>Funktionsverwechslung</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="278"/>
        <source>Alpha over time</source>
        <translation>Alpha im Zeitverlauf</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="303"/>
        <source>Article item</source>
        <translation>Artikel-Item</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="304"/>
        <source>Paragraph</source>
        <translation>Absatz</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="305"/>
        <source>Sentence</source>
        <translation>Satz</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="306"/>
        <source>Token (word)</source>
        <translation>Token (Wort)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="307"/>
        <source>Continuum (spans, unitizing alpha)</source>
        <translation>Kontinuum (Textstellen, Unitizing-Alpha)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="312"/>
        <source>&amp;Unit</source>
        <translation>&amp;Einheit</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="318"/>
        <source>&amp;Item</source>
        <translation>&amp;Item</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="334"/>
        <source>Functions</source>
        <translation>Funktionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="353"/>
        <source>&amp;Coders</source>
        <translation>&amp;Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="356"/>
        <source>All phases</source>
        <translation>Alle Phasen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="360"/>
        <source>&amp;Phase</source>
        <translation>&amp;Phase</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="362"/>
        <source>Gold joins as a coder</source>
        <translation>Goldstandard als weitere Codierung</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="364"/>
        <source>Count articles in progress</source>
        <translation>Artikel in Bearbeitung mitzählen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="365"/>
        <source>By default a coder&apos;s article counts only once the coder has marked it done; tick to count articles still in progress too.</source>
        <translation>Standardmäßig zählt ein Artikel eines Codierers erst, wenn er ihn als fertig markiert hat; ankreuzen, um auch Artikel in Bearbeitung mitzuzählen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="373"/>
        <source>none</source>
        <translation>keine</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="374"/>
        <source>&amp;Bootstrap</source>
        <translation>&amp;Bootstrap</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="377"/>
        <source>Batches of articles</source>
        <translation>Artikelblöcke</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="378"/>
        <source>Weeks</source>
        <translation>Wochen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="379"/>
        <source>&amp;Drift by</source>
        <translation>&amp;Drift nach</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="383"/>
        <source> articles</source>
        <translation> Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="384"/>
        <source>Batch &amp;size</source>
        <translation>Block&amp;größe</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="386"/>
        <source>Co&amp;mpute</source>
        <translation>Be&amp;rechnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="388"/>
        <source>Cancel</source>
        <translation>Abbrechen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="496"/>
        <source>Computing…</source>
        <translation>Wird berechnet…</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="506"/>
        <source>Cancelling after the current step…</source>
        <translation>Abbruch nach dem aktuellen Schritt…</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="523"/>
        <source>Cancelled; the results shown are from before.</source>
        <translation>Abgebrochen; die angezeigten Ergebnisse sind von vorher.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="528"/>
        <source>%n coder(s) compared.</source>
        <translation>
            <numerusform>%n codierende Person verglichen.</numerusform>
            <numerusform>%n Codierende verglichen.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="543"/>
        <source>Chosen functions (sets)</source>
        <translation>Funktionsmenge</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="562"/>
        <source>Alpha</source>
        <translation>Alpha</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="219"/>
        <source>Alpha: Krippendorff&apos;s alpha, coincidence form (Krippendorff 2011). Interval: 95% bootstrap, units resampled (percentile; the pair interval of Hayes &amp; Krippendorff 2007 is in the report, and it is too narrow with more than two coders); q(α &lt; 0.800): share of replicates below 0.800. Verdict: Krippendorff (2004, §12.2). Minimum values: Krippendorff (2004, §11.4) after Bloch &amp; Kraemer (1989), for the rarest value at p = 0.05. Cohen&apos;s kappa per pair over the units both coded (Cohen 1960); Fleiss&apos; kappa (Fleiss 1971) needs every coder on every unit.</source>
        <translation>Alpha: Krippendorffs Alpha, Koinzidenzform (Krippendorff 2011). Intervall: 95-%-Bootstrap, Einheiten neu gezogen (Perzentil; das Paarintervall nach Hayes &amp; Krippendorff 2007 steht im Bericht und ist bei mehr als zwei Codierenden zu schmal); q(α &lt; 0.800): Anteil der Replikationen unter 0.800. Urteil: Krippendorff (2004, §12.2). Mindestzahl an Werten: Krippendorff (2004, §11.4) nach Bloch &amp; Kraemer (1989), für den seltensten Wert bei p = 0.05. Cohens Kappa je Paar über die von beiden codierten Einheiten (Cohen 1960); Fleiss&apos; Kappa (Fleiss 1971) braucht alle Codierenden auf jeder Einheit.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="562"/>
        <source>q(α &lt; 0.800)</source>
        <translation>q(α &lt; 0.800)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="562"/>
        <source>95% interval (units resampled)</source>
        <translation>95-%-Intervall (Einheiten neu gezogen)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="563"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="681"/>
        <source>Verdict</source>
        <translation>Urteil</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="563"/>
        <source>Percent agreement</source>
        <translation>Prozentuale Übereinstimmung</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="563"/>
        <source>Fleiss&apos; kappa</source>
        <translation>Fleiss&apos; Kappa</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="567"/>
        <source>Cohen&apos;s kappa %1 × %2</source>
        <translation>Cohens Kappa %1 × %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="569"/>
        <source>Pairable values</source>
        <translation>Paarbare Werte</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="569"/>
        <source>Pairable units</source>
        <translation>Paarbare Einheiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="569"/>
        <source>Rarest value</source>
        <translation>Seltenster Wert</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="570"/>
        <source>Minimum values (α ≥ 0.800)</source>
        <translation>Mindestzahl an Werten (α ≥ 0.800)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="570"/>
        <source>Sample</source>
        <translation>Stichprobe</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="575"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="685"/>
        <source>Statistic</source>
        <translation>Kennwert</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="601"/>
        <source>%1, %2 replicates, seed %3</source>
        <translation>%1, %2 Replikationen, Seed %3</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="627"/>
        <source>Fleiss&apos; kappa needs every coder on every unit; some cells are missing.</source>
        <translation>Fleiss&apos; Kappa braucht alle Codierenden auf jeder Einheit; einige Zellen fehlen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="645"/>
        <source>below the minimum</source>
        <translation>unter dem Minimum</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="646"/>
        <source>large enough</source>
        <translation>groß genug</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="662"/>
        <source>The sample is smaller than Krippendorff&apos;s minimum for the rarest value (alpha ≥ 0.800 at p = 0.05) in: %1. Code more units before relying on these figures.</source>
        <translation>Die Stichprobe ist kleiner als Krippendorffs Minimum für den seltensten Wert (Alpha ≥ 0.800 bei p = 0.05) in: %1. Codieren Sie mehr Einheiten, bevor Sie sich auf diese Werte verlassen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="681"/>
        <source>Unitizing alpha</source>
        <translation>Unitizing-Alpha</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="681"/>
        <source>Observed disagreement D_o</source>
        <translation>Beobachtete Nichtübereinstimmung D_o</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="682"/>
        <source>Expected disagreement D_e</source>
        <translation>Erwartete Nichtübereinstimmung D_e</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="682"/>
        <source>Continuum</source>
        <translation>Kontinuum</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="687"/>
        <source>All four, pooled</source>
        <translation>Alle vier, gepoolt</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="704"/>
        <source>%1 articles, %2 characters</source>
        <translation>%1 Artikel, %2 Zeichen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="722"/>
        <source>Alpha without each article: the %1 costliest of %2</source>
        <translation>Alpha ohne jeweils einen Artikel: die %1 teuersten von %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="727"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="727"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="757"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="910"/>
        <source>Coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="729"/>
        <source>Title</source>
        <translation>Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="730"/>
        <source>Alpha without</source>
        <translation>Alpha ohne</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="730"/>
        <source>Change</source>
        <translation>Änderung</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="730"/>
        <source>Units</source>
        <translation>Einheiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="757"/>
        <source>Matches</source>
        <translation>Zuordnungen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="757"/>
        <source>Length ± SE</source>
        <translation>Länge ± SE</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="757"/>
        <source>Start</source>
        <translation>Beginn</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="758"/>
        <source>End</source>
        <translation>Ende</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="758"/>
        <source>Longer</source>
        <translation>Länger</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="758"/>
        <source>Shorter</source>
        <translation>Kürzer</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="758"/>
        <source>Habit</source>
        <translation>Gewohnheit</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="780"/>
        <source>spans systematically longer</source>
        <translation>Textstellen systematisch länger</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="781"/>
        <source>spans systematically shorter</source>
        <translation>Textstellen systematisch kürzer</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="794"/>
        <source>Alpha per function, with 95% bootstrap intervals</source>
        <translation>Alpha je Funktion, mit 95-%-Bootstrap-Intervallen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="798"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="961"/>
        <source>Krippendorff&apos;s alpha</source>
        <translation>Krippendorffs Alpha</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="818"/>
        <source>pooled</source>
        <translation>gepoolt</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="902"/>
        <source>Cohen&apos;s kappa of each pair of coders over the units both coded (%1). Darker: higher agreement; hatched: not defined.</source>
        <translation>Cohens Kappa jedes Paars von Codierenden über die von beiden codierten Einheiten (%1). Dunkler: höhere Übereinstimmung; schraffiert: nicht definiert.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="907"/>
        <source>Continuum units have no per-pair kappa; see the span agreement in the function confusion.</source>
        <translation>Kontinuum-Einheiten haben kein Kappa je Paar; siehe die Übereinstimmung der Textstellen in der Funktionsverwechslung.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="924"/>
        <source>nothing</source>
        <translation>nichts</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="943"/>
        <source>A coder&apos;s span</source>
        <translation>Textstelle einer Person</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="943"/>
        <source>What another coder gave it</source>
        <translation>Was eine andere Person vergab</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="944"/>
        <source>Each span of each coder against the best-overlapping span of every other coder (both directions of each pair). Darker: a larger share of the row. &quot;nothing&quot;: no overlapping span.</source>
        <translation>Jede Textstelle jeder codierenden Person gegen die am besten überlappende Textstelle jeder anderen (beide Richtungen jedes Paars). Dunkler: größerer Anteil der Zeile. „nichts“: keine überlappende Textstelle.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="956"/>
        <source>Alpha by week of first coding — %1</source>
        <translation>Alpha nach Woche der ersten Codierung — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="957"/>
        <source>Alpha by batch of articles, in coding order — %1</source>
        <translation>Alpha nach Artikelblock, in Codierreihenfolge — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="999"/>
        <source>ISO week</source>
        <translation>ISO-Woche</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="999"/>
        <source>articles (in coding order)</source>
        <translation>Artikel (in Codierreihenfolge)</translation>
    </message>
</context>
<context>
    <name>fourfold::ReportOptionsDialog</name>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="23"/>
        <source>Reliability report</source>
        <translation>Reliabilitätsbericht</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="27"/>
        <source>Paragraph</source>
        <translation>Absatz</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="28"/>
        <source>Sentence</source>
        <translation>Satz</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="29"/>
        <source>Token (word)</source>
        <translation>Token (Wort)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="31"/>
        <source>&amp;Unit of the functions</source>
        <translation>&amp;Einheit der Funktionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="34"/>
        <source>All phases</source>
        <translation>Alle Phasen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="37"/>
        <source>&amp;Phase</source>
        <translation>&amp;Phase</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="55"/>
        <source>&amp;Coders</source>
        <translation>&amp;Codierer</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="61"/>
        <source>none</source>
        <translation>keine</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="62"/>
        <source> replicates</source>
        <translation> Replikationen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="63"/>
        <source>&amp;Bootstrap</source>
        <translation>&amp;Bootstrap</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="67"/>
        <source>S&amp;eed</source>
        <translation>S&amp;eed</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="69"/>
        <source>Count articles in progress</source>
        <translation>Artikel in Bearbeitung mitzählen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="70"/>
        <source>By default a coder&apos;s article counts only once the coder has marked it done; tick to count articles still in progress too.</source>
        <translation>Standardmäßig zählt ein Artikel eines Codierers erst, wenn er ihn als fertig markiert hat; ankreuzen, um auch Artikel in Bearbeitung mitzuzählen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="75"/>
        <source>Reliability report: %1</source>
        <translation>Reliabilitätsbericht: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="76"/>
        <source>&amp;Title</source>
        <translation>&amp;Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="79"/>
        <source>&amp;Write…</source>
        <translation>&amp;Schreiben…</translation>
    </message>
</context>
<context>
    <name>fourfold::RunErrorModel</name>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="75"/>
        <source>Correct</source>
        <translation>Korrekt</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="77"/>
        <source>False positive</source>
        <translation>Falsch positiv</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="79"/>
        <source>Miss</source>
        <translation>Verfehlt</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="81"/>
        <source>Wrong function</source>
        <translation>Falsche Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="83"/>
        <source>Boundary</source>
        <translation>Grenze</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="106"/>
        <source>%1 [%2, %3) “%4”</source>
        <translation>%1 [%2, %3) „%4“</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="117"/>
        <source>%1 → %2</source>
        <translation>%1 → %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="125"/>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="127"/>
        <source>—</source>
        <translation>—</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="152"/>
        <source>Function</source>
        <translation>Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="154"/>
        <source>Kind</source>
        <translation>Art</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="156"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="159"/>
        <source>Span of %1</source>
        <translation>Textstelle von %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="160"/>
        <source>Gold span</source>
        <translation>Goldstandard-Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="162"/>
        <source>Run span</source>
        <translation>Textstelle des Laufs</translation>
    </message>
</context>
<context>
    <name>fourfold::RunPassageWindow</name>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="25"/>
        <source>Passage</source>
        <translation>Passage</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="31"/>
        <source>◀ &amp;Previous error</source>
        <translation>◀ &amp;Vorheriger Fehler</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="34"/>
        <source>&amp;Next error ▶</source>
        <translation>&amp;Nächster Fehler ▶</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="73"/>
        <source>%1 — %2 against %3</source>
        <translation>%1 — %2 gegen %3</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="75"/>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="160"/>
        <source>gold</source>
        <translation>Goldstandard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="96"/>
        <source>Gold</source>
        <translation>Goldstandard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="97"/>
        <source>Coder %1</source>
        <translation>Codierende %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="100"/>
        <source>Run %1</source>
        <translation>Lauf %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="147"/>
        <source>No error of the run on this article.</source>
        <translation>Kein Fehler des Laufs in diesem Artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="161"/>
        <source>coder %1</source>
        <translation>Codierende %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="170"/>
        <source>&lt;b&gt;False positive.&lt;/b&gt; The run marks “%1” as %2; %3 has no span there.</source>
        <translation>&lt;b&gt;Falsch positiv.&lt;/b&gt; Der Lauf markiert „%1“ als %2; %3 hat dort keine Textstelle.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="173"/>
        <source>&lt;b&gt;Miss.&lt;/b&gt; %1 marks “%2” as %3; the run has no span there.</source>
        <translation>&lt;b&gt;Verfehlt.&lt;/b&gt; %1 markiert „%2“ als %3; der Lauf hat dort keine Textstelle.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="177"/>
        <source>&lt;b&gt;Wrong function.&lt;/b&gt; %1 marks “%2” as %3; the run marks “%4” as %5.</source>
        <translation>&lt;b&gt;Falsche Funktion.&lt;/b&gt; %1 markiert „%2“ als %3; der Lauf markiert „%4“ als %5.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="186"/>
        <source>at the same place</source>
        <translation>an derselben Stelle</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="187"/>
        <source>%n character(s) earlier</source>
        <translation>
            <numerusform>%n Zeichen früher</numerusform>
            <numerusform>%n Zeichen früher</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="188"/>
        <source>%n character(s) later</source>
        <translation>
            <numerusform>%n Zeichen später</numerusform>
            <numerusform>%n Zeichen später</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="193"/>
        <source>&lt;b&gt;Boundary.&lt;/b&gt; Both mark %1 here. Compared with the span of %2, the run&apos;s starts %3 and ends %4.&lt;br&gt;%5: “%6” %7&lt;br&gt;Run: “%8” %9</source>
        <translation>&lt;b&gt;Grenze.&lt;/b&gt; Beide markieren hier %1. Verglichen mit der Textstelle von %2 beginnt die des Laufs %3 und endet %4.&lt;br&gt;%5: „%6“ %7&lt;br&gt;Lauf: „%8“ %9</translation>
    </message>
</context>
<context>
    <name>fourfold::SpanEditor</name>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="95"/>
        <source>judges</source>
        <translation>bewertet</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="95"/>
        <source>judged by</source>
        <translation>bewertet von</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="97"/>
        <source>addresses</source>
        <translation>behandelt</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="97"/>
        <source>addressed by</source>
        <translation>behandelt von</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="98"/>
        <source>%1 →</source>
        <translation>%1 →</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="98"/>
        <source>← %1</source>
        <translation>← %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="107"/>
        <source>Span editor</source>
        <translation>Textstellen-Editor</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="113"/>
        <source>No span selected.

Click a span in the text or on the frame card to edit it, or select text and press 1–4 to code it.</source>
        <translation>Keine Textstelle ausgewählt.

Klicken Sie auf eine Textstelle im Text oder auf der Frame-Karte, um sie zu bearbeiten, oder wählen Sie Text aus und drücken Sie 1&#xa0;bis&#xa0;4, um ihn zu codieren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="179"/>
        <source>Another coder&apos;s span: shown, not editable.</source>
        <translation>Textstelle einer anderen codierenden Person: sichtbar, nicht bearbeitbar.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="196"/>
        <source>Function: %1</source>
        <translation>Funktion: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="200"/>
        <source>&amp;Function:</source>
        <translation>&amp;Funktion:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="207"/>
        <source>Note</source>
        <translation>Notiz</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="211"/>
        <source>&amp;Note:</source>
        <translation>&amp;Notiz:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="216"/>
        <source>Confidence</source>
        <translation>Sicherheit</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="220"/>
        <location filename="../app/desktop/span_editor.cpp" line="389"/>
        <location filename="../app/desktop/span_editor.cpp" line="397"/>
        <source>not set</source>
        <translation>nicht angegeben</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="223"/>
        <source>How sure you are of this span, from 0 (a guess) to 1 (certain).</source>
        <translation>Wie sicher Sie sich bei dieser Textstelle sind, von 0 (geraten) bis 1 (sicher).</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="224"/>
        <source>&amp;Confidence:</source>
        <translation>&amp;Sicherheit:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="233"/>
        <source>Links</source>
        <translation>Verknüpfungen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="235"/>
        <source>Links start from an evaluation (to the cause it judges) or from a remedy (to the problem it addresses).</source>
        <translation>Verknüpfungen gehen von einer Bewertung (zur bewerteten Ursache) oder von einer Lösung (zum behandelten Problem) aus.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="245"/>
        <source>Span to link to</source>
        <translation>Zu verknüpfende Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="249"/>
        <source>&amp;Link</source>
        <translation>&amp;Verknüpfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="250"/>
        <source>Link to the chosen span</source>
        <translation>Mit der gewählten Textstelle verknüpfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="262"/>
        <source>Links of this span</source>
        <translation>Verknüpfungen dieser Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="270"/>
        <source>No links yet.</source>
        <translation>Noch keine Verknüpfungen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="273"/>
        <location filename="../app/desktop/span_editor.cpp" line="295"/>
        <source>&amp;Remove link</source>
        <translation>Verknüpfung &amp;entfernen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="274"/>
        <source>Remove the chosen link</source>
        <translation>Die gewählte Verknüpfung entfernen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="408"/>
        <source>%1:</source>
        <translation>%1:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="462"/>
        <source>No note.</source>
        <translation>Keine Notiz.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="462"/>
        <source>Why this span, doubts, a question for the lead…</source>
        <translation>Warum diese Textstelle, Zweifel, eine Frage an die Leitung…</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="480"/>
        <source>&amp;Judges:</source>
        <translation>Be&amp;wertet:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="480"/>
        <source>&amp;Addresses:</source>
        <translation>Behan&amp;delt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="482"/>
        <source>no cause span to link</source>
        <translation>keine Ursachen-Textstelle zum Verknüpfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="482"/>
        <source>no problem span to link</source>
        <translation>keine Problem-Textstelle zum Verknüpfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="512"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="528"/>
        <source>a span not shown here</source>
        <translation>eine hier nicht angezeigte Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="529"/>
        <source>%1 %2</source>
        <translation>%1 %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="310"/>
        <source>Remove link: %1</source>
        <translation>Verknüpfung entfernen: %1</translation>
    </message>
</context>
<context>
    <name>fourfold::StudyDesignWindow</name>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="117"/>
        <source>Study design — %1</source>
        <translation>Studiendesign — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="119"/>
        <source>Plan who codes what: draw the reliability sample that every reliability coder codes, deal the rest of the articles, and keep the codebook&apos;s versions in view. Nothing is written until you commit a plan.</source>
        <translation>Planen Sie, wer was codiert: Ziehen Sie die Reliabilitätsstichprobe, die alle Reliabilitätscodierenden codieren, verteilen Sie die übrigen Artikel und behalten Sie die Versionen des Codebuchs im Blick. Gespeichert wird erst, wenn Sie einen Plan festschreiben.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="128"/>
        <source>Reliability sample</source>
        <translation>Reliabilitätsstichprobe</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="129"/>
        <source>Assign the rest</source>
        <translation>Rest zuweisen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="130"/>
        <source>Assignments</source>
        <translation>Zuweisungen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="131"/>
        <source>Codebook versions</source>
        <translation>Codebuchversionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="181"/>
        <source>lead</source>
        <translation>Leitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="181"/>
        <source>coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="211"/>
        <source>The seed must be a whole number from 0 to 18446744073709551615; &quot;%1&quot; is not.</source>
        <translation>Der Seed muss eine ganze Zahl von 0 bis 18446744073709551615 sein; „%1“ ist das nicht.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="231"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="341"/>
        <source>Draw</source>
        <translation>Ziehen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="237"/>
        <source>A pilot sample is coded before the codebook is final and is not part of the reliability sample.</source>
        <translation>Eine Pilotstichprobe wird codiert, bevor das Codebuch endgültig ist, und gehört nicht zur Reliabilitätsstichprobe.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="239"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="805"/>
        <source>Phase:</source>
        <translation>Phase:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="244"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="807"/>
        <source>Articles:</source>
        <translation>Artikel:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="246"/>
        <source>Share of the frame:</source>
        <translation>Anteil der Auswahlgesamtheit:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="269"/>
        <source>Size:</source>
        <translation>Umfang:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="273"/>
        <source>Simple random sample</source>
        <translation>Einfache Zufallsstichprobe</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="274"/>
        <source>Stratified by outlet</source>
        <translation>Geschichtet nach Medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="275"/>
        <source>Stratified by language</source>
        <translation>Geschichtet nach Sprache</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="276"/>
        <source>Stratified by topic</source>
        <translation>Geschichtet nach Thema</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="277"/>
        <source>Stratified draws allocate the sample to each group in proportion to its size in the frame.</source>
        <translation>Geschichtete Ziehungen teilen die Stichprobe jeder Gruppe proportional zu ihrer Größe in der Auswahlgesamtheit zu.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="279"/>
        <source>Method:</source>
        <translation>Methode:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="281"/>
        <source>Leave near copies out of the sampling frame</source>
        <translation>Beinahe-Kopien aus der Auswahlgesamtheit auslassen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="284"/>
        <source>An article found at import to be a near copy of an older one (the same story with small edits) is not drawn; the older article stays in the frame.</source>
        <translation>Ein Artikel, der beim Import als Beinahe-Kopie eines älteren erkannt wurde (dieselbe Geschichte mit kleinen Änderungen), wird nicht gezogen; der ältere Artikel bleibt in der Auswahlgesamtheit.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="293"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="646"/>
        <source>Seed</source>
        <translation>Seed</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="295"/>
        <source>New seed</source>
        <translation>Neuer Seed</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="300"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="648"/>
        <source>Seed:</source>
        <translation>Seed:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="301"/>
        <source>The seed is recorded with the draw: the same seed on the same project draws the same articles on any computer.</source>
        <translation>Der Seed wird mit der Ziehung gespeichert: Derselbe Seed zieht im selben Projekt auf jedem Computer dieselben Artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="307"/>
        <source>Reliability coders</source>
        <translation>Reliabilitätscodierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="309"/>
        <source>Coded by all of:</source>
        <translation>Codiert von allen:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="311"/>
        <source>Minimum sample (Krippendorff)</source>
        <translation>Mindeststichprobe (Krippendorff)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="320"/>
        <source>The smallest alpha you would still accept: 0.800 for firm conclusions, 0.667 for tentative ones (Krippendorff).</source>
        <translation>Das kleinste Alpha, das Sie noch akzeptieren würden: 0.800 für belastbare Schlüsse, 0.667 für vorläufige (Krippendorff).</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="322"/>
        <source>α_min:</source>
        <translation>α_min:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="327"/>
        <source>Significance level:</source>
        <translation>Signifikanzniveau:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="335"/>
        <source>The expected share of the rarest value: 0.25 when four values are equally frequent.</source>
        <translation>Der erwartete Anteil des seltensten Werts: 0.25, wenn vier Werte gleich häufig sind.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="337"/>
        <source>Rarest value&apos;s share:</source>
        <translation>Anteil seltenster Wert:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="343"/>
        <source>Draw the sample and show it; nothing is written yet.</source>
        <translation>Stichprobe ziehen und anzeigen; noch wird nichts gespeichert.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="344"/>
        <source>Commit the draw</source>
        <translation>Ziehung festschreiben</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="346"/>
        <source>Assign the drawn articles to every chosen coder and record the draw with its seed.</source>
        <translation>Die gezogenen Artikel allen gewählten Codierenden zuweisen und die Ziehung mit ihrem Seed speichern.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="382"/>
        <source>Stratum</source>
        <translation>Schicht</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="382"/>
        <source>In the frame</source>
        <translation>In der Auswahlgesamtheit</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="382"/>
        <source>Drawn</source>
        <translation>Gezogen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="384"/>
        <source>Drawn articles:</source>
        <translation>Gezogene Artikel:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="387"/>
        <source>Drawn articles</source>
        <translation>Gezogene Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="445"/>
        <source>&lt;b&gt;No sample is drawn yet for the phase %1.&lt;/b&gt; Choose the size, method, seed and coders, then press &lt;i&gt;Draw&lt;/i&gt; to see the sample and whether it is large enough.</source>
        <translation>&lt;b&gt;Für die Phase %1 ist noch keine Stichprobe gezogen.&lt;/b&gt; Wählen Sie Umfang, Methode, Seed und Codierende und drücken Sie dann &lt;i&gt;Ziehen&lt;/i&gt;, um die Stichprobe zu sehen und ob sie groß genug ist.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="526"/>
        <source>simple random sample</source>
        <translation>einfache Zufallsstichprobe</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="528"/>
        <source>stratified by outlet</source>
        <translation>geschichtet nach Medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="530"/>
        <source>stratified by language</source>
        <translation>geschichtet nach Sprache</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="532"/>
        <source>stratified by topic</source>
        <translation>geschichtet nach Thema</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="533"/>
        <source>%n article(s) of a frame of %1, %2, seed %3, coded by %4.</source>
        <translation>
            <numerusform>%n Artikel aus einer Auswahlgesamtheit von %1, %2, Seed %3, codiert von %4.</numerusform>
            <numerusform>%n Artikel aus einer Auswahlgesamtheit von %1, %2, Seed %3, codiert von %4.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="541"/>
        <source>&lt;b&gt;%1 sample drawn on %2.&lt;/b&gt; %3 The draw is recorded; it can be withdrawn until someone codes one of its articles, and then drawn again.</source>
        <translation>&lt;b&gt;Stichprobe der Phase %1 gezogen am %2.&lt;/b&gt; %3 Die Ziehung ist gespeichert; sie kann zurückgezogen werden, bis jemand einen ihrer Artikel codiert, und dann neu gezogen werden.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="547"/>
        <source>&lt;b&gt;Planned draw, not yet committed.&lt;/b&gt; %1 Press &lt;i&gt;Commit the draw&lt;/i&gt; to assign it.</source>
        <translation>&lt;b&gt;Geplante Ziehung, noch nicht festgeschrieben.&lt;/b&gt; %1 Drücken Sie &lt;i&gt;Ziehung festschreiben&lt;/i&gt;, um sie zuzuweisen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="556"/>
        <source>No minimum sample can be computed for these settings.</source>
        <translation>Für diese Einstellungen lässt sich keine Mindeststichprobe berechnen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="558"/>
        <source>&lt;b&gt;Krippendorff&apos;s minimum: %1 values&lt;/b&gt; per variable for α_min = %2 at p = %3, with the rarest value at %4 %.</source>
        <translation>&lt;b&gt;Krippendorffs Minimum: %1 Werte&lt;/b&gt; je Variable für α_min = %2 bei p = %3, mit dem seltensten Wert bei %4 %.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="567"/>
        <source>Unit</source>
        <translation>Einheit</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="567"/>
        <source>Values the draw delivers</source>
        <translation>Werte aus der Ziehung</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="571"/>
        <source>✓ enough</source>
        <translation>✓ genug</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="572"/>
        <source>✗ %n short</source>
        <translation>
            <numerusform>✗ %n zu wenig</numerusform>
            <numerusform>✗ %n zu wenig</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="580"/>
        <source>Article-level items</source>
        <translation>Items auf Artikelebene</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="581"/>
        <source>Paragraphs</source>
        <translation>Absätze</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="582"/>
        <source>Sentences</source>
        <translation>Sätze</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="585"/>
        <source>Values are units × coders. For spans, count the codings of each function: a rare function (often the remedy) may need a larger or stratified sample.</source>
        <translation>Werte sind Einheiten × Codierende. Zählen Sie bei Textstellen die Codierungen jeder Funktion: Eine seltene Funktion (oft die Lösung) kann eine größere oder geschichtete Stichprobe erfordern.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="622"/>
        <source>Deal the rest</source>
        <translation>Rest verteilen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="624"/>
        <source>Every article with no assignment yet goes to production coding, shuffled with the seed and dealt in turn.</source>
        <translation>Jeder noch nicht zugewiesene Artikel geht in die Hauptcodierung, mit dem Seed gemischt und reihum verteilt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="630"/>
        <source>Single-coded: one coder per article</source>
        <translation>Einfach codiert: eine Person je Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="633"/>
        <source>Double-coded: two coders per article, pairs rotating</source>
        <translation>Doppelt codiert: zwei Personen je Artikel, wechselnde Paare</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="638"/>
        <source>Coding:</source>
        <translation>Codierung:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="641"/>
        <source>Production coders</source>
        <translation>Codierende der Hauptcodierung</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="643"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="813"/>
        <source>Coders:</source>
        <translation>Codierende:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="650"/>
        <source>Plan</source>
        <translation>Planen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="652"/>
        <source>Assign</source>
        <translation>Zuweisen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="672"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="786"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="970"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="672"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="775"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="786"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="970"/>
        <source>Coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="691"/>
        <source>Press &lt;i&gt;Plan&lt;/i&gt; to see who would code which article.</source>
        <translation>Drücken Sie &lt;i&gt;Planen&lt;/i&gt;, um zu sehen, wer welchen Artikel codieren würde.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="731"/>
        <source>Every article is assigned already: there is no rest to deal.</source>
        <translation>Jeder Artikel ist bereits zugewiesen: Es gibt keinen Rest zu verteilen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="736"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="737"/>
        <source>&lt;b&gt;Planned, not yet assigned:&lt;/b&gt; %n article(s); load per coder %1. Press &lt;i&gt;Assign&lt;/i&gt; to write the plan.</source>
        <translation>
            <numerusform>&lt;b&gt;Geplant, noch nicht zugewiesen:&lt;/b&gt; %n Artikel; Last je Person %1. Drücken Sie &lt;i&gt;Zuweisen&lt;/i&gt;, um den Plan zu speichern.</numerusform>
            <numerusform>&lt;b&gt;Geplant, noch nicht zugewiesen:&lt;/b&gt; %n Artikel; Last je Person %1. Drücken Sie &lt;i&gt;Zuweisen&lt;/i&gt;, um den Plan zu speichern.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="760"/>
        <source>The rest is assigned.</source>
        <translation>Der Rest ist zugewiesen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="774"/>
        <source>&lt;b&gt;Articles per coder and phase&lt;/b&gt; (done / assigned)</source>
        <translation>&lt;b&gt;Artikel je Person und Phase&lt;/b&gt; (erledigt / zugewiesen)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="778"/>
        <source>Total</source>
        <translation>Gesamt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="785"/>
        <source>&lt;b&gt;Every assignment&lt;/b&gt;</source>
        <translation>&lt;b&gt;Alle Zuweisungen&lt;/b&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="786"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="970"/>
        <source>Phase</source>
        <translation>Phase</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="786"/>
        <source>Status</source>
        <translation>Status</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="795"/>
        <source>Give articles to coders</source>
        <translation>Artikel an Codierende geben</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="797"/>
        <source>Every chosen coder gets every chosen article, e.g. the training articles that the lead has master-coded.</source>
        <translation>Alle gewählten Codierenden erhalten alle gewählten Artikel, z.&#xa0;B. die Trainingsartikel, für die die Leitung eine Mastercodierung erstellt hat.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="810"/>
        <source>Articles to give</source>
        <translation>Zu vergebende Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="816"/>
        <source>Coders to give to</source>
        <translation>Empfangende Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="818"/>
        <source>Give</source>
        <translation>Vergeben</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="848"/>
        <source>done</source>
        <translation>erledigt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="849"/>
        <source>started</source>
        <translation>begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="850"/>
        <source>not started</source>
        <translation>nicht begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="907"/>
        <source>Every chosen coder has every chosen article in this phase already.</source>
        <translation>Alle gewählten Codierenden haben alle gewählten Artikel in dieser Phase bereits.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="929"/>
        <source>Version</source>
        <translation>Version</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="929"/>
        <source>Made</source>
        <translation>Erstellt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="929"/>
        <source>By</source>
        <translation>Von</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="929"/>
        <source>Note</source>
        <translation>Notiz</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="933"/>
        <source>Add a version from a file…</source>
        <translation>Version aus Datei hinzufügen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="935"/>
        <source>Read a codebook JSON file and store it as the next version, with a note that says what changed and why.</source>
        <translation>Eine Codebuch-JSON-Datei einlesen und als nächste Version speichern, mit einer Notiz, was sich geändert hat und warum.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="948"/>
        <source>Compare version</source>
        <translation>Version vergleichen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="950"/>
        <source>with</source>
        <translation>mit</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="958"/>
        <source>Changes between the versions</source>
        <translation>Änderungen zwischen den Versionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="966"/>
        <source>Only those to re-check</source>
        <translation>Nur erneut zu prüfende</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="970"/>
        <source>Function</source>
        <translation>Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="970"/>
        <source>Made under</source>
        <translation>Erstellt unter</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="970"/>
        <source>Re-check</source>
        <translation>Erneut prüfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1040"/>
        <source>yes — its function changed</source>
        <translation>ja — ihre Funktion hat sich geändert</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1040"/>
        <source>no</source>
        <translation>nein</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1050"/>
        <source>&lt;b&gt;Every annotation was made under the current version (%1).&lt;/b&gt;</source>
        <translation>&lt;b&gt;Alle Annotationen wurden unter der aktuellen Version (%1) erstellt.&lt;/b&gt;</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="1051"/>
        <source>&lt;b&gt;%n annotation(s) were made under an older version&lt;/b&gt; than the current one (%1); %2 of them belong to a function whose definition, rules, examples or attributes changed since, and should be re-checked.</source>
        <translation>
            <numerusform>&lt;b&gt;%n Annotation wurde unter einer älteren Version&lt;/b&gt; als der aktuellen (%1) erstellt; %2 davon gehören zu einer Funktion, deren Definition, Regeln, Beispiele oder Merkmale sich seither geändert haben, und sollten erneut geprüft werden.</numerusform>
            <numerusform>&lt;b&gt;%n Annotationen wurden unter einer älteren Version&lt;/b&gt; als der aktuellen (%1) erstellt; %2 davon gehören zu einer Funktion, deren Definition, Regeln, Beispiele oder Merkmale sich seither geändert haben, und sollten erneut geprüft werden.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1066"/>
        <source>&lt;p&gt;There is only version %1: nothing to compare yet. Add a version when the codebook changes.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Es gibt nur Version %1: noch nichts zu vergleichen. Fügen Sie eine Version hinzu, wenn sich das Codebuch ändert.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1070"/>
        <source>&lt;p&gt;Choose two different versions to compare.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Wählen Sie zwei verschiedene Versionen zum Vergleichen.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1079"/>
        <source>Codebook version %1 → %2</source>
        <translation>Codebuchversion %1 → %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1081"/>
        <source>&lt;p&gt;No changes.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Keine Änderungen.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1089"/>
        <source>added</source>
        <translation>hinzugefügt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1093"/>
        <source>removed</source>
        <translation>entfernt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1097"/>
        <source>changed</source>
        <translation>geändert</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1122"/>
        <source>item removed:</source>
        <translation>Item entfernt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1126"/>
        <source>item added:</source>
        <translation>Item hinzugefügt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1130"/>
        <source>the order changed</source>
        <translation>die Reihenfolge hat sich geändert</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1134"/>
        <source>was:</source>
        <translation>vorher:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1137"/>
        <source>now:</source>
        <translation>jetzt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1149"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1153"/>
        <source>Add a codebook version</source>
        <translation>Codebuchversion hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1149"/>
        <source>Codebooks (*.json)</source>
        <translation>Codebücher (*.json)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1154"/>
        <source>What changed, and why?</source>
        <translation>Was hat sich geändert, und warum?</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="349"/>
        <source>Withdraw the draw</source>
        <translation>Ziehung zurückziehen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="352"/>
        <source>Remove the committed draw and its assignments, so that the phase can be drawn again; only while nobody has coded any of its articles.</source>
        <translation>Die gespeicherte Ziehung und ihre Zuweisungen entfernen, damit die Phase neu gezogen werden kann; nur solange niemand einen ihrer Artikel codiert hat.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="512"/>
        <source>&lt;b&gt;The %1 sample was withdrawn&lt;/b&gt;: %n assignment(s) removed, the withdrawal recorded in the project&apos;s log. The phase can be drawn again.</source>
        <translation>
            <numerusform>&lt;b&gt;Die Stichprobe der Phase %1 wurde zurückgezogen&lt;/b&gt;: %n Zuweisung entfernt, das Zurückziehen im Protokoll des Projekts festgehalten. Die Phase kann neu gezogen werden.</numerusform>
            <numerusform>&lt;b&gt;Die Stichprobe der Phase %1 wurde zurückgezogen&lt;/b&gt;: %n Zuweisungen entfernt, das Zurückziehen im Protokoll des Projekts festgehalten. Die Phase kann neu gezogen werden.</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>fourfold::TrainingFeedbackDialog</name>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="39"/>
        <source>Training feedback — %1</source>
        <translation>Trainingsfeedback — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="47"/>
        <source>Compared per:</source>
        <translation>Verglichen je:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="50"/>
        <source>Unit</source>
        <translation>Einheit</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="51"/>
        <source>sentence</source>
        <translation>Satz</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="52"/>
        <source>paragraph</source>
        <translation>Absatz</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="53"/>
        <source>word</source>
        <translation>Wort</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="60"/>
        <source>Agreement per function</source>
        <translation>Übereinstimmung je Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="61"/>
        <source>Function</source>
        <translation>Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="61"/>
        <source>Same as the master</source>
        <translation>Wie der Master</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="61"/>
        <source>α</source>
        <translation>α</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="62"/>
        <source>You marked / master marked</source>
        <translation>Sie markiert / Master markiert</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="62"/>
        <source>What it suggests</source>
        <translation>Was es nahelegt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="71"/>
        <source>Most units carry no function, so &quot;same as the master&quot; is high even when your spans differ; α corrects for that agreement by chance (Krippendorff). Aim for α of 0.800 or more.</source>
        <translation>Die meisten Einheiten tragen keine Funktion, daher ist „wie der Master“ hoch, auch wenn Ihre Textstellen abweichen; α korrigiert diese zufällige Übereinstimmung (Krippendorff). Ziel ist ein α von 0.800 oder mehr.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="85"/>
        <source>On to the real work</source>
        <translation>Weiter zur eigentlichen Arbeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="123"/>
        <source>&lt;b&gt;No feedback yet.&lt;/b&gt; %1</source>
        <translation>&lt;b&gt;Noch kein Feedback.&lt;/b&gt; %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="131"/>
        <source>&lt;b&gt;No finished training article to compare yet.&lt;/b&gt; Feedback comes once you mark a training article as done.</source>
        <translation>&lt;b&gt;Noch kein abgeschlossener Trainingsartikel zum Vergleichen.&lt;/b&gt; Feedback gibt es, sobald Sie einen Trainingsartikel als erledigt markieren.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="135"/>
        <source>&lt;b&gt;%1, your coding of %n training article(s) compared with the master coding of %2&lt;/b&gt;, %3 by %3: in how many did you and the master agree on whether the function is there?</source>
        <translation>
            <numerusform>&lt;b&gt;%1, Ihre Codierung von %n Trainingsartikel verglichen mit der Mastercodierung von %2&lt;/b&gt;, %3 für %3: In wie vielen stimmten Sie und der Master darin überein, ob die Funktion vorliegt?</numerusform>
            <numerusform>&lt;b&gt;%1, Ihre Codierung von %n Trainingsartikeln verglichen mit der Mastercodierung von %2&lt;/b&gt;, %3 für %3: In wie vielen stimmten Sie und der Master darin überein, ob die Funktion vorliegt?</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="158"/>
        <source>%1 % (%2 of %3)</source>
        <translation>%1 % (%2 von %3)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="174"/>
        <source>%1 / %2</source>
        <translation>%1 / %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="180"/>
        <source>nothing to compare</source>
        <translation>nichts zu vergleichen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="182"/>
        <source>close to the master</source>
        <translation>nah am Master</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="184"/>
        <source>you mark it more often than the master: re-read the exclusion rules</source>
        <translation>Sie markieren sie öfter als der Master: Ausschlussregeln erneut lesen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="186"/>
        <source>you miss some: re-read the definition and examples</source>
        <translation>Sie übersehen einige: Definition und Beispiele erneut lesen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="188"/>
        <source>as often, but in other places: compare your spans with the lead&apos;s</source>
        <translation>gleich oft, aber an anderen Stellen: Vergleichen Sie Ihre Textstellen mit denen der Leitung</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="195"/>
        <source>You have %n training article(s) still open. Finish them before the real work starts.</source>
        <translation>
            <numerusform>Sie haben noch %n offenen Trainingsartikel. Schließen Sie ihn ab, bevor die eigentliche Arbeit beginnt.</numerusform>
            <numerusform>Sie haben noch %n offene Trainingsartikel. Schließen Sie sie ab, bevor die eigentliche Arbeit beginnt.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="201"/>
        <source>Training is complete. Talk over the functions with low agreement with your lead, then go on to your assigned articles.</source>
        <translation>Das Training ist abgeschlossen. Besprechen Sie die Funktionen mit geringer Übereinstimmung mit der Leitung und fahren Sie dann mit Ihren zugewiesenen Artikeln fort.</translation>
    </message>
</context>
<context>
    <name>main</name>
    <message>
        <location filename="../app/desktop/main.cpp" line="29"/>
        <source>Fourfold: manual frame analysis of news and opinion articles.</source>
        <translation>Fourfold: manuelle Frame-Analyse von Nachrichten- und Meinungsartikeln.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="33"/>
        <source>Code as the coder with this pseudonym.</source>
        <translation>Unter diesem Pseudonym codieren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="37"/>
        <source>A project file to open (*.fourfold).</source>
        <translation>Eine zu öffnende Projektdatei (*.fourfold).</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="46"/>
        <source>Cannot open project</source>
        <translation>Projekt kann nicht geöffnet werden</translation>
    </message>
</context>
</TS>
