<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="nl">
<context>
    <name>AgreementReportText</name>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="39"/>
        <source>beyond a double</source>
        <translation>buiten het bereik van een double</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="85"/>
        <location filename="../core/agreement/agreement_report.cpp" line="103"/>
        <location filename="../core/agreement/agreement_report.cpp" line="277"/>
        <location filename="../core/agreement/agreement_report.cpp" line="305"/>
        <source>undefined</source>
        <translation>niet gedefinieerd</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="105"/>
        <source>reliable (≥ 0.800)</source>
        <translation>betrouwbaar (≥ 0.800)</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="107"/>
        <source>tentative conclusions only (0.667–0.800)</source>
        <translation>alleen voorlopige conclusies (0.667–0.800)</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="111"/>
        <source>unreliable (&lt; 0.667)</source>
        <translation>onbetrouwbaar (&lt; 0.667)</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="241"/>
        <source>Coders        %1 (%2)</source>
        <translation>Codeurs       %1 (%2)</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="244"/>
        <source>Units         %1; pairable units %2; pairable values %3</source>
        <translation>Eenheden      %1; paarbare eenheden %2; paarbare waarden %3</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="249"/>
        <source>Alpha (%1)  %2</source>
        <translation>Alfa (%1)   %2</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="266"/>
        <source>  95% CI      [%1, %2]  %3, %4 replicates, seed %5</source>
        <translation>  95%-BI      [%1, %2]  %3, %4 replicaties, seed %5</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="273"/>
        <source>Percent agreement  %1</source>
        <translation>Procentuele overeenstemming  %1</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="281"/>
        <source>, linear weights</source>
        <translation>, lineaire gewichten</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="282"/>
        <source>, quadratic weights</source>
        <translation>, kwadratische gewichten</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="284"/>
        <source>Cohen&apos;s kappa %1  (SE %2, 95% CI [%3, %4]%5)</source>
        <translation>Cohens kappa  %1  (SE %2, 95%-BI [%3, %4]%5)</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="289"/>
        <source>Scott&apos;s pi    %1</source>
        <translation>Scotts pi     %1</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="291"/>
        <source>Bennett&apos;s S   %1</source>
        <translation>Bennetts S    %1</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="293"/>
        <source>Fleiss&apos; kappa %1</source>
        <translation>Fleiss&apos; kappa %1</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="295"/>
        <source>Light&apos;s kappa %1</source>
        <translation>Lights kappa  %1</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="297"/>
        <source>Pairs</source>
        <translation>Paren</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="299"/>
        <source>  %1 × %2  units %3  agreement %4  kappa %5</source>
        <translation>  %1 × %2  eenheden %3  overeenstemming %4  kappa %5</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="309"/>
        <source>Sample size   %1 pairable values; Krippendorff&apos;s minimum for alpha ≥ %2 at p = 0.05 with the rarest value at %3%: %4</source>
        <translation>Steekproef    %1 paarbare waarden; Krippendorffs minimum voor alfa ≥ %2 bij p = 0.05 met de zeldzaamste waarde op %3%: %4</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_report.cpp" line="317"/>
        <source> — the sample is too small</source>
        <translation> — de steekproef is te klein</translation>
    </message>
</context>
<context>
    <name>AgreementRunText</name>
    <message>
        <location filename="../core/agreement/agreement_run.cpp" line="158"/>
        <source>The continuum is compared with unitizing alpha, not as a table of units.</source>
        <translation>Het continuüm wordt vergeleken met unitizing-alfa, niet als tabel van eenheden.</translation>
    </message>
    <message>
        <location filename="../core/agreement/agreement_run.cpp" line="197"/>
        <source>The continuum could not be compared.</source>
        <translation>Het continuüm kon niet worden vergeleken.</translation>
    </message>
</context>
<context>
    <name>AnnotationEditsText</name>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="29"/>
        <source>The span [%1, %2) does not lie inside the article&apos;s text of %3 characters.</source>
        <translation>Het fragment [%1, %2) ligt niet binnen de artikeltekst van %3 tekens.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="44"/>
        <source>Annotation #%1 has been deleted.</source>
        <translation>Annotatie #%1 is verwijderd.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="62"/>
        <source>A confidence must lie between 0 and 1.</source>
        <translation>Een betrouwbaarheidsscore moet tussen 0 en 1 liggen.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="83"/>
        <source>Add %1 span</source>
        <translation>%1-fragment toevoegen</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="100"/>
        <source>The span could not be added: its article or coder does not exist.</source>
        <translation>Het fragment kon niet worden toegevoegd: het artikel of de codeur ervan bestaat niet.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="123"/>
        <source>Change %1 span</source>
        <translation>%1-fragment wijzigen</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="145"/>
        <location filename="../core/project/annotation_edits.cpp" line="178"/>
        <location filename="../core/project/annotation_edits.cpp" line="358"/>
        <source>An edit that was never applied cannot be undone.</source>
        <translation>Een wijziging die nooit is uitgevoerd, kan niet ongedaan worden gemaakt.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="157"/>
        <source>Delete %1 span</source>
        <translation>%1-fragment verwijderen</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="158"/>
        <source>Delete span</source>
        <translation>Fragment verwijderen</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="195"/>
        <source>Link spans (%1)</source>
        <translation>Fragmenten koppelen (%1)</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="202"/>
        <source>A span cannot be linked to itself.</source>
        <translation>Een fragment kan niet aan zichzelf worden gekoppeld.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="204"/>
        <source>A link needs a type.</source>
        <translation>Een koppeling heeft een type nodig.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="213"/>
        <source>Only spans of the same article can be linked.</source>
        <translation>Alleen fragmenten van hetzelfde artikel kunnen worden gekoppeld.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="233"/>
        <source>Remove link (%1)</source>
        <translation>Koppeling verwijderen (%1)</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="242"/>
        <source>The link was removed already.</source>
        <translation>De koppeling is al verwijderd.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="268"/>
        <source>Answer &quot;%1&quot;</source>
        <translation>Antwoord ‘%1’</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="302"/>
        <source>The answer could not be stored: its article or coder does not exist.</source>
        <translation>Het antwoord kon niet worden opgeslagen: het artikel of de codeur ervan bestaat niet.</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="331"/>
        <source>Withdraw answer &quot;%1&quot;</source>
        <translation>Antwoord ‘%1’ intrekken</translation>
    </message>
    <message>
        <location filename="../core/project/annotation_edits.cpp" line="345"/>
        <source>There is no answer to &quot;%1&quot; to withdraw.</source>
        <translation>Er is geen antwoord op ‘%1’ om in te trekken.</translation>
    </message>
</context>
<context>
    <name>AnnotationTable</name>
    <message>
        <location filename="../core/store/annotation_table.cpp" line="60"/>
        <source>There is no %1 #%2 in the project.</source>
        <translation>Er is geen %1 #%2 in het project.</translation>
    </message>
    <message>
        <location filename="../core/store/annotation_table.cpp" line="154"/>
        <source>There is no annotation #%1 in the project.</source>
        <translation>Er is geen annotatie #%1 in het project.</translation>
    </message>
    <message>
        <location filename="../core/store/annotation_table.cpp" line="273"/>
        <source>There is no link #%1 in the project.</source>
        <translation>Er is geen koppeling #%1 in het project.</translation>
    </message>
</context>
<context>
    <name>ArticleReader</name>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="144"/>
        <source>a double quote inside a field that does not begin with one; enclose the field in double quotes and write the inner quote twice (RFC 4180)</source>
        <translation>een dubbel aanhalingsteken in een veld dat er niet mee begint; zet het veld tussen dubbele aanhalingstekens en schrijf het binnenste aanhalingsteken twee keer (RFC 4180)</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="169"/>
        <source>unexpected character after the closing double quote of a field (opened at line %1, column %2); a double quote inside a quoted field must be written twice (RFC 4180)</source>
        <translation>onverwacht teken na het afsluitende dubbele aanhalingsteken van een veld (geopend op regel %1, kolom %2); een dubbel aanhalingsteken binnen een veld tussen aanhalingstekens moet twee keer worden geschreven (RFC 4180)</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="204"/>
        <source>the quoted field that begins here is never closed: a closing double quote is missing</source>
        <translation>het veld tussen aanhalingstekens dat hier begint, wordt nooit gesloten: een afsluitend dubbel aanhalingsteken ontbreekt</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="231"/>
        <source>column %1 of the header has no name</source>
        <translation>kolom %1 van de kopregel heeft geen naam</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="237"/>
        <source>the header names column &quot;%1&quot; twice (columns %2 and %3)</source>
        <translation>de kopregel noemt kolom ‘%1’ twee keer (kolommen %2 en %3)</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="258"/>
        <source>the header has no column &quot;%1&quot; (the column for the field &quot;%2&quot;); it has %3</source>
        <translation>de kopregel heeft geen kolom ‘%1’ (de kolom voor het veld ‘%2’); hij heeft %3</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="262"/>
        <source>the header has no column &quot;%1&quot;, which is required; it has %2</source>
        <translation>de kopregel heeft geen kolom ‘%1’, die verplicht is; hij heeft %2</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="270"/>
        <source>The header seems to be separated by &quot;%1&quot;; only commas separate fields (RFC 4180).</source>
        <translation>De kopregel lijkt gescheiden door ‘%1’; alleen komma&apos;s scheiden velden (RFC 4180).</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="298"/>
        <source>unknown field &quot;%1&quot; in the CSV column mapping; the fields are id, title, text, outlet, published and language</source>
        <translation>onbekend veld ‘%1’ in de CSV-kolomtoewijzing; de velden zijn id, title, text, outlet, published en language</translation>
    </message>
    <message>
        <location filename="../core/io/csv_reader.cpp" line="318"/>
        <source>the record has %1 fields but the header has %2</source>
        <translation>het record heeft %1 velden, maar de kopregel %2</translation>
    </message>
    <message>
        <location filename="../core/io/html_reader.cpp" line="444"/>
        <source>the page is too large for the HTML parser once its CDATA sections are escaped</source>
        <translation>de pagina is te groot voor de HTML-parser zodra de CDATA-secties ervan zijn geëscapet</translation>
    </message>
    <message>
        <location filename="../core/io/html_reader.cpp" line="449"/>
        <source>the HTML parser could not be started</source>
        <translation>de HTML-parser kon niet worden gestart</translation>
    </message>
    <message>
        <location filename="../core/io/html_reader.cpp" line="461"/>
        <source>the HTML parser stopped before the end of the page</source>
        <translation>de HTML-parser is gestopt vóór het einde van de pagina</translation>
    </message>
    <message>
        <location filename="../core/io/html_reader.cpp" line="482"/>
        <source>The page declares the character set &quot;%1&quot;; convert it to UTF-8 first.</source>
        <translation>De pagina geeft de tekenset ‘%1’ op; zet haar eerst om naar UTF-8.</translation>
    </message>
    <message>
        <location filename="../core/io/html_reader.cpp" line="497"/>
        <source>the file contains no articles: the page holds no text</source>
        <translation>het bestand bevat geen artikelen: de pagina bevat geen tekst</translation>
    </message>
    <message>
        <location filename="../core/io/html_reader.cpp" line="545"/>
        <source>the file contains no articles: the page holds no text outside scripts, styles, navigation, forms and other dropped elements</source>
        <translation>het bestand bevat geen artikelen: de pagina bevat geen tekst buiten scripts, stijlen, navigatie, formulieren en andere weggelaten elementen</translation>
    </message>
    <message>
        <location filename="../core/io/html_reader.cpp" line="570"/>
        <source>the HTML parser stopped before the end of the element&apos;s HTML</source>
        <translation>de HTML-parser is gestopt vóór het einde van de HTML van het element</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="51"/>
        <source>the line is longer than %1 MiB; a line may be at most %1 MiB</source>
        <translation>de regel is langer dan %1 MiB; een regel mag hoogstens %1 MiB lang zijn</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="84"/>
        <source>unknown field %1; the fields are &quot;id&quot;, &quot;title&quot;, &quot;text&quot;, &quot;outlet&quot;, &quot;published&quot;, &quot;language&quot; and &quot;meta&quot; (put further data inside &quot;meta&quot;)</source>
        <translation>onbekend veld %1; de velden zijn &quot;id&quot;, &quot;title&quot;, &quot;text&quot;, &quot;outlet&quot;, &quot;published&quot;, &quot;language&quot; en &quot;meta&quot; (zet verdere gegevens in &quot;meta&quot;)</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="90"/>
        <source>unknown fields %1; the fields are &quot;id&quot;, &quot;title&quot;, &quot;text&quot;, &quot;outlet&quot;, &quot;published&quot;, &quot;language&quot; and &quot;meta&quot; (put further data inside &quot;meta&quot;)</source>
        <translation>onbekende velden %1; de velden zijn &quot;id&quot;, &quot;title&quot;, &quot;text&quot;, &quot;outlet&quot;, &quot;published&quot;, &quot;language&quot; en &quot;meta&quot; (zet verdere gegevens in &quot;meta&quot;)</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="114"/>
        <source>missing required field &quot;%1&quot;</source>
        <translation>verplicht veld ‘%1’ ontbreekt</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="120"/>
        <source>field &quot;%1&quot; must be a string, got %2</source>
        <translation>veld ‘%1’ moet een tekenreeks zijn, maar is %2</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="122"/>
        <source>field &quot;%1&quot; must be a string or null, got %2</source>
        <translation>veld ‘%1’ moet een tekenreeks of null zijn, maar is %2</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="131"/>
        <source>field &quot;%1&quot; holds an unpaired surrogate escape (such as \ud800), which is not a character (RFC 8259, section 8.2)</source>
        <translation>veld ‘%1’ bevat een ongepaarde surrogaat-escape (zoals \ud800), die geen teken is (RFC 8259, sectie 8.2)</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="144"/>
        <source>field &quot;%1&quot; must be an object or null, got %2</source>
        <translation>veld ‘%1’ moet een object of null zijn, maar is %2</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="172"/>
        <source>the last line is truncated: the JSON ends before the object is complete (%1) and the file does not end with a line break</source>
        <translation>de laatste regel is afgebroken: de JSON eindigt voordat het object compleet is (%1) en het bestand eindigt niet met een regeleinde</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="180"/>
        <location filename="../core/io/jsonl_reader.cpp" line="189"/>
        <source>expected a JSON object, got %1</source>
        <translation>JSON-object verwacht, gekregen: %1</translation>
    </message>
    <message>
        <location filename="../core/io/jsonl_reader.cpp" line="184"/>
        <source>invalid JSON: %1</source>
        <translation>ongeldige JSON: %1</translation>
    </message>
    <message>
        <location filename="../core/io/office_metadata.cpp" line="76"/>
        <source>the document holds no text: it contains no articles</source>
        <translation>het document bevat geen tekst: het bevat geen artikelen</translation>
    </message>
    <message>
        <location filename="../core/io/text_reader.cpp" line="36"/>
        <source>the file contains no articles: it holds no text</source>
        <translation>het bestand bevat geen artikelen: het bevat geen tekst</translation>
    </message>
</context>
<context>
    <name>ArticleReaderText</name>
    <message>
        <location filename="../core/io/article_reader.cpp" line="36"/>
        <source>the file contains no articles</source>
        <translation>het bestand bevat geen artikelen</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="88"/>
        <source>the article has no id</source>
        <translation>het artikel heeft geen id</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="95"/>
        <source>the id &quot;%1&quot; holds a control character (U+%2); ids are one line of printable text</source>
        <translation>de id ‘%1’ bevat een stuurteken (U+%2); id&apos;s zijn één regel afdrukbare tekst</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="113"/>
        <source>the %1 of the article &quot;%2&quot; holds a NUL character (U+0000), which no text holds</source>
        <translation>de %1 van het artikel ‘%2’ bevat een NUL-teken (U+0000), dat in geen enkele tekst voorkomt</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="119"/>
        <source>the article &quot;%1&quot; has no text</source>
        <translation>het artikel ‘%1’ heeft geen tekst</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="124"/>
        <source>duplicate id &quot;%1&quot; (first seen on line %2)</source>
        <translation>dubbele id ‘%1’ (eerst gezien op regel %2)</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="157"/>
        <source>the XML root element &lt;%1&gt; is neither a feed&apos;s (&lt;rss&gt;, Atom&apos;s &lt;feed&gt;) nor a news item&apos;s (&lt;nitf&gt;, NewsML-G2&apos;s &lt;newsItem&gt; or &lt;newsMessage&gt;)</source>
        <translation>het XML-hoofdelement &lt;%1&gt; is niet dat van een feed (&lt;rss&gt;, Atoms &lt;feed&gt;) en niet dat van een nieuwsbericht (&lt;nitf&gt;, &lt;newsItem&gt; of &lt;newsMessage&gt; van NewsML-G2)</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="196"/>
        <source>the file is a zip archive but not a DOCX, ODT or EPUB document; choose the format if it is one</source>
        <translation>het bestand is een zip-archief, maar geen DOCX-, ODT- of EPUB-document; kies het formaat als het er een is</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="211"/>
        <source>the file is %1 MiB long; a file may be at most %2 MiB</source>
        <translation>het bestand is %1 MiB groot; een bestand mag hoogstens %2 MiB groot zijn</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="220"/>
        <source>the file is empty: it contains no articles</source>
        <translation>het bestand is leeg: het bevat geen artikelen</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="255"/>
        <source>the format cannot be told from the file name or its content; name the file .txt, .html, .jsonl, .csv, .rss, .atom, .docx, .odt, .pdf, .epub or .xml, or choose the format</source>
        <translation>het formaat is niet af te leiden uit de bestandsnaam of de inhoud; geef het bestand de extensie .txt, .html, .jsonl, .csv, .rss, .atom, .docx, .odt, .pdf, .epub of .xml, of kies het formaat</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="321"/>
        <source>the folder contains no .txt files</source>
        <translation>de map bevat geen .txt-bestanden</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="342"/>
        <source>duplicate id &quot;%1&quot; (first seen in %2)</source>
        <translation>dubbele id ‘%1’ (eerst gezien in %2)</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="362"/>
        <source>a split pattern cuts plain text, DOCX, ODT and PDF documents (told by their suffix); this file is %1</source>
        <translation>een splitspatroon knipt platte tekst en DOCX-, ODT- en PDF-documenten (herkend aan hun extensie); dit bestand is %1</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="364"/>
        <source>of another kind</source>
        <translation>van een andere soort</translation>
    </message>
    <message>
        <location filename="../core/io/article_reader.cpp" line="450"/>
        <source>a folder can only be read as plain text (its .txt files)</source>
        <translation>een map kan alleen als platte tekst worden gelezen (de .txt-bestanden ervan)</translation>
    </message>
    <message>
        <location filename="../core/io/chunked_input.cpp" line="26"/>
        <source>the file does not exist</source>
        <translation>het bestand bestaat niet</translation>
    </message>
    <message>
        <location filename="../core/io/chunked_input.cpp" line="35"/>
        <source>the file cannot be opened for reading</source>
        <translation>het bestand kan niet worden geopend om te lezen</translation>
    </message>
    <message>
        <location filename="../core/io/chunked_input.cpp" line="60"/>
        <source>the file cannot be read</source>
        <translation>het bestand kan niet worden gelezen</translation>
    </message>
    <message>
        <location filename="../core/io/csv_record_stream.cpp" line="119"/>
        <source>the record is longer than %1 MiB; a record may be at most %1 MiB</source>
        <translation>het record is langer dan %1 MiB; een record mag hoogstens %1 MiB lang zijn</translation>
    </message>
    <message>
        <location filename="../core/io/csv_record_stream.cpp" line="124"/>
        <source>the quoted field that begins here is not closed within %1 MiB, the most a record may hold: a closing double quote is missing</source>
        <translation>het veld tussen aanhalingstekens dat hier begint, wordt niet gesloten binnen %1 MiB, het maximum van een record: een afsluitend dubbel aanhalingsteken ontbreekt</translation>
    </message>
    <message>
        <location filename="../core/io/docx_reader.cpp" line="264"/>
        <source>the footnote %1 is referred to but %2 does not hold it</source>
        <translation>er wordt verwezen naar voetnoot %1, maar %2 bevat die niet</translation>
    </message>
    <message>
        <location filename="../core/io/docx_reader.cpp" line="266"/>
        <source>the endnote %1 is referred to but %2 does not hold it</source>
        <translation>er wordt verwezen naar eindnoot %1, maar %2 bevat die niet</translation>
    </message>
    <message>
        <location filename="../core/io/docx_reader.cpp" line="303"/>
        <source>the file is an OLE compound file, not a zip package: a password-protected (encrypted) Office document or an old binary .doc; save it as .docx without a password first</source>
        <translation>het bestand is een OLE-samengesteld bestand, geen zip-pakket: een met een wachtwoord beveiligd (versleuteld) Office-document of een oud binair .doc-bestand; sla het eerst op als .docx zonder wachtwoord</translation>
    </message>
    <message>
        <location filename="../core/io/docx_reader.cpp" line="321"/>
        <source>the archive holds no %1: it is not a word-processing document (DOCX)</source>
        <translation>het archief bevat geen %1: het is geen tekstverwerkingsdocument (DOCX)</translation>
    </message>
    <message>
        <location filename="../core/io/docx_reader.cpp" line="330"/>
        <source>the root element is &lt;%1&gt;, not WordprocessingML&apos;s &lt;w:document&gt;: the file is not a word-processing document</source>
        <translation>het hoofdelement is &lt;%1&gt;, niet &lt;w:document&gt; van WordprocessingML: het bestand is geen tekstverwerkingsdocument</translation>
    </message>
    <message>
        <location filename="../core/io/docx_reader.cpp" line="337"/>
        <source>the document has no &lt;w:body&gt;</source>
        <translation>het document heeft geen &lt;w:body&gt;</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="47"/>
        <source>the archive holds no META-INF/container.xml: it is not an EPUB publication</source>
        <translation>het archief bevat geen META-INF/container.xml: het is geen EPUB-publicatie</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="61"/>
        <source>it names no package document (&lt;rootfile media-type=&quot;application/oebps-package+xml&quot;&gt;)</source>
        <translation>het noemt geen pakketdocument (&lt;rootfile media-type=&quot;application/oebps-package+xml&quot;&gt;)</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="113"/>
        <source>the package is of the type &quot;%1&quot;, not an EPUB publication (%2)</source>
        <translation>het pakket is van het type ‘%1’, geen EPUB-publicatie (%2)</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="122"/>
        <source>the archive holds no %1, the package document META-INF/container.xml names</source>
        <translation>het archief bevat niet %1, het pakketdocument dat META-INF/container.xml noemt</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="134"/>
        <source>the root element is &lt;%1&gt;, not &lt;package&gt;</source>
        <translation>het hoofdelement is &lt;%1&gt;, niet &lt;package&gt;</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="174"/>
        <source>the package has no &lt;spine&gt;</source>
        <translation>het pakket heeft geen &lt;spine&gt;</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="187"/>
        <source>the spine refers to &quot;%1&quot;, which the manifest does not hold</source>
        <translation>de spine verwijst naar ‘%1’, dat niet in het manifest staat</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="195"/>
        <source>the spine&apos;s document %1 is not in the archive</source>
        <translation>het document %1 van de spine staat niet in het archief</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="198"/>
        <source>the chapter %1 is encrypted (DRM); Fourfold reads only books without it</source>
        <translation>het hoofdstuk %1 is versleuteld (DRM); Fourfold leest alleen boeken zonder DRM</translation>
    </message>
    <message>
        <location filename="../core/io/epub_reader.cpp" line="265"/>
        <source>the book holds no text: it contains no articles</source>
        <translation>het boek bevat geen tekst: het bevat geen artikelen</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="145"/>
        <source>the pubDate &quot;%1&quot; is not an RFC 822 date (such as &quot;Sat, 07 Sep 2002 09:42:31 GMT&quot;)</source>
        <translation>de pubDate ‘%1’ is geen datum volgens RFC 822 (zoals ‘Sat, 07 Sep 2002 09:42:31 GMT’)</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="160"/>
        <source>&lt;%1&gt; is not an element of an RSS 2.0 item</source>
        <translation>&lt;%1&gt; is geen element van een RSS 2.0-item</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="167"/>
        <source>the item has neither a guid nor a link to take its id from</source>
        <translation>het item heeft geen guid en geen link om de id aan te ontlenen</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="171"/>
        <source>the item &quot;%1&quot; has neither a description nor a content:encoded</source>
        <translation>het item ‘%1’ heeft geen description en geen content:encoded</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="188"/>
        <source>the RSS version is &quot;%1&quot;; Fourfold reads RSS 2.0 (&lt;rss version=&quot;2.0&quot;&gt;)</source>
        <translation>de RSS-versie is ‘%1’; Fourfold leest RSS 2.0 (&lt;rss version=&quot;2.0&quot;&gt;)</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="197"/>
        <source>&lt;%1&gt; is not an element of &lt;rss&gt;</source>
        <translation>&lt;%1&gt; is geen element van &lt;rss&gt;</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="202"/>
        <source>&lt;rss&gt; holds %1 channels; an RSS 2.0 feed has exactly one</source>
        <translation>&lt;rss&gt; bevat %1 channels; een RSS 2.0-feed heeft er precies één</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="214"/>
        <source>&lt;%1&gt; is not an element of an RSS 2.0 channel</source>
        <translation>&lt;%1&gt; is geen element van een RSS 2.0-channel</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="225"/>
        <source>the feed holds no items: it contains no articles</source>
        <translation>de feed bevat geen items: hij bevat geen artikelen</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="245"/>
        <source>&lt;%1 type=&quot;xhtml&quot;&gt; must hold one XHTML &lt;div&gt; (RFC 4287 §3.1.1.3)</source>
        <translation>&lt;%1 type=&quot;xhtml&quot;&gt; moet precies één XHTML-&lt;div&gt; bevatten (RFC 4287 §3.1.1.3)</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="251"/>
        <source>&lt;%1&gt; has the type &quot;%2&quot;; Fourfold reads text, html, xhtml and text/* content</source>
        <translation>&lt;%1&gt; heeft het type ‘%2’; Fourfold leest inhoud van het type text, html, xhtml en text/*</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="275"/>
        <source>&lt;%1&gt; &quot;%2&quot; is not an RFC 3339 date-time (such as &quot;2003-12-13T18:30:02Z&quot;)</source>
        <translation>&lt;%1&gt; ‘%2’ is geen datum-tijd volgens RFC 3339 (zoals ‘2003-12-13T18:30:02Z’)</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="306"/>
        <source>&lt;%1&gt; is not an element of an Atom entry</source>
        <translation>&lt;%1&gt; is geen element van een Atom-entry</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="346"/>
        <source>the entry has no &lt;id&gt; (RFC 4287 §4.1.2 requires one)</source>
        <translation>de entry heeft geen &lt;id&gt; (RFC 4287 §4.1.2 vereist er een)</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="356"/>
        <source>the entry &quot;%1&quot; has neither a content held in the feed nor a summary</source>
        <translation>de entry ‘%1’ heeft geen inhoud in de feed en geen samenvatting</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="376"/>
        <source>&lt;%1&gt; is not an element of an Atom feed</source>
        <translation>&lt;%1&gt; is geen element van een Atom-feed</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="389"/>
        <source>the feed holds no entries: it contains no articles</source>
        <translation>de feed bevat geen entries: hij bevat geen artikelen</translation>
    </message>
    <message>
        <location filename="../core/io/feed_reader.cpp" line="411"/>
        <source>the root element &lt;%1&gt; is not a feed&apos;s (&lt;rss&gt; or Atom&apos;s &lt;feed&gt;)</source>
        <translation>het hoofdelement &lt;%1&gt; is niet dat van een feed (&lt;rss&gt; of Atoms &lt;feed&gt;)</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="88"/>
        <source>the NITF document has no &lt;body.content&gt;</source>
        <translation>het NITF-document heeft geen &lt;body.content&gt;</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="162"/>
        <source>the newsItem has no &lt;contentSet&gt;</source>
        <translation>het newsItem heeft geen &lt;contentSet&gt;</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="169"/>
        <source>&lt;inlineData&gt; of type &quot;%1&quot; cannot be read; Fourfold reads text/plain</source>
        <translation>&lt;inlineData&gt; van het type ‘%1’ kan niet worden gelezen; Fourfold leest text/plain</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="179"/>
        <source>&lt;inlineXML&gt; must hold one element (NITF or XHTML)</source>
        <translation>&lt;inlineXML&gt; moet precies één element bevatten (NITF of XHTML)</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="188"/>
        <source>&lt;inlineXML&gt; holds &lt;%1&gt;; Fourfold reads NITF and XHTML</source>
        <translation>&lt;inlineXML&gt; bevat &lt;%1&gt;; Fourfold leest NITF en XHTML</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="192"/>
        <source>the newsItem holds no text inline (no &lt;inlineXML&gt; or &lt;inlineData&gt;); remote content is not fetched</source>
        <translation>het newsItem bevat geen ingesloten tekst (geen &lt;inlineXML&gt; of &lt;inlineData&gt;); externe inhoud wordt niet opgehaald</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="204"/>
        <source>the newsItem has no guid</source>
        <translation>het newsItem heeft geen guid</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="260"/>
        <source>the newsMessage holds no newsItem: it contains no articles</source>
        <translation>het newsMessage bevat geen newsItem: het bevat geen artikelen</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="264"/>
        <source>the newsMessage holds a &lt;%1&gt;; Fourfold imports newsItems only</source>
        <translation>het newsMessage bevat een &lt;%1&gt;; Fourfold importeert alleen newsItems</translation>
    </message>
    <message>
        <location filename="../core/io/news_xml_reader.cpp" line="290"/>
        <source>the root element &lt;%1&gt; is not a news item&apos;s (&lt;nitf&gt;, or NewsML-G2&apos;s &lt;newsItem&gt; or &lt;newsMessage&gt;)</source>
        <translation>het hoofdelement &lt;%1&gt; is niet dat van een nieuwsbericht (&lt;nitf&gt;, of &lt;newsItem&gt; of &lt;newsMessage&gt; van NewsML-G2)</translation>
    </message>
    <message>
        <location filename="../core/io/odt_reader.cpp" line="221"/>
        <source>the package is of the type &quot;%1&quot;, not an OpenDocument text (%2)</source>
        <translation>het pakket is van het type ‘%1’, geen OpenDocument-tekst (%2)</translation>
    </message>
    <message>
        <location filename="../core/io/odt_reader.cpp" line="230"/>
        <source>the document is encrypted (its manifest holds encryption data); save it without a password first</source>
        <translation>het document is versleuteld (het manifest bevat versleutelingsgegevens); sla het eerst op zonder wachtwoord</translation>
    </message>
    <message>
        <location filename="../core/io/odt_reader.cpp" line="236"/>
        <source>the archive holds no content.xml: it is not an OpenDocument text</source>
        <translation>het archief bevat geen content.xml: het is geen OpenDocument-tekst</translation>
    </message>
    <message>
        <location filename="../core/io/odt_reader.cpp" line="244"/>
        <source>the root element is &lt;%1&gt;, not &lt;office:document-content&gt;</source>
        <translation>het hoofdelement is &lt;%1&gt;, niet &lt;office:document-content&gt;</translation>
    </message>
    <message>
        <location filename="../core/io/odt_reader.cpp" line="250"/>
        <source>the document has no &lt;office:text&gt; body: it is not a text document</source>
        <translation>het document heeft geen &lt;office:text&gt;-body: het is geen tekstdocument</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="285"/>
        <source>the file is not a PDF (it has no &quot;%PDF-&quot; header)</source>
        <translation>het bestand is geen pdf (het heeft geen ‘%PDF-’-kop)</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="294"/>
        <source>the PDF cannot be read: it is damaged, cut off or encrypted in a way poppler cannot open</source>
        <translation>de pdf kan niet worden gelezen: hij is beschadigd, afgebroken of zo versleuteld dat poppler hem niet kan openen</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="298"/>
        <source>the PDF is encrypted with a password; save a copy without the password first</source>
        <translation>de pdf is met een wachtwoord versleuteld; sla eerst een kopie zonder wachtwoord op</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="304"/>
        <source>the PDF has no pages: it is damaged or cut off</source>
        <translation>de pdf heeft geen pagina&apos;s: hij is beschadigd of afgebroken</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="312"/>
        <source>page %1 of the PDF cannot be read: the file is damaged</source>
        <translation>pagina %1 van de pdf kan niet worden gelezen: het bestand is beschadigd</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="321"/>
        <source>the PDF has no text layer on any of its %1 page(s): it looks scanned (pages as images); run it through OCR (text recognition) first and import the result</source>
        <translation>de pdf heeft op geen van zijn %1 pagina(&apos;s) een tekstlaag: hij lijkt gescand (pagina&apos;s als afbeeldingen); haal hem eerst door tekstherkenning (OCR) en importeer het resultaat</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="329"/>
        <source>the PDF holds no text besides running headers, footers and page numbers</source>
        <translation>de pdf bevat geen tekst behalve kop- en voetteksten en paginanummers</translation>
    </message>
    <message>
        <location filename="../core/io/pdf_reader.cpp" line="348"/>
        <source>the PDF holds no text besides its title</source>
        <translation>de pdf bevat geen tekst behalve de titel</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="87"/>
        <source>the file declares the external entity &quot;%1&quot; (%2); Fourfold reads nothing from outside the file</source>
        <translation>het bestand declareert de externe entiteit ‘%1’ (%2); Fourfold leest niets van buiten het bestand</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="101"/>
        <source>the entity &quot;&amp;%1;&quot; is not declared in the file</source>
        <translation>de entiteit ‘&amp;%1;’ is niet in het bestand gedeclareerd</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="152"/>
        <source>the file declares the encoding &quot;%1&quot;; convert it to UTF-8 first</source>
        <translation>het bestand geeft de codering ‘%1’ op; zet het eerst om naar UTF-8</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="166"/>
        <source>the file is too large for the XML parser</source>
        <translation>het bestand is te groot voor de XML-parser</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="170"/>
        <source>the XML parser could not be started</source>
        <translation>de XML-parser kon niet worden gestart</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="191"/>
        <source>the XML is refused: its entities expand too far (an entity-expansion bomb?): %1</source>
        <translation>de XML wordt geweigerd: de entiteiten ervan breiden te ver uit (een entity-expansion-bom?): %1</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="195"/>
        <source>the file is not well-formed XML: %1</source>
        <translation>het bestand is geen welgevormde XML: %1</translation>
    </message>
    <message>
        <location filename="../core/io/xml_document.cpp" line="202"/>
        <source>the file holds no XML element</source>
        <translation>het bestand bevat geen XML-element</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="25"/>
        <source>%1 MiB</source>
        <translation>%1 MiB</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="26"/>
        <source>%1 bytes</source>
        <translation>%1 bytes</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="57"/>
        <source>the zip reader could not be started</source>
        <translation>de zip-lezer kon niet worden gestart</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="69"/>
        <source>the file is not a readable zip archive (not one at all, or cut off or damaged): %1</source>
        <translation>het bestand is geen leesbaar zip-archief (helemaal niet, of afgebroken of beschadigd): %1</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="73"/>
        <source>the file is a damaged zip archive: %1</source>
        <translation>het bestand is een beschadigd zip-archief: %1</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="105"/>
        <source>the archive holds no %1</source>
        <translation>het archief bevat geen %1</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="109"/>
        <source>the entry %1 of the archive cannot be read: %2</source>
        <translation>het item %1 van het archief kan niet worden gelezen: %2</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="114"/>
        <source>the entry %1 of the archive is encrypted; save the document without a password first</source>
        <translation>het item %1 van het archief is versleuteld; sla het document eerst op zonder wachtwoord</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="121"/>
        <source>the entry %1 of the archive cannot be opened: %2</source>
        <translation>het item %1 van het archief kan niet worden geopend: %2</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="129"/>
        <source>the entry %1 of the archive is damaged: %2</source>
        <translation>het item %1 van het archief is beschadigd: %2</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="138"/>
        <source>the entry %1 unpacks to more than %2; Fourfold unpacks at most %2 from one entry (is it a zip bomb?)</source>
        <translation>het item %1 pakt uit tot meer dan %2; Fourfold pakt hoogstens %2 uit één item uit (is het een zip-bom?)</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="143"/>
        <source>the archive unpacks to more than %1 in all; Fourfold unpacks at most %1 from one archive (is it a zip bomb?)</source>
        <translation>het archief pakt in totaal uit tot meer dan %1; Fourfold pakt hoogstens %1 uit één archief uit (is het een zip-bom?)</translation>
    </message>
    <message>
        <location filename="../core/io/zip_archive.cpp" line="189"/>
        <source>%1, line %2</source>
        <translation>%1, regel %2</translation>
    </message>
</context>
<context>
    <name>ArticleSplitText</name>
    <message>
        <location filename="../core/exchange/article_split.cpp" line="53"/>
        <source>The split &quot;%1&quot; is not two or three whole percentages summing to 100 (e.g. 80/10/10).</source>
        <translation>De verdeling ‘%1’ bestaat niet uit twee of drie hele percentages die samen 100 zijn (bijv. 80/10/10).</translation>
    </message>
</context>
<context>
    <name>ArticleStatusEdit</name>
    <message>
        <location filename="../core/project/article_status_edit.cpp" line="23"/>
        <source>Mark article as done</source>
        <translation>Artikel als klaar markeren</translation>
    </message>
    <message>
        <location filename="../core/project/article_status_edit.cpp" line="24"/>
        <source>Mark article as %1</source>
        <translation>Artikel als %1 markeren</translation>
    </message>
    <message>
        <location filename="../core/project/article_status_edit.cpp" line="32"/>
        <source>&quot;%1&quot; is not a status (assigned, started, done).</source>
        <translation>‘%1’ is geen status (assigned, started, done).</translation>
    </message>
</context>
<context>
    <name>ArticleTable</name>
    <message>
        <location filename="../core/store/article_table.cpp" line="74"/>
        <source>The article &quot;%1&quot; is already in the project.</source>
        <translation>Het artikel ‘%1’ staat al in het project.</translation>
    </message>
    <message>
        <location filename="../core/store/article_table.cpp" line="131"/>
        <location filename="../core/store/article_table.cpp" line="231"/>
        <source>There is no article #%1 in the project.</source>
        <translation>Er is geen artikel #%1 in het project.</translation>
    </message>
    <message>
        <location filename="../core/store/article_table.cpp" line="261"/>
        <source>The search &quot;%1&quot; could not be understood.</source>
        <translation>De zoekopdracht ‘%1’ kon niet worden begrepen.</translation>
    </message>
    <message>
        <location filename="../core/store/article_table.cpp" line="283"/>
        <source>Article #%1 has no paragraph %2.</source>
        <translation>Artikel #%1 heeft geen alinea %2.</translation>
    </message>
</context>
<context>
    <name>CanonicalText</name>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="32"/>
        <source>invalid UTF-8 (byte 0x%1): a continuation byte without a lead byte.</source>
        <translation>ongeldige UTF-8 (byte 0x%1): een vervolgbyte zonder startbyte.</translation>
    </message>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="36"/>
        <source>invalid UTF-8 (byte 0x%1): this byte never occurs in UTF-8.</source>
        <translation>ongeldige UTF-8 (byte 0x%1): deze byte komt in UTF-8 nooit voor.</translation>
    </message>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="39"/>
        <source>invalid UTF-8 (byte 0x%1): an overlong encoding, which UTF-8 forbids.</source>
        <translation>ongeldige UTF-8 (byte 0x%1): een te lange codering, die UTF-8 verbiedt.</translation>
    </message>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="43"/>
        <source>invalid UTF-8 (byte 0x%1): the multi-byte sequence it starts is cut short.</source>
        <translation>ongeldige UTF-8 (byte 0x%1): de multibytereeks die ermee begint, is afgebroken.</translation>
    </message>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="47"/>
        <source>invalid UTF-8 (byte 0x%1): it encodes a UTF-16 surrogate (U+D800..U+DFFF), which UTF-8 forbids.</source>
        <translation>ongeldige UTF-8 (byte 0x%1): hij codeert een UTF-16-surrogaat (U+D800..U+DFFF), wat UTF-8 verbiedt.</translation>
    </message>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="53"/>
        <source>invalid UTF-8 (byte 0x%1): it encodes a code point above U+10FFFF.</source>
        <translation>ongeldige UTF-8 (byte 0x%1): hij codeert een codepunt boven U+10FFFF.</translation>
    </message>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="57"/>
        <source>Save the file as UTF-8 and import it again.</source>
        <translation>Sla het bestand op als UTF-8 en importeer het opnieuw.</translation>
    </message>
    <message>
        <location filename="../core/text/canonical_text.cpp" line="142"/>
        <source>NUL byte (0x00): the file looks binary, not like text. Import a UTF-8 text file.</source>
        <translation>NUL-byte (0x00): het bestand lijkt binair, niet op tekst. Importeer een UTF-8-tekstbestand.</translation>
    </message>
</context>
<context>
    <name>CodebookEditorText</name>
    <message>
        <location filename="../app/desktop/codebook/codebook_field_check.cpp" line="55"/>
        <source>A choice list needs at least one value (one per line).</source>
        <translation>Een keuzelijst heeft ten minste één waarde nodig (één per regel).</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_field_check.cpp" line="58"/>
        <source>Line %1 is empty: every value needs a name.</source>
        <translation>Regel %1 is leeg: elke waarde heeft een naam nodig.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_field_check.cpp" line="61"/>
        <source>“%1” is listed twice (lines %2 and %3).</source>
        <translation>‘%1’ staat twee keer in de lijst (regels %2 en %3).</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_field_check.cpp" line="87"/>
        <source>The key is empty: give a short name such as “polarity”.</source>
        <translation>De sleutel is leeg: geef een korte naam zoals ‘polarity’.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_field_check.cpp" line="89"/>
        <source>Another attribute of this function already has the key “%1”.</source>
        <translation>Een ander kenmerk van deze functie heeft al de sleutel ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_field_check.cpp" line="93"/>
        <source>Another item already has the key “%1”.</source>
        <translation>Een ander item heeft al de sleutel ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_field_check.cpp" line="104"/>
        <source>the codebook being edited</source>
        <translation>het codeboek dat wordt bewerkt</translation>
    </message>
</context>
<context>
    <name>CodebookTable</name>
    <message>
        <location filename="../core/store/codebook_table.cpp" line="81"/>
        <source>codebook version %1</source>
        <translation>codeboekversie %1</translation>
    </message>
    <message>
        <location filename="../core/store/codebook_table.cpp" line="116"/>
        <source>The project has no codebook.</source>
        <translation>Het project heeft geen codeboek.</translation>
    </message>
    <message>
        <location filename="../core/store/codebook_table.cpp" line="132"/>
        <source>The project has no codebook version %1.</source>
        <translation>Het project heeft geen codeboekversie %1.</translation>
    </message>
</context>
<context>
    <name>CodebookText</name>
    <message>
        <location filename="../core/model/codebook.cpp" line="90"/>
        <source>The codebook has no attribute &quot;%1&quot; for %2 (it has: %3).</source>
        <translation>Het codeboek heeft geen kenmerk ‘%1’ voor %2 (het heeft: %3).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook.cpp" line="92"/>
        <source>none</source>
        <translation>geen</translation>
    </message>
    <message>
        <location filename="../core/model/codebook.cpp" line="97"/>
        <source>The attribute &quot;%1&quot; must be text.</source>
        <translation>Het kenmerk ‘%1’ moet tekst zijn.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook.cpp" line="101"/>
        <source>&quot;%1&quot; is not a value of the attribute &quot;%2&quot; (allowed: %3).</source>
        <translation>‘%1’ is geen waarde van het kenmerk ‘%2’ (toegestaan: %3).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook.cpp" line="112"/>
        <source>The codebook has no article-level item &quot;%1&quot;.</source>
        <translation>Het codeboek heeft geen item ‘%1’ op artikelniveau.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook.cpp" line="115"/>
        <source>&quot;%1&quot; is not an answer to &quot;%2&quot; (allowed: %3).</source>
        <translation>‘%1’ is geen antwoord op ‘%2’ (toegestaan: %3).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="24"/>
        <source>null</source>
        <translation>null</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="26"/>
        <source>a boolean</source>
        <translation>een booleaanse waarde</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="28"/>
        <source>a number</source>
        <translation>een getal</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="30"/>
        <location filename="../core/model/codebook_json.cpp" line="227"/>
        <location filename="../core/model/codebook_json.cpp" line="259"/>
        <location filename="../core/model/codebook_json.cpp" line="305"/>
        <source>a string</source>
        <translation>een tekenreeks</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="32"/>
        <location filename="../core/model/codebook_json.cpp" line="244"/>
        <source>an array</source>
        <translation>een array</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="34"/>
        <location filename="../core/model/codebook_json.cpp" line="299"/>
        <location filename="../core/model/codebook_json.cpp" line="344"/>
        <source>an object</source>
        <translation>een object</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="38"/>
        <source>nothing</source>
        <translation>niets</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="91"/>
        <source>the key &quot;%1&quot; appears twice.</source>
        <translation>de sleutel ‘%1’ komt twee keer voor.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="114"/>
        <source>&quot;%1&quot; defines the function &quot;%2&quot; a second time; a codebook defines problem, cause, evaluation and remedy once each.</source>
        <translation>‘%1’ definieert de functie ‘%2’ een tweede keer; een codeboek definieert probleem, oorzaak, evaluatie en oplossing elk één keer.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="124"/>
        <source>the codebook does not define the function &quot;%1&quot;.</source>
        <translation>het codeboek definieert de functie ‘%1’ niet.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="137"/>
        <source>&quot;%1&quot; repeats the item &quot;%2&quot;.</source>
        <translation>‘%1’ herhaalt het item ‘%2’.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="176"/>
        <source>&quot;%1&quot; must be %2, not %3.</source>
        <translation>‘%1’ moet %2 zijn, niet %3.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="189"/>
        <source>unknown key &quot;%1&quot; (expected one of: %2).</source>
        <translation>onbekende sleutel ‘%1’ (verwacht een van: %2).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="205"/>
        <source>&quot;%1&quot; contains the control character U+%2; only line breaks and tabs may stand in definitions, rules, examples and questions.</source>
        <translation>‘%1’ bevat het stuurteken U+%2; in definities, regels, voorbeelden en vragen mogen alleen regeleinden en tabs staan.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="209"/>
        <source>&quot;%1&quot; contains the control character U+%2.</source>
        <translation>‘%1’ bevat het stuurteken U+%2.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="223"/>
        <location filename="../core/model/codebook_json.cpp" line="240"/>
        <source>&quot;%1&quot; is missing.</source>
        <translation>‘%1’ ontbreekt.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="274"/>
        <source>&quot;%1&quot; lists no values.</source>
        <translation>‘%1’ noemt geen waarden.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="280"/>
        <source>&quot;%1&quot; is an empty value.</source>
        <translation>‘%1’ is een lege waarde.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="283"/>
        <source>&quot;%1&quot; repeats the value &quot;%2&quot;.</source>
        <translation>‘%1’ herhaalt de waarde ‘%2’.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="308"/>
        <source>&quot;%1&quot; recodes an empty value.</source>
        <translation>‘%1’ hercodeert een lege waarde.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="311"/>
        <source>&quot;%1&quot; recodes &quot;%2&quot;, which is still one of the values; recode only values that were dropped.</source>
        <translation>‘%1’ hercodeert ‘%2’, dat nog een van de waarden is; hercodeer alleen waarden die zijn vervallen.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="317"/>
        <source>&quot;%1&quot; recodes to &quot;%2&quot;, which is not one of the values (%3).</source>
        <translation>‘%1’ hercodeert naar ‘%2’, dat geen van de waarden is (%3).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="334"/>
        <source>&quot;%1&quot; is &quot;%2&quot;, not a level of measurement (nominal, ordinal, interval or ratio).</source>
        <translation>‘%1’ is ‘%2’, geen meetniveau (nominal, ordinal, interval of ratio).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="354"/>
        <source>&quot;%1&quot; is empty.</source>
        <translation>‘%1’ is leeg.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="371"/>
        <location filename="../core/model/codebook_json.cpp" line="490"/>
        <source>&quot;%1&quot; is &quot;%2&quot;, not one of the four functions (problem, cause, evaluation, remedy).</source>
        <translation>‘%1’ is ‘%2’, geen van de vier functies (problem, cause, evaluation, remedy).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="404"/>
        <source>&quot;%1&quot; repeats the attribute &quot;%2&quot; of %3.</source>
        <translation>‘%1’ herhaalt het kenmerk ‘%2’ van %3.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="435"/>
        <source>&quot;%1&quot; is only for choice attributes; &quot;%2&quot; is a text attribute.</source>
        <translation>‘%1’ geldt alleen voor keuzekenmerken; ‘%2’ is een tekstkenmerk.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="450"/>
        <source>&quot;%1&quot; is &quot;%2&quot;, not an attribute type (choice or text).</source>
        <translation>‘%1’ is ‘%2’, geen kenmerktype (choice of text).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="617"/>
        <source>the codebook is not valid JSON: %1.</source>
        <translation>het codeboek is geen geldige JSON: %1.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="621"/>
        <source>the codebook must be a JSON object, not %1.</source>
        <translation>het codeboek moet een JSON-object zijn, geen %1.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="152"/>
        <source>&quot;%1&quot; is not a language code (two or three lower-case letters, ISO 639, such as &quot;nl&quot; or &quot;de&quot;).</source>
        <translation>‘%1’ is geen taalcode (twee of drie kleine letters volgens ISO 639, zoals ‘nl’ of ‘de’).</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="496"/>
        <source>&quot;%1&quot; gives the texts of &quot;%2&quot; a second time.</source>
        <translation>‘%1’ geeft de teksten van ‘%2’ een tweede keer.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="530"/>
        <source>&quot;%1&quot; names the attribute &quot;%2&quot;, which %3 does not have.</source>
        <translation>‘%1’ noemt het kenmerk ‘%2’, dat %3 niet heeft.</translation>
    </message>
    <message>
        <location filename="../core/model/codebook_json.cpp" line="554"/>
        <source>&quot;%1&quot; names the item &quot;%2&quot;, which the codebook does not have.</source>
        <translation>‘%1’ noemt de vraag ‘%2’, die het codeboek niet heeft.</translation>
    </message>
</context>
<context>
    <name>CoderCopiesText</name>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="74"/>
        <source>Several coders are called &quot;%1&quot;; name the coder by pseudonym.</source>
        <translation>Meerdere codeurs heten ‘%1’; noem de codeur bij het pseudoniem.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="78"/>
        <source>There is no coder with the pseudonym or name &quot;%1&quot; in the project.</source>
        <translation>Er is geen codeur met het pseudoniem of de naam ‘%1’ in het project.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="114"/>
        <source>%1 (copy for %2)</source>
        <translation>%1 (kopie voor %2)</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="171"/>
        <source>%1 is not a Fourfold project file; it was not merged.</source>
        <translation>%1 is geen Fourfold-projectbestand; het is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="174"/>
        <source>%1 was written by a newer Fourfold (schema version %2); it was not merged.</source>
        <translation>%1 is geschreven door een nieuwere Fourfold (schemaversie %2); het is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="183"/>
        <source>%1 is a project file but not a coder copy; it was not merged.</source>
        <translation>%1 is een projectbestand, maar geen codeurskopie; het is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="188"/>
        <source>%1 is a coder copy of another project (%2), not of this one (%3); it was not merged.</source>
        <translation>%1 is een codeurskopie van een ander project (%2), niet van dit project (%3); het is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="197"/>
        <source>The coder of %1 is no longer in the project; it was not merged.</source>
        <translation>De codeur van %1 zit niet meer in het project; de kopie is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="209"/>
        <source>%1 holds article &quot;%2&quot;, which is not in the project; it was not merged.</source>
        <translation>%1 bevat het artikel ‘%2’, dat niet in het project staat; de kopie is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="215"/>
        <source>The text of article &quot;%1&quot; in %2 differs from the project&apos;s (SHA-256 %3 instead of %4): the copy was changed outside Fourfold; it was not merged.</source>
        <translation>De tekst van artikel ‘%1’ in %2 verschilt van die van het project (SHA-256 %3 in plaats van %4): de kopie is buiten Fourfold gewijzigd; ze is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="229"/>
        <source>%1 holds a codebook version (%2) that is not in the project; it was not merged.</source>
        <translation>%1 bevat een codeboekversie (%2) die niet in het project staat; de kopie is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="238"/>
        <source>%1 holds %2 annotations, answers or assignments of people other than its coder %3; it was not merged.</source>
        <translation>%1 bevat %2 annotaties, antwoorden of toewijzingen van anderen dan de codeur %3; de kopie is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="374"/>
        <source>%1 names a copy (%2) that this project never handed out; it was not merged.</source>
        <translation>%1 noemt een kopie (%2) die dit project nooit heeft uitgegeven; ze is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="431"/>
        <source>There is no coder copy %1.</source>
        <translation>Er is geen codeurskopie %1.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="597"/>
        <source>The coding time in %1 would overflow the project&apos;s; it was not merged.</source>
        <translation>De codeertijd in %1 zou die van het project laten overlopen; de kopie is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="664"/>
        <source>%1 is itself a coder copy; hand out copies from the main project.</source>
        <translation>%1 is zelf een codeurskopie; geef kopieën uit vanuit het hoofdproject.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="671"/>
        <source>%1 already exists; choose another name for the coder copy.</source>
        <translation>%1 bestaat al; kies een andere naam voor de codeurskopie.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="679"/>
        <source>Coder %1 has no assigned articles; assign some before handing out a copy.</source>
        <translation>Aan codeur %1 zijn geen artikelen toegewezen; wijs er een aantal toe voordat u een kopie uitgeeft.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="740"/>
        <source>%1 is itself a coder copy; merge copies into the main project.</source>
        <translation>%1 is zelf een codeurskopie; voeg kopieën samen in het hoofdproject.</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/project/coder_copies.cpp" line="785"/>
        <source>%1&apos;s coder copy, handed out %2, holds %n of the withdrawn assignments (%3): what %1 codes there still comes back at the merge, named, for you to decide.</source>
        <translation>
            <numerusform>De codeurskopie van %1, uitgegeven op %2, bevat %n van de ingetrokken toewijzingen (%3): wat %1 daar codeert, komt bij het samenvoegen toch terug, met naam, zodat u kunt beslissen.</numerusform>
            <numerusform>De codeurskopie van %1, uitgegeven op %2, bevat %n van de ingetrokken toewijzingen (%3): wat %1 daar codeert, komt bij het samenvoegen toch terug, met naam, zodat u kunt beslissen.</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../core/project/coder_copies.cpp" line="801"/>
        <source>%1 coded %n article(s) in the copy after the assignment was withdrawn in the project (a withdrawn draw): %2. The codings were merged; the assignments stay withdrawn and do not count. Decide each in the merge conflicts: keep the withdrawal, or take %1&apos;s version to assign the article again.</source>
        <translation>
            <numerusform>%1 heeft %n artikel in de kopie gecodeerd nadat de toewijzing in het project was ingetrokken (een ingetrokken trekking): %2. De coderingen zijn samengevoegd; de toewijzing blijft ingetrokken en telt niet mee. Beslis elk geval bij de samenvoegconflicten: de intrekking behouden, of de versie van %1 overnemen om het artikel opnieuw toe te wijzen.</numerusform>
            <numerusform>%1 heeft %n artikelen in de kopie gecodeerd nadat hun toewijzingen in het project waren ingetrokken (een ingetrokken trekking): %2. De coderingen zijn samengevoegd; de toewijzingen blijven ingetrokken en tellen niet mee. Beslis elk geval bij de samenvoegconflicten: de intrekking behouden, of de versie van %1 overnemen om het artikel opnieuw toe te wijzen.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="829"/>
        <source>Keep &quot;mine&quot; (the version the project holds) or &quot;theirs&quot; (the version that lost), not &quot;%1&quot;.</source>
        <translation>Behoud ‘mine’ (de versie in het project) of ‘theirs’ (de versie die verloor), niet ‘%1’.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="846"/>
        <source>There is no open conflict %1.</source>
        <translation>Er is geen open conflict %1.</translation>
    </message>
    <message>
        <location filename="../core/project/coder_copies.cpp" line="849"/>
        <source>%1 has %2 open conflicts (from several copies); name the conflict&apos;s uuid.</source>
        <translation>%1 heeft %2 open conflicten (uit meerdere kopieën); noem de uuid van het conflict.</translation>
    </message>
</context>
<context>
    <name>CoderTable</name>
    <message>
        <location filename="../core/store/coder_table.cpp" line="34"/>
        <source>The pseudonym &quot;%1&quot; is already taken.</source>
        <translation>Het pseudoniem ‘%1’ is al in gebruik.</translation>
    </message>
    <message>
        <location filename="../core/store/coder_table.cpp" line="51"/>
        <location filename="../core/store/coder_table.cpp" line="69"/>
        <location filename="../core/store/coder_table.cpp" line="87"/>
        <source>There is no person #%1.</source>
        <translation>Er is geen persoon #%1.</translation>
    </message>
</context>
<context>
    <name>CodingImportText</name>
    <message>
        <location filename="../core/project/coding_import.cpp" line="58"/>
        <source>missing required field &quot;%1&quot;.</source>
        <translation>verplicht veld ‘%1’ ontbreekt.</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="61"/>
        <source>field &quot;%1&quot; must be a non-empty string.</source>
        <translation>veld ‘%1’ moet een niet-lege tekenreeks zijn.</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="81"/>
        <source>Cannot read %1: %2</source>
        <translation>Kan %1 niet lezen: %2</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="127"/>
        <source>the line is longer than %1 MiB</source>
        <translation>de regel is langer dan %1 MiB</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="146"/>
        <source>not a JSON object (%1).</source>
        <translation>geen JSON-object (%1).</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="149"/>
        <source>another JSON value</source>
        <translation>een andere JSON-waarde</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="154"/>
        <source>unknown field &quot;%1&quot; (expected article, coder, function, quote, occurrence, attributes, note, confidence, gold, rationale, item, value).</source>
        <translation>onbekend veld ‘%1’ (verwacht: article, coder, function, quote, occurrence, attributes, note, confidence, gold, rationale, item, value).</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="164"/>
        <source>field &quot;%1&quot; must be %2.</source>
        <translation>veld ‘%1’ moet %2 zijn.</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="169"/>
        <source>an object</source>
        <translation>een object</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="170"/>
        <location filename="../core/project/coding_import.cpp" line="174"/>
        <source>text</source>
        <translation>tekst</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="172"/>
        <source>a number from 0 to 1</source>
        <translation>een getal van 0 tot 1</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="184"/>
        <source>unknown coder &quot;%1&quot;.</source>
        <translation>onbekende codeur ‘%1’.</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="192"/>
        <source>unknown article &quot;%1&quot;.</source>
        <translation>onbekend artikel ‘%1’.</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="252"/>
        <source>unknown function &quot;%1&quot; (expected problem, cause, evaluation or remedy).</source>
        <translation>onbekende functie ‘%1’ (verwacht: problem, cause, evaluation of remedy).</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="263"/>
        <source>field &quot;occurrence&quot; must be a whole number from 1.</source>
        <translation>veld ‘occurrence’ moet een geheel getal vanaf 1 zijn.</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="270"/>
        <source>the quote &quot;%1&quot; does not occur %2 time(s) in article &quot;%3&quot;.</source>
        <translation>het citaat ‘%1’ komt niet %2 keer voor in artikel ‘%3’.</translation>
    </message>
    <message>
        <location filename="../core/project/coding_import.cpp" line="286"/>
        <source>field &quot;gold&quot; must be true or false.</source>
        <translation>veld ‘gold’ moet true of false zijn.</translation>
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
        <translation>De extractoropdracht is leeg.</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="79"/>
        <source>A timeout must be a positive number of seconds (or 0 for none).</source>
        <translation>Een time-out moet een positief aantal seconden zijn (of 0 voor geen).</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="102"/>
        <source>The extractor &quot;%1&quot; could not be started.</source>
        <translation>De extractor ‘%1’ kon niet worden gestart.</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="109"/>
        <source>output of &quot;%1&quot;</source>
        <translation>uitvoer van ‘%1’</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="128"/>
        <source>a line is longer than %1 MiB, the most one answer may be; the extractor was stopped and nothing was stored.</source>
        <translation>een regel is langer dan %1 MiB, het maximum voor één antwoord; de extractor is gestopt en er is niets opgeslagen.</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="143"/>
        <source>the extractor wrote more than %1 MiB, the most a run may write; it was stopped and nothing was stored.</source>
        <translation>de extractor heeft meer dan %1 MiB geschreven, het maximum voor een run; hij is gestopt en er is niets opgeslagen.</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="196"/>
        <source>The extractor &quot;%1&quot; wrote nothing for %2 s and was stopped; nothing was stored.</source>
        <translation>De extractor ‘%1’ heeft %2 s niets geschreven en is gestopt; er is niets opgeslagen.</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="201"/>
        <source>The extractor &quot;%1&quot; did not finish within %2 s and was stopped; nothing was stored.</source>
        <translation>De extractor ‘%1’ was niet binnen %2 s klaar en is gestopt; er is niets opgeslagen.</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="222"/>
        <source>The extractor &quot;%1&quot; crashed; nothing was stored.</source>
        <translation>De extractor ‘%1’ is gecrasht; er is niets opgeslagen.</translation>
    </message>
    <message>
        <location filename="../core/extract/command_extractor.cpp" line="227"/>
        <source>The extractor &quot;%1&quot; exited with code %2; nothing was stored.</source>
        <translation>De extractor ‘%1’ is gestopt met code %2; er is niets opgeslagen.</translation>
    </message>
</context>
<context>
    <name>ConflictEditsText</name>
    <message>
        <location filename="../core/project/conflict_edits.cpp" line="61"/>
        <source>Keep the other version</source>
        <translation>De andere versie behouden</translation>
    </message>
    <message>
        <location filename="../core/project/conflict_edits.cpp" line="62"/>
        <source>Keep the project&apos;s version</source>
        <translation>De versie van het project behouden</translation>
    </message>
    <message>
        <location filename="../core/project/conflict_edits.cpp" line="83"/>
        <source>There is no open conflict %1.</source>
        <translation>Er is geen open conflict %1.</translation>
    </message>
    <message>
        <location filename="../core/project/conflict_edits.cpp" line="111"/>
        <source>The object of conflict %1 is missing from the project.</source>
        <translation>Het object van conflict %1 ontbreekt in het project.</translation>
    </message>
    <message>
        <location filename="../core/project/conflict_edits.cpp" line="122"/>
        <source>The decision on conflict %1 was never made.</source>
        <translation>De beslissing over conflict %1 is nooit genomen.</translation>
    </message>
</context>
<context>
    <name>CopyTablesText</name>
    <message>
        <location filename="../core/store/copy_tables.cpp" line="58"/>
        <source>The %1 %2 of the copy belongs to another coder or article in the project.</source>
        <translation>%1 %2 van de kopie hoort bij een andere codeur of een ander artikel in het project.</translation>
    </message>
    <message>
        <location filename="../core/store/copy_tables.cpp" line="298"/>
        <source>Unknown object type %1.</source>
        <translation>Onbekend objecttype %1.</translation>
    </message>
    <message>
        <location filename="../core/store/copy_tables.cpp" line="303"/>
        <source>The %1 %2 of the copy refers to an object that is not in the project.</source>
        <translation>%1 %2 van de kopie verwijst naar een object dat niet in het project staat.</translation>
    </message>
    <message>
        <location filename="../core/store/copy_tables.cpp" line="664"/>
        <source>There is no open conflict %1.</source>
        <translation>Er is geen open conflict %1.</translation>
    </message>
    <message>
        <location filename="../core/store/copy_tables.cpp" line="678"/>
        <source>There is no decided conflict %1.</source>
        <translation>Er is geen beslist conflict %1.</translation>
    </message>
</context>
<context>
    <name>CopyValidationText</name>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="25"/>
        <source>span</source>
        <translation>fragment</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="27"/>
        <source>answer</source>
        <translation>antwoord</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="29"/>
        <source>link</source>
        <translation>koppeling</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="30"/>
        <source>assignment</source>
        <translation>toewijzing</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="54"/>
        <source>is not a time</source>
        <translation>is geen tijd</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="56"/>
        <source>is dated %1, before the copy was handed out (%2)</source>
        <translation>is gedateerd op %1, vóór de kopie werd uitgegeven (%2)</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="59"/>
        <source>is dated %1, in the future (now %2)</source>
        <translation>is gedateerd op %1, in de toekomst (nu %2)</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="72"/>
        <source>The %1 %2 in %3 reuses the uuid of another object in the project (%4); the copy was changed outside Fourfold; it was not merged.</source>
        <translation>%1 %2 in %3 hergebruikt de uuid van een ander object in het project (%4); de kopie is buiten Fourfold gewijzigd; ze is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="84"/>
        <source>The coding time of article &quot;%1&quot; in %2 is %3 s, less than the %4 s it was handed out with; the copy was changed outside Fourfold; it was not merged.</source>
        <translation>De codeertijd van artikel ‘%1’ in %2 is %3 s, minder dan de %4 s waarmee het is uitgegeven; de kopie is buiten Fourfold gewijzigd; ze is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="93"/>
        <source>%1 adds more coding time (%2 s on article &quot;%3&quot;, %4 s before it) than has passed since it was handed out (%5 s, with a day&apos;s allowance for clocks); the copy was changed outside Fourfold; it was not merged.</source>
        <translation>%1 voegt meer codeertijd toe (%2 s bij artikel ‘%3’, eerder %4 s) dan er sinds het uitgeven is verstreken (%5 s, met een dag speling voor klokken); de kopie is buiten Fourfold gewijzigd; ze is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="115"/>
        <source>Span %1 in %2 does not quote its article&apos;s text at [%3, %4); the copy was changed outside Fourfold; it was not merged.</source>
        <translation>Fragment %1 in %2 citeert de tekst van zijn artikel op [%3, %4) niet; de kopie is buiten Fourfold gewijzigd; ze is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="153"/>
        <source>%1 holds two objects (%2, %3) with the same uuid %4; the copy was changed outside Fourfold; it was not merged.</source>
        <translation>%1 bevat twee objecten (%2, %3) met dezelfde uuid %4; de kopie is buiten Fourfold gewijzigd; ze is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="171"/>
        <source>%1 holds an assignment of article &quot;%2&quot; (phase %3) that was not handed out in this copy; it was not merged.</source>
        <translation>%1 bevat een toewijzing van artikel ‘%2’ (fase %3) die niet met deze kopie is uitgegeven; ze is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="179"/>
        <source>The link %1 in %2 joins a span that is not in the copy; it was not merged.</source>
        <translation>De koppeling %1 in %2 verbindt een fragment dat niet in de kopie staat; ze is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="185"/>
        <source>The %1 %2 in %3 is on article &quot;%4&quot;, which was not handed out to %5 in this copy; it was not merged.</source>
        <translation>%1 %2 in %3 hoort bij artikel ‘%4’, dat met deze kopie niet aan %5 is uitgegeven; ze is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="203"/>
        <source>The %1 %2 in %3 %4 (%5 &quot;%6&quot;); the copy was changed outside Fourfold; it was not merged.</source>
        <translation>%1 %2 in %3 %4 (%5 ‘%6’); de kopie is buiten Fourfold gewijzigd; ze is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="218"/>
        <source>Event %1 (%2) of %3</source>
        <translation>Gebeurtenis %1 (%2) van %3</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="220"/>
        <source>%1 %2; the copy&apos;s log was changed outside Fourfold; it was not merged.</source>
        <translation>%1 %2; het logboek van de kopie is buiten Fourfold gewijzigd; ze is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="229"/>
        <source>%1 is not one a coder&apos;s program writes; the copy&apos;s log was changed outside Fourfold; it was not merged.</source>
        <translation>%1 is er geen die het programma van een codeur schrijft; het logboek van de kopie is buiten Fourfold gewijzigd; ze is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="236"/>
        <source>%1 is not by the copy&apos;s coder %2; it was not merged.</source>
        <translation>%1 is niet van de codeur %2 van de kopie; ze is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="248"/>
        <source>%1 is not an edit a coder can make (object %2 %3); the copy&apos;s log was changed outside Fourfold; it was not merged.</source>
        <translation>%1 is geen wijziging die een codeur kan maken (object %2 %3); het logboek van de kopie is buiten Fourfold gewijzigd; ze is niet samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/copy_validation.cpp" line="259"/>
        <source>%1 is about %2, which is not the coder&apos;s own in the project (%3); it was not merged.</source>
        <translation>%1 gaat over %2, dat in het project niet van de codeur zelf is (%3); ze is niet samengevoegd.</translation>
    </message>
</context>
<context>
    <name>CueBaselineText</name>
    <message>
        <location filename="../core/extract/cue_baseline.cpp" line="69"/>
        <source>parameter &quot;%1&quot; of the cues extractor must be a number of at least 0, got %2.</source>
        <translation>parameter ‘%1’ van de cue-extractor moet een getal van ten minste 0 zijn, gekregen: %2.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_baseline.cpp" line="79"/>
        <source>parameter &quot;minWeight&quot; of the cues extractor must be a number above 0, got %1.</source>
        <translation>parameter ‘minWeight’ van de cue-extractor moet een getal boven 0 zijn, gekregen: %1.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_baseline.cpp" line="86"/>
        <source>parameter &quot;otherLanguages&quot; of the cues extractor must be error or skip, got &quot;%1&quot;.</source>
        <translation>parameter ‘otherLanguages’ van de cue-extractor moet error of skip zijn, gekregen: ‘%1’.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_baseline.cpp" line="176"/>
        <source>Article %1 is in language &quot;%2&quot;, which has no cue list (the cue baseline knows %3); pass otherLanguages=skip to leave such articles out.</source>
        <translation>Artikel %1 is in de taal ‘%2’, waarvoor geen cuelijst bestaat (de cue-baseline kent %3); geef otherLanguages=skip op om zulke artikelen over te slaan.</translation>
    </message>
</context>
<context>
    <name>CueListText</name>
    <message>
        <location filename="../core/extract/cue_list.cpp" line="56"/>
        <source>There is no cue list for language &quot;%1&quot;; the cue baseline knows %2.</source>
        <translation>Er is geen cuelijst voor de taal ‘%1’; de cue-baseline kent %2.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_list.cpp" line="61"/>
        <source>The cue list for &quot;%1&quot; is missing from this build.</source>
        <translation>De cuelijst voor ‘%1’ ontbreekt in deze build.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_list.cpp" line="71"/>
        <source>%1: not valid JSON (%2).</source>
        <translation>%1: geen geldige JSON (%2).</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_list.cpp" line="77"/>
        <source>%1: the cue list names no language.</source>
        <translation>%1: de cuelijst noemt geen taal.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_list.cpp" line="85"/>
        <source>%1: every category needs a name and a function.</source>
        <translation>%1: elke categorie heeft een naam en een functie nodig.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_list.cpp" line="100"/>
        <source>%1: cue &quot;%2&quot; of category %3 has an empty word.</source>
        <translation>%1: cue ‘%2’ van categorie %3 heeft een leeg woord.</translation>
    </message>
    <message>
        <location filename="../core/extract/cue_list.cpp" line="107"/>
        <source>%1: category %2 has an empty cue.</source>
        <translation>%1: categorie %2 heeft een lege cue.</translation>
    </message>
</context>
<context>
    <name>Database</name>
    <message>
        <location filename="../core/store/database.cpp" line="40"/>
        <source>The disk holding %1 is full; nothing was written. Free some space and try again.</source>
        <translation>De schijf met %1 is vol; er is niets geschreven. Maak ruimte vrij en probeer het opnieuw.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="141"/>
        <source>%1 is read-only (the file, or the disk it is on); this command writes to it.</source>
        <translation>%1 is alleen-lezen (het bestand of de schijf waarop het staat); deze opdracht schrijft erin.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="159"/>
        <location filename="../core/store/database.cpp" line="182"/>
        <source>Cannot open the project file %1.</source>
        <translation>Kan het projectbestand %1 niet openen.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="191"/>
        <source>%1 is locked by another program; try again when it is done.</source>
        <translation>%1 is vergrendeld door een ander programma; probeer het opnieuw als dat klaar is.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="197"/>
        <source>%1 could not be read: %2.</source>
        <translation>%1 kon niet worden gelezen: %2.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="202"/>
        <source>%1 is not a Fourfold project file or is damaged.</source>
        <translation>%1 is geen Fourfold-projectbestand of is beschadigd.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="219"/>
        <source>The project file %1 could not be prepared for writing.</source>
        <translation>Het projectbestand %1 kon niet worden voorbereid om te schrijven.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="242"/>
        <source>The project file could not be updated.</source>
        <translation>Het projectbestand kon niet worden bijgewerkt.</translation>
    </message>
    <message>
        <location filename="../core/store/database.cpp" line="260"/>
        <source>A query could not be prepared.</source>
        <translation>Een query kon niet worden voorbereid.</translation>
    </message>
    <message>
        <location filename="../core/store/statement.cpp" line="105"/>
        <source>The project file could not be read or written.</source>
        <translation>Het projectbestand kon niet worden gelezen of geschreven.</translation>
    </message>
</context>
<context>
    <name>DiagnosticsText</name>
    <message>
        <location filename="../core/agreement/diagnostics.cpp" line="28"/>
        <source>The diagnostics were cancelled.</source>
        <translation>De diagnose is geannuleerd.</translation>
    </message>
    <message>
        <location filename="../core/agreement/diagnostics.cpp" line="95"/>
        <source>The coders named do not match the columns of the reliability data.</source>
        <translation>De genoemde codeurs komen niet overeen met de kolommen van de betrouwbaarheidsgegevens.</translation>
    </message>
    <message>
        <location filename="../core/agreement/diagnostics.cpp" line="128"/>
        <location filename="../core/agreement/diagnostics.cpp" line="331"/>
        <source>The units named do not match the rows of the reliability data.</source>
        <translation>De genoemde eenheden komen niet overeen met de rijen van de betrouwbaarheidsgegevens.</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/agreement/diagnostics.cpp" line="237"/>
        <source>Reliability needs at least two coders; the selection has %n.</source>
        <translation>
            <numerusform>Betrouwbaarheid vereist ten minste twee codeurs; de selectie heeft er %n.</numerusform>
            <numerusform>Betrouwbaarheid vereist ten minste twee codeurs; de selectie heeft er %n.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/agreement/diagnostics.cpp" line="334"/>
        <source>A batch holds at least one article.</source>
        <translation>Een batch bevat ten minste één artikel.</translation>
    </message>
    <message>
        <location filename="../core/agreement/diagnostics.cpp" line="384"/>
        <source>no date</source>
        <translation>geen datum</translation>
    </message>
</context>
<context>
    <name>DisagreementsText</name>
    <message>
        <location filename="../core/agreement/disagreements.cpp" line="255"/>
        <source>Both coders of the pair must have marked the article &quot;%1&quot; done.</source>
        <translation>Beide codeurs van het paar moeten het artikel ‘%1’ als klaar hebben gemarkeerd.</translation>
    </message>
    <message>
        <location filename="../core/agreement/disagreements.cpp" line="288"/>
        <source>Choose the spans whose boundaries to merge.</source>
        <translation>Kies de fragmenten waarvan de grenzen moeten worden samengevoegd.</translation>
    </message>
    <message>
        <location filename="../core/agreement/disagreements.cpp" line="296"/>
        <source>Only spans of one function can be merged; accept one of them instead.</source>
        <translation>Alleen fragmenten van één functie kunnen worden samengevoegd; accepteer in plaats daarvan een van hen.</translation>
    </message>
</context>
<context>
    <name>DocumentSplitText</name>
    <message>
        <location filename="../core/io/document_split.cpp" line="39"/>
        <source>The split pattern is empty.</source>
        <translation>Het splitspatroon is leeg.</translation>
    </message>
    <message>
        <location filename="../core/io/document_split.cpp" line="42"/>
        <source>The split pattern &quot;%1&quot; is not a valid regular expression: %2 (at character %3).</source>
        <translation>Het splitspatroon ‘%1’ is geen geldige reguliere expressie: %2 (bij teken %3).</translation>
    </message>
    <message>
        <location filename="../core/io/document_split.cpp" line="50"/>
        <source>The split pattern &quot;%1&quot; names the group &quot;%2&quot;; the groups it may name are title, outlet and date.</source>
        <translation>Het splitspatroon ‘%1’ noemt de groep ‘%2’; de groepen die het mag noemen zijn title, outlet en date.</translation>
    </message>
    <message>
        <location filename="../core/io/document_split.cpp" line="82"/>
        <source>the split pattern &quot;%1&quot; matches no line of the document</source>
        <translation>het splitspatroon ‘%1’ komt met geen enkele regel van het document overeen</translation>
    </message>
    <message>
        <location filename="../core/io/document_split.cpp" line="104"/>
        <source>part %1 of the document (from this line) holds no text besides its title</source>
        <translation>deel %1 van het document (vanaf deze regel) bevat geen tekst behalve de titel</translation>
    </message>
</context>
<context>
    <name>ElementIndicatorsText</name>
    <message>
        <location filename="../core/scoring/element_indicators.cpp" line="69"/>
        <source>&quot;%1&quot; is not a layer for frames; use gold, consensus, coder:PSEUDONYM or run:NAME.</source>
        <translation>‘%1’ is geen laag voor frames; gebruik gold, consensus, coder:PSEUDONYM of run:NAME.</translation>
    </message>
</context>
<context>
    <name>ExportFolderText</name>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="44"/>
        <source>The export folder %1 is a symbolic link; name a real folder.</source>
        <translation>De exportmap %1 is een symbolische koppeling; noem een echte map.</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="48"/>
        <source>%1 exists and is not a folder.</source>
        <translation>%1 bestaat en is geen map.</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="54"/>
        <source>The folder %1 is not empty (%2 entries); choose a new or empty folder, or ask to replace an earlier export in it (--force).</source>
        <translation>De map %1 is niet leeg (%2 items); kies een nieuwe of lege map, of vraag om een eerdere export erin te vervangen (--force).</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="63"/>
        <source>The folder %1 holds %2, which is not a file an export writes; it was left alone. Choose a new or empty folder.</source>
        <translation>De map %1 bevat %2, dat geen bestand is dat een export schrijft; het is ongemoeid gelaten. Kies een nieuwe of lege map.</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="72"/>
        <source>The folder %1 could not be created.</source>
        <translation>De map %1 kon niet worden aangemaakt.</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="80"/>
        <source>A folder to write the export into could not be made in %1: %2.</source>
        <translation>In %1 kon geen map worden aangemaakt om de export in te schrijven: %2.</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="102"/>
        <source>%1 was replaced by something other than a folder while the export was written; nothing was written.</source>
        <translation>%1 is tijdens het schrijven van de export vervangen door iets anders dan een map; er is niets geschreven.</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="109"/>
        <location filename="../core/exchange/export_folder.cpp" line="120"/>
        <location filename="../core/exchange/export_folder.cpp" line="133"/>
        <source>The export could not be moved into %1: %2.</source>
        <translation>De export kon niet naar %1 worden verplaatst: %2.</translation>
    </message>
    <message>
        <location filename="../core/exchange/export_folder.cpp" line="127"/>
        <source>The earlier export in %1 could not be moved aside: %2.</source>
        <translation>De eerdere export in %1 kon niet opzij worden gezet: %2.</translation>
    </message>
</context>
<context>
    <name>ExtractorJob</name>
    <message>
        <location filename="../app/desktop/runs/extractor_job.cpp" line="15"/>
        <source>Choose at least one run.</source>
        <translation>Kies ten minste één run.</translation>
    </message>
</context>
<context>
    <name>ExtractorParametersText</name>
    <message>
        <location filename="../core/extract/extractor_parameters.cpp" line="21"/>
        <source>parameter &quot;%1&quot; is not of the form KEY=VALUE.</source>
        <translation>parameter ‘%1’ heeft niet de vorm SLEUTEL=WAARDE.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_parameters.cpp" line="27"/>
        <source>parameter &quot;%1&quot; has no key before &apos;=&apos;.</source>
        <translation>parameter ‘%1’ heeft geen sleutel vóór ‘=’.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_parameters.cpp" line="44"/>
        <source>the %1 extractor has no parameter &quot;%2&quot;; its parameters are %3.</source>
        <translation>de extractor %1 heeft geen parameter ‘%2’; zijn parameters zijn %3.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_parameters.cpp" line="50"/>
        <source>parameter &quot;%1&quot; of the %2 extractor must be a %3, got a %4.</source>
        <translation>parameter ‘%1’ van de extractor %2 moet een %3 zijn, gekregen: een %4.</translation>
    </message>
</context>
<context>
    <name>ExtractorProtocolText</name>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="48"/>
        <source>missing field &quot;%1&quot;</source>
        <translation>veld ‘%1’ ontbreekt</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="53"/>
        <source>field &quot;%1&quot; must be a whole number of code points of at least 0, got %2</source>
        <translation>veld ‘%1’ moet een geheel aantal codepunten van ten minste 0 zijn, gekregen: %2</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="91"/>
        <source>not valid JSON (%1)</source>
        <translation>geen geldige JSON (%1)</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="94"/>
        <source>expected a JSON object, got an array</source>
        <translation>JSON-object verwacht, maar een array gekregen</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="127"/>
        <source>unknown field &quot;%1&quot;; a span has the fields %2 (put further data inside &quot;attributes&quot;)</source>
        <translation>onbekend veld ‘%1’; een fragment heeft de velden %2 (zet verdere gegevens in ‘attributes’)</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="134"/>
        <source>missing field &quot;function&quot;</source>
        <translation>veld ‘function’ ontbreekt</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="138"/>
        <source>field &quot;function&quot; must be problem, cause, evaluation or remedy, got %1</source>
        <translation>veld ‘function’ moet problem, cause, evaluation of remedy zijn, gekregen: %1</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="152"/>
        <source>the span [%1, %2) is empty: &quot;end&quot; must be greater than &quot;start&quot;</source>
        <translation>het fragment [%1, %2) is leeg: ‘end’ moet groter zijn dan ‘start’</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="158"/>
        <source>the span [%1, %2) ends past the end of the article, which has %3 code points</source>
        <translation>het fragment [%1, %2) loopt door tot voorbij het einde van het artikel, dat %3 codepunten heeft</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="168"/>
        <source>field &quot;score&quot; must be a number or null, got %1</source>
        <translation>veld ‘score’ moet een getal of null zijn, gekregen: %1</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="175"/>
        <source>field &quot;attributes&quot; must be an object or null, got %1</source>
        <translation>veld ‘attributes’ moet een object of null zijn, gekregen: %1</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="196"/>
        <source>unknown field &quot;%1&quot;; an answer has the fields &quot;id&quot; and &quot;spans&quot;</source>
        <translation>onbekend veld ‘%1’; een antwoord heeft de velden ‘id’ en ‘spans’</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="203"/>
        <source>missing field &quot;id&quot;</source>
        <translation>veld ‘id’ ontbreekt</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="204"/>
        <source>field &quot;id&quot; must be a string, got %1</source>
        <translation>veld ‘id’ moet een tekenreeks zijn, gekregen: %1</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="209"/>
        <source>article &quot;%1&quot; was not sent to the extractor</source>
        <translation>artikel ‘%1’ is niet naar de extractor gestuurd</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="213"/>
        <source>article &quot;%1&quot; was already answered on line %2</source>
        <translation>artikel ‘%1’ is al beantwoord op regel %2</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="220"/>
        <source>missing field &quot;spans&quot;</source>
        <translation>veld ‘spans’ ontbreekt</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="221"/>
        <source>field &quot;spans&quot; must be an array, got %1</source>
        <translation>veld ‘spans’ moet een array zijn, gekregen: %1</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="227"/>
        <source>span %1 of article &quot;%2&quot; must be an object, got %3</source>
        <translation>fragment %1 van artikel ‘%2’ moet een object zijn, gekregen: %3</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="232"/>
        <source>span %1 of article &quot;%2&quot;: %3</source>
        <translation>fragment %1 van artikel ‘%2’: %3</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/extract/extractor_protocol.cpp" line="247"/>
        <source>%n article(s) got no answer: %1%2</source>
        <translation>
            <numerusform>%n artikel heeft geen antwoord gekregen: %1%2</numerusform>
            <numerusform>%n artikelen hebben geen antwoord gekregen: %1%2</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="263"/>
        <source>the file holds no spans</source>
        <translation>het bestand bevat geen fragmenten</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="272"/>
        <source>missing field &quot;article&quot;</source>
        <translation>veld ‘article’ ontbreekt</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="273"/>
        <source>field &quot;article&quot; must be a string, got %1</source>
        <translation>veld ‘article’ moet een tekenreeks zijn, gekregen: %1</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_protocol.cpp" line="278"/>
        <source>there is no article &quot;%1&quot; in the project</source>
        <translation>er is geen artikel ‘%1’ in het project</translation>
    </message>
</context>
<context>
    <name>ExtractorRunTable</name>
    <message>
        <location filename="../core/store/extractor_run_table.cpp" line="90"/>
        <source>There is no extractor run #%1.</source>
        <translation>Er is geen extractorrun #%1.</translation>
    </message>
</context>
<context>
    <name>ExtractorRunsText</name>
    <message>
        <location filename="../core/extract/extractor_runs.cpp" line="36"/>
        <source>A run needs a name without leading or trailing spaces.</source>
        <translation>Een run heeft een naam nodig zonder spaties aan het begin of einde.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_runs.cpp" line="39"/>
        <source>A run name may not hold control characters.</source>
        <translation>Een runnaam mag geen stuurtekens bevatten.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_runs.cpp" line="45"/>
        <source>There is already a run called &quot;%1&quot;; choose another name or delete it first.</source>
        <translation>Er is al een run met de naam ‘%1’; kies een andere naam of verwijder die eerst.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_runs.cpp" line="165"/>
        <source>A span of run &quot;%1&quot; names article #%2, which is not in the project.</source>
        <translation>Een fragment van run ‘%1’ noemt artikel #%2, dat niet in het project staat.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_runs.cpp" line="172"/>
        <source>A span of run &quot;%1&quot;, [%2, %3), does not lie inside article %4 (%5 code points) or is empty.</source>
        <translation>Een fragment van run ‘%1’, [%2, %3), ligt niet binnen artikel %4 (%5 codepunten) of is leeg.</translation>
    </message>
    <message>
        <location filename="../core/extract/extractor_runs.cpp" line="216"/>
        <source>There is no run called &quot;%1&quot;.</source>
        <translation>Er is geen run met de naam ‘%1’.</translation>
    </message>
</context>
<context>
    <name>FrameAnalysisEditsText</name>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="20"/>
        <source>A saved frame analysis is already called &quot;%1&quot;; choose another name.</source>
        <translation>Een opgeslagen frameanalyse heet al ‘%1’; kies een andere naam.</translation>
    </message>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="48"/>
        <source>Save frames &quot;%1&quot;</source>
        <translation>Frames ‘%1’ opslaan</translation>
    </message>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="55"/>
        <source>A saved frame analysis needs a name.</source>
        <translation>Een opgeslagen frameanalyse heeft een naam nodig.</translation>
    </message>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="58"/>
        <source>The frame analysis &quot;%1&quot; has no frames to save.</source>
        <translation>De frameanalyse ‘%1’ heeft geen frames om op te slaan.</translation>
    </message>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="82"/>
        <source>Delete frames &quot;%1&quot;</source>
        <translation>Frames ‘%1’ verwijderen</translation>
    </message>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="92"/>
        <source>There is no saved frame analysis &quot;%1&quot;.</source>
        <translation>Er is geen opgeslagen frameanalyse ‘%1’.</translation>
    </message>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="111"/>
        <source>Name frame %1 &quot;%2&quot;</source>
        <translation>Frame %1 ‘%2’ noemen</translation>
    </message>
    <message>
        <location filename="../core/project/frame_analysis_edits.cpp" line="121"/>
        <source>The saved frame analysis has no frame %1.</source>
        <translation>De opgeslagen frameanalyse heeft geen frame %1.</translation>
    </message>
</context>
<context>
    <name>FrameInputText</name>
    <message>
        <location filename="../core/scoring/frame_input.cpp" line="29"/>
        <source>layer %1</source>
        <translation>laag %1</translation>
    </message>
    <message>
        <location filename="../core/scoring/frame_input.cpp" line="39"/>
        <source>(unknown)</source>
        <translation>(onbekend)</translation>
    </message>
</context>
<context>
    <name>FrameTableText</name>
    <message>
        <location filename="../core/store/frame_table.cpp" line="33"/>
        <source>There is no saved frame analysis %1.</source>
        <translation>Er is geen opgeslagen frameanalyse %1.</translation>
    </message>
    <message>
        <location filename="../core/store/frame_table.cpp" line="179"/>
        <source>The saved frame analysis %1 has no frame %2.</source>
        <translation>De opgeslagen frameanalyse %1 heeft geen frame %2.</translation>
    </message>
</context>
<context>
    <name>FramesJob</name>
    <message>
        <location filename="../app/desktop/frames/frames_job.cpp" line="18"/>
        <source>The computation was cancelled.</source>
        <translation>De berekening is geannuleerd.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frames/frames_job.cpp" line="35"/>
        <source>The layer %1 holds %n article(s); frames need at least 3.</source>
        <translation>
            <numerusform>De laag %1 bevat %n artikel; frames hebben er ten minste 3 nodig.</numerusform>
            <numerusform>De laag %1 bevat %n artikelen; frames hebben er ten minste 3 nodig.</numerusform>
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
        <translation>Probleem</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="32"/>
        <source>Cause</source>
        <translation>Oorzaak</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="34"/>
        <source>Evaluation</source>
        <translation>Evaluatie</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="36"/>
        <source>Remedy</source>
        <translation>Oplossing</translation>
    </message>
</context>
<context>
    <name>GoldAnswerEditsText</name>
    <message>
        <location filename="../core/project/gold_answer_edits.cpp" line="36"/>
        <source>Decide gold answer &quot;%1&quot;</source>
        <translation>Antwoord ‘%1’ voor de gouden standaard vastleggen</translation>
    </message>
    <message>
        <location filename="../core/project/gold_answer_edits.cpp" line="56"/>
        <source>The gold answer could not be stored: there is no article #%1 in the project.</source>
        <translation>Het antwoord van de gouden standaard kon niet worden opgeslagen: het project heeft geen artikel #%1.</translation>
    </message>
    <message>
        <location filename="../core/project/gold_answer_edits.cpp" line="82"/>
        <source>Withdraw gold answer &quot;%1&quot;</source>
        <translation>Antwoord ‘%1’ uit de gouden standaard intrekken</translation>
    </message>
    <message>
        <location filename="../core/project/gold_answer_edits.cpp" line="93"/>
        <source>This gold answer has already been withdrawn.</source>
        <translation>Dit antwoord van de gouden standaard is al ingetrokken.</translation>
    </message>
</context>
<context>
    <name>GoldEditsText</name>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="32"/>
        <source>Only a lead can decide the gold standard.</source>
        <translation>Alleen een coördinator kan over de gouden standaard beslissen.</translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="53"/>
        <source>Decide gold %1 span</source>
        <translation>%1-fragment voor de gouden standaard vastleggen</translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="65"/>
        <source>A gold span can only come from live spans of the same article.</source>
        <translation>Een fragment van de gouden standaard kan alleen uit actieve fragmenten van hetzelfde artikel voortkomen.</translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="91"/>
        <source>Withdraw gold span</source>
        <translation>Fragment van de gouden standaard intrekken</translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="102"/>
        <source>This gold span has already been withdrawn.</source>
        <translation>Dit fragment van de gouden standaard is al ingetrokken.</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/project/gold_edits.cpp" line="130"/>
        <source>Reject %n span(s)</source>
        <translation>
            <numerusform>%n fragment afwijzen</numerusform>
            <numerusform>%n fragmenten afwijzen</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="143"/>
        <source>Choose at least one span to reject.</source>
        <translation>Kies ten minste één fragment om af te wijzen.</translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="154"/>
        <source>Only a live span can be rejected.</source>
        <translation>Alleen een actief fragment kan worden afgewezen.</translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="160"/>
        <source>A span is already rejected: %1</source>
        <translation>Een fragment is al afgewezen: %1</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/project/gold_edits.cpp" line="187"/>
        <source>Accept %n agreed span(s) into gold</source>
        <translation>
            <numerusform>%n overeenstemmend fragment in de gouden standaard opnemen</numerusform>
            <numerusform>%n overeenstemmende fragmenten in de gouden standaard opnemen</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/project/gold_edits.cpp" line="198"/>
        <source>There are no spans to accept.</source>
        <translation>Er zijn geen fragmenten om te accepteren.</translation>
    </message>
</context>
<context>
    <name>GoldJudgementTableText</name>
    <message>
        <location filename="../core/store/gold_judgement_table.cpp" line="37"/>
        <source>There is no gold answer #%1 in the project.</source>
        <translation>Het project heeft geen antwoord #%1 van de gouden standaard.</translation>
    </message>
</context>
<context>
    <name>GoldTable</name>
    <message>
        <location filename="../core/store/gold_table.cpp" line="52"/>
        <location filename="../core/store/gold_table.cpp" line="128"/>
        <source>There is no gold span #%1 in the project.</source>
        <translation>Er is geen fragment #%1 van de gouden standaard in het project.</translation>
    </message>
    <message>
        <location filename="../core/store/gold_table.cpp" line="202"/>
        <source>There is no rejection #%1 in the project.</source>
        <translation>Er is geen afwijzing #%1 in het project.</translation>
    </message>
</context>
<context>
    <name>ImportDialog</name>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="24"/>
        <source>Importing articles…</source>
        <translation>Artikelen worden geïmporteerd…</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="25"/>
        <source>Cancel</source>
        <translation>Annuleren</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="30"/>
        <source>Importing %1 (%2 of %3)…</source>
        <translation>%1 wordt geïmporteerd (%2 van %3)…</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="51"/>
        <source>%1: not imported — %2</source>
        <translation>%1: niet geïmporteerd — %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="46"/>
        <source>%1: cancelled; nothing from this file was added.</source>
        <translation>%1: geannuleerd; er is niets uit dit bestand toegevoegd.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/import_dialog.cpp" line="56"/>
        <source>%1: %n article(s) added</source>
        <translation>
            <numerusform>%1: %n artikel toegevoegd</numerusform>
            <numerusform>%1: %n artikelen toegevoegd</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="60"/>
        <source>    line %1 (%2): skipped, %3</source>
        <translation>    regel %1 (%2): overgeslagen, %3</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="65"/>
        <source>    line %1 (%2): added, a near copy of &quot;%3&quot; (similarity %4)</source>
        <translation>    regel %1 (%2): toegevoegd, een bijna-kopie van ‘%3’ (gelijkenis %4)</translation>
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
            <numerusform>    %1: %n artikel toegevoegd</numerusform>
            <numerusform>    %1: %n artikelen toegevoegd</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="87"/>
        <location filename="../app/desktop/import_dialog.cpp" line="93"/>
        <source>Import report</source>
        <translation>Importrapport</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/import_dialog.cpp" line="89"/>
        <source>%n article(s) added.</source>
        <translation>
            <numerusform>%n artikel toegevoegd.</numerusform>
            <numerusform>%n artikelen toegevoegd.</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>InputFileText</name>
    <message>
        <location filename="../core/io/input_file.cpp" line="27"/>
        <source>this is not a regular file</source>
        <translation>dit is geen gewoon bestand</translation>
    </message>
    <message>
        <location filename="../core/io/input_file.cpp" line="37"/>
        <source>the file cannot be opened for reading</source>
        <translation>het bestand kan niet worden geopend om te lezen</translation>
    </message>
    <message>
        <location filename="../core/io/input_file.cpp" line="43"/>
        <source>the file is longer than %1 MiB, the most this reader takes</source>
        <translation>het bestand is groter dan %1 MiB, het maximum dat deze lezer aanneemt</translation>
    </message>
    <message>
        <location filename="../core/io/input_file.cpp" line="61"/>
        <source>the file cannot be read</source>
        <translation>het bestand kan niet worden gelezen</translation>
    </message>
</context>
<context>
    <name>Iob2FormatText</name>
    <message>
        <location filename="../core/exchange/iob2_format.cpp" line="172"/>
        <source>A token row comes before any &quot;# article = ...&quot; line.</source>
        <translation>Een tokenregel staat vóór elke regel ‘# article = ...’.</translation>
    </message>
    <message>
        <location filename="../core/exchange/iob2_format.cpp" line="176"/>
        <source>A token row needs 7 tab-separated fields (token, start, end and one tag per function); this one has %1.</source>
        <translation>Een tokenregel heeft 7 door tabs gescheiden velden nodig (token, begin, einde en één tag per functie); deze heeft er %1.</translation>
    </message>
    <message>
        <location filename="../core/exchange/iob2_format.cpp" line="184"/>
        <source>The token&apos;s start and end must be whole numbers with start &lt; end.</source>
        <translation>Begin en einde van het token moeten gehele getallen zijn met begin &lt; einde.</translation>
    </message>
    <message>
        <location filename="../core/exchange/iob2_format.cpp" line="200"/>
        <source>&quot;%1&quot; continues no chunk: in IOB2 a chunk starts with B-.</source>
        <translation>‘%1’ zet geen chunk voort: in IOB2 begint een chunk met B-.</translation>
    </message>
    <message>
        <location filename="../core/exchange/iob2_format.cpp" line="206"/>
        <source>The tag &quot;%1&quot; is not O, B-%2 or I-%2.</source>
        <translation>De tag ‘%1’ is niet O, B-%2 of I-%2.</translation>
    </message>
</context>
<context>
    <name>JsonItemStreamText</name>
    <message>
        <location filename="../core/io/json_item_stream.cpp" line="140"/>
        <location filename="../core/io/json_item_stream.cpp" line="204"/>
        <source>The file %1 could not be read: %2.</source>
        <translation>Het bestand %1 kon niet worden gelezen: %2.</translation>
    </message>
    <message>
        <location filename="../core/io/json_item_stream.cpp" line="218"/>
        <source>This is not valid JSON: the file ends before the JSON is complete.</source>
        <translation>Dit is geen geldige JSON: het bestand eindigt voordat de JSON compleet is.</translation>
    </message>
    <message>
        <location filename="../core/io/json_item_stream.cpp" line="221"/>
        <source>This is not valid JSON at &quot;%1&quot;.</source>
        <translation>Dit is geen geldige JSON bij ‘%1’.</translation>
    </message>
    <message>
        <location filename="../core/io/json_item_stream.cpp" line="223"/>
        <source>This is not valid JSON.</source>
        <translation>Dit is geen geldige JSON.</translation>
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
        <translation>booleaanse waarde</translation>
    </message>
    <message>
        <location filename="../core/io/json_type_name.cpp" line="26"/>
        <source>number</source>
        <comment>a JSON value&apos;s type</comment>
        <translation>getal</translation>
    </message>
    <message>
        <location filename="../core/io/json_type_name.cpp" line="28"/>
        <source>string</source>
        <comment>a JSON value&apos;s type</comment>
        <translation>tekenreeks</translation>
    </message>
    <message>
        <location filename="../core/io/json_type_name.cpp" line="30"/>
        <source>array</source>
        <comment>a JSON value&apos;s type</comment>
        <translation>array</translation>
    </message>
    <message>
        <location filename="../core/io/json_type_name.cpp" line="32"/>
        <source>object</source>
        <comment>a JSON value&apos;s type</comment>
        <translation>object</translation>
    </message>
    <message>
        <location filename="../core/io/json_type_name.cpp" line="36"/>
        <source>undefined</source>
        <comment>a JSON value&apos;s type</comment>
        <translation>ongedefinieerd</translation>
    </message>
</context>
<context>
    <name>LayerExportText</name>
    <message>
        <location filename="../core/exchange/layer_export.cpp" line="167"/>
        <source>The file %1 could not be written: %2.</source>
        <translation>Het bestand %1 kon niet worden geschreven: %2.</translation>
    </message>
    <message>
        <location filename="../core/exchange/layer_export.cpp" line="221"/>
        <source>Fourfold %1 spans, split %2</source>
        <translation>Fourfold-%1-fragmenten, verdeling %2</translation>
    </message>
    <message>
        <location filename="../core/exchange/layer_export.cpp" line="253"/>
        <source>The layer &quot;%1&quot; covers no article, so there is nothing to export.</source>
        <translation>De laag ‘%1’ omvat geen enkel artikel, dus er is niets te exporteren.</translation>
    </message>
    <message>
        <location filename="../core/exchange/layer_export.cpp" line="414"/>
        <source>The text of article &quot;%1&quot; does not match its stored SHA-256 (the project file is damaged); nothing was exported.</source>
        <translation>De tekst van artikel ‘%1’ komt niet overeen met de opgeslagen SHA-256 (het projectbestand is beschadigd); er is niets geëxporteerd.</translation>
    </message>
</context>
<context>
    <name>NearCopyCheck</name>
    <message>
        <location filename="../core/project/near_copy_check.cpp" line="24"/>
        <source>The near-copy threshold %1 does not lie in (0, 1]: it is the least Jaccard similarity of two articles&apos; word shingles that makes one a near copy of the other.</source>
        <translation>De drempel voor bijna-kopieën %1 ligt niet in (0, 1]: het is de kleinste Jaccard-gelijkenis van de woord-shingles van twee artikelen waarbij het ene een bijna-kopie van het andere is.</translation>
    </message>
</context>
<context>
    <name>NumericMatrixReaderText</name>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="45"/>
        <source>column %1 of the header has no variable name.</source>
        <translation>kolom %1 van de kopregel heeft geen variabelenaam.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="49"/>
        <source>the variable &quot;%1&quot; appears twice in the header.</source>
        <translation>de variabele ‘%1’ komt twee keer voor in de kopregel.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="56"/>
        <source>the header names no variable; expected &quot;article,&lt;variable&gt;,...&quot;.</source>
        <translation>de kopregel noemt geen variabele; verwacht: ‘article,&lt;variabele&gt;,...’.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="62"/>
        <source>this row has %1 fields but the header has %2.</source>
        <translation>deze rij heeft %1 velden, maar de kopregel %2.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="68"/>
        <source>the article id is empty.</source>
        <translation>de artikel-id is leeg.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="71"/>
        <source>the article &quot;%1&quot; appears twice (first on line %2).</source>
        <translation>het artikel ‘%1’ komt twee keer voor (eerst op regel %2).</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="82"/>
        <source>column %1 (&quot;%2&quot;) is empty; every cell needs a number.</source>
        <translation>kolom %1 (‘%2’) is leeg; elke cel heeft een getal nodig.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="86"/>
        <source>column %1 (&quot;%2&quot;) holds &quot;%3&quot;, which is not a number.</source>
        <translation>kolom %1 (‘%2’) bevat ‘%3’, dat geen getal is.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="97"/>
        <source>the file is empty; expected a header row &quot;article,&lt;variable&gt;,...&quot;.</source>
        <translation>het bestand is leeg; verwacht een kopregel ‘article,&lt;variabele&gt;,...’.</translation>
    </message>
    <message>
        <location filename="../core/io/numeric_matrix_reader.cpp" line="101"/>
        <source>the file has a header but no articles.</source>
        <translation>het bestand heeft een kopregel, maar geen artikelen.</translation>
    </message>
</context>
<context>
    <name>ParagraphRoleEdit</name>
    <message>
        <location filename="../core/project/paragraph_role_edit.cpp" line="19"/>
        <source>Mark paragraph %1 as %2</source>
        <translation>Alinea %1 als %2 markeren</translation>
    </message>
    <message>
        <location filename="../core/project/paragraph_role_edit.cpp" line="31"/>
        <source>Article &quot;%1&quot; has no paragraph %2.</source>
        <translation>Artikel ‘%1’ heeft geen alinea %2.</translation>
    </message>
    <message>
        <location filename="../core/project/paragraph_role_edit.cpp" line="45"/>
        <source>An edit that was never applied cannot be undone.</source>
        <translation>Een wijziging die nooit is uitgevoerd, kan niet ongedaan worden gemaakt.</translation>
    </message>
</context>
<context>
    <name>Passphrase</name>
    <message>
        <location filename="../core/project/passphrase.cpp" line="36"/>
        <source>A lead&apos;s passphrase needs at least %1 characters.</source>
        <translation>De wachtwoordzin van een coördinator moet ten minste %1 tekens hebben.</translation>
    </message>
    <message>
        <location filename="../core/project/passphrase.cpp" line="46"/>
        <source>The passphrase library could not start.</source>
        <translation>De bibliotheek voor wachtwoordzinnen kon niet starten.</translation>
    </message>
    <message>
        <location filename="../core/project/passphrase.cpp" line="54"/>
        <source>There was not enough memory to protect the passphrase.</source>
        <translation>Er was niet genoeg geheugen om de wachtwoordzin te beschermen.</translation>
    </message>
</context>
<context>
    <name>People</name>
    <message>
        <location filename="../core/project/people.cpp" line="32"/>
        <source>There is nobody with the pseudonym &quot;%1&quot;.</source>
        <translation>Er is niemand met het pseudoniem ‘%1’.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="46"/>
        <source>This is a coder copy: it holds its coder only, and nobody leads in it. Add and change people in the main project.</source>
        <translation>Dit is een codeurskopie: ze bevat alleen haar codeur en niemand coördineert erin. Voeg personen toe en wijzig ze in het hoofdproject.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="64"/>
        <source>Only a lead can add or change people; choose a lead first.</source>
        <translation>Alleen een coördinator kan personen toevoegen of wijzigen; kies eerst een coördinator.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="70"/>
        <source>Only a lead can add or change people; %1 is not an enabled lead of this project.</source>
        <translation>Alleen een coördinator kan personen toevoegen of wijzigen; %1 is geen actieve coördinator van dit project.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="114"/>
        <source>%1 is disabled and cannot be chosen; a lead can enable them again.</source>
        <translation>%1 is uitgeschakeld en kan niet worden gekozen; een coördinator kan deze persoon weer inschakelen.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="141"/>
        <source>That is not the passphrase of %1.</source>
        <translation>Dat is niet de wachtwoordzin van %1.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="184"/>
        <source>A person needs a name and a pseudonym.</source>
        <translation>Een persoon heeft een naam en een pseudoniem nodig.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="187"/>
        <source>The pseudonym &quot;%1&quot; is already taken.</source>
        <translation>Het pseudoniem ‘%1’ is al in gebruik.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="213"/>
        <source>A person needs a name.</source>
        <translation>Een persoon heeft een naam nodig.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="229"/>
        <source>%1 is already disabled.</source>
        <translation>%1 is al uitgeschakeld.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="231"/>
        <source>%1 is already enabled.</source>
        <translation>%1 is al ingeschakeld.</translation>
    </message>
    <message>
        <location filename="../core/project/people.cpp" line="238"/>
        <source>%1 is the project&apos;s only enabled lead; add or enable another lead first.</source>
        <translation>%1 is de enige actieve coördinator van het project; voeg eerst een andere coördinator toe of schakel er een in.</translation>
    </message>
</context>
<context>
    <name>PersonEdits</name>
    <message>
        <location filename="../core/project/person_edits.cpp" line="17"/>
        <source>Add %1</source>
        <translation>%1 toevoegen</translation>
    </message>
    <message>
        <location filename="../core/project/person_edits.cpp" line="42"/>
        <source>Rename %1</source>
        <translation>%1 hernoemen</translation>
    </message>
    <message>
        <location filename="../core/project/person_edits.cpp" line="64"/>
        <source>Disable %1</source>
        <translation>%1 uitschakelen</translation>
    </message>
    <message>
        <location filename="../core/project/person_edits.cpp" line="65"/>
        <source>Enable %1</source>
        <translation>%1 inschakelen</translation>
    </message>
    <message>
        <location filename="../core/project/person_edits.cpp" line="87"/>
        <source>Set the passphrase of %1</source>
        <translation>Wachtwoordzin van %1 instellen</translation>
    </message>
</context>
<context>
    <name>PositionBaselineText</name>
    <message>
        <location filename="../core/extract/position_baseline.cpp" line="44"/>
        <source>parameter &quot;%1&quot; of the position extractor must be problem, cause, evaluation, remedy or none, got &quot;%2&quot;.</source>
        <translation>parameter ‘%1’ van de positie-extractor moet problem, cause, evaluation, remedy of none zijn, gekregen: ‘%2’.</translation>
    </message>
    <message>
        <location filename="../core/extract/position_baseline.cpp" line="54"/>
        <source>parameter &quot;unit&quot; of the position extractor must be paragraph or sentence, got &quot;%1&quot;.</source>
        <translation>parameter ‘unit’ van de positie-extractor moet paragraph of sentence zijn, gekregen: ‘%1’.</translation>
    </message>
</context>
<context>
    <name>ProgressText</name>
    <message>
        <location filename="../app/cli/terminal_progress.cpp" line="46"/>
        <source>%1: %2% (%3 of %4 MB)</source>
        <translation>%1: %2% (%3 van %4 MB)</translation>
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
        <translation>Er is geen projectbestand %1.</translation>
    </message>
</context>
<context>
    <name>ProjectCheckText</name>
    <message>
        <location filename="../core/project/project_check.cpp" line="49"/>
        <source>Article &quot;%1&quot;: its text does not match its stored SHA-256.</source>
        <translation>Artikel ‘%1’: de tekst komt niet overeen met de opgeslagen SHA-256.</translation>
    </message>
    <message>
        <location filename="../core/project/project_check.cpp" line="53"/>
        <source>Article &quot;%1&quot;: stored length %2 but the text has %3 characters.</source>
        <translation>Artikel ‘%1’: opgeslagen lengte %2, maar de tekst heeft %3 tekens.</translation>
    </message>
    <message>
        <location filename="../core/project/project_check.cpp" line="59"/>
        <source>Article &quot;%1&quot;: the text is not in canonical form (NFC, LF line ends).</source>
        <translation>Artikel ‘%1’: de tekst staat niet in canonieke vorm (NFC, LF-regeleinden).</translation>
    </message>
    <message>
        <location filename="../core/project/project_check.cpp" line="72"/>
        <source>%1 #%2 refers to a missing article #%3.</source>
        <translation>%1 #%2 verwijst naar een ontbrekend artikel #%3.</translation>
    </message>
    <message>
        <location filename="../core/project/project_check.cpp" line="79"/>
        <source>%1 #%2 in article &quot;%3&quot;: [%4, %5) lies outside the text of %6 characters.</source>
        <translation>%1 #%2 in artikel ‘%3’: [%4, %5) ligt buiten de tekst van %6 tekens.</translation>
    </message>
    <message>
        <location filename="../core/project/project_check.cpp" line="90"/>
        <source>%1 #%2 in article &quot;%3&quot;: the stored quote differs from the text at [%4, %5).</source>
        <translation>%1 #%2 in artikel ‘%3’: het opgeslagen citaat wijkt af van de tekst op [%4, %5).</translation>
    </message>
</context>
<context>
    <name>ProjectImportText</name>
    <message>
        <location filename="../core/project/project_import.cpp" line="42"/>
        <source>the article &quot;%1&quot; has no text.</source>
        <translation>het artikel ‘%1’ heeft geen tekst.</translation>
    </message>
    <message>
        <location filename="../core/project/project_import.cpp" line="57"/>
        <source>the article &quot;%1&quot; cannot be segmented: %2</source>
        <translation>het artikel ‘%1’ kan niet worden gesegmenteerd: %2</translation>
    </message>
    <message>
        <location filename="../core/project/project_import.cpp" line="121"/>
        <source>same text as the article &quot;%1&quot; already in the project</source>
        <translation>dezelfde tekst als het artikel ‘%1’ dat al in het project staat</translation>
    </message>
    <message>
        <location filename="../core/project/project_import.cpp" line="130"/>
        <source>the id &quot;%1&quot; is already used by another article in the project, with a different text.</source>
        <translation>de id ‘%1’ wordt in het project al gebruikt door een ander artikel met een andere tekst.</translation>
    </message>
    <message>
        <location filename="../core/project/project_import.cpp" line="148"/>
        <source>The import of %1 was cancelled; nothing was added.</source>
        <translation>De import van %1 is geannuleerd; er is niets toegevoegd.</translation>
    </message>
    <message>
        <location filename="../core/project/project_import.cpp" line="194"/>
        <source>passed over: not a format Fourfold reads</source>
        <translation>overgeslagen: geen formaat dat Fourfold leest</translation>
    </message>
    <message>
        <location filename="../core/project/project_import.cpp" line="205"/>
        <source>The folder %1 holds no files.</source>
        <translation>De map %1 bevat geen bestanden.</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/project/project_import.cpp" line="210"/>
        <source>%1: %n article(s)</source>
        <translation>
            <numerusform>%1: %n artikel</numerusform>
            <numerusform>%1: %n artikelen</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../core/project/project_import.cpp" line="215"/>
        <source>The folder %1 was not imported: %n of its files could not be read, so nothing was added.</source>
        <translation>
            <numerusform>De map %1 is niet geïmporteerd: %n van de bestanden kon niet worden gelezen, dus er is niets toegevoegd.</numerusform>
            <numerusform>De map %1 is niet geïmporteerd: %n van de bestanden konden niet worden gelezen, dus er is niets toegevoegd.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/project/project_import.cpp" line="178"/>
        <source>passed over: a Fourfold project file</source>
        <translation>overgeslagen: een Fourfold-projectbestand</translation>
    </message>
</context>
<context>
    <name>ProjectTables</name>
    <message>
        <location filename="../core/store/project_tables.cpp" line="62"/>
        <source>The article is already assigned to this coder in this phase, or one of them does not exist.</source>
        <translation>Het artikel is in deze fase al aan deze codeur toegewezen, of een van beide bestaat niet.</translation>
    </message>
    <message>
        <location filename="../core/store/project_tables.cpp" line="320"/>
        <source>The project file %1 is damaged, so nothing was added to it; `fourfold-cli check` lists the damage. Restore it from a backup.</source>
        <translation>Het projectbestand %1 is beschadigd, dus er is niets aan toegevoegd; `fourfold-cli check` somt de schade op. Zet het terug vanuit een back-up.</translation>
    </message>
    <message>
        <location filename="../core/store/project_tables.cpp" line="352"/>
        <source>foreign_key_check: row %1 of %2 refers to a missing row of %3</source>
        <translation>foreign_key_check: rij %1 van %2 verwijst naar een ontbrekende rij van %3</translation>
    </message>
    <message>
        <location filename="../core/store/project_tables.cpp" line="119"/>
        <source>The assignment is not in the project.</source>
        <translation>De toewijzing staat niet in het project.</translation>
    </message>
</context>
<context>
    <name>ProjectText</name>
    <message>
        <location filename="../core/project/project.cpp" line="41"/>
        <source>The default codebook is missing from this build.</source>
        <translation>Het standaardcodeboek ontbreekt in deze build.</translation>
    </message>
    <message>
        <location filename="../core/project/project.cpp" line="70"/>
        <source>%1 already exists; choose another name or open it.</source>
        <translation>%1 bestaat al; kies een andere naam of open het.</translation>
    </message>
    <message>
        <location filename="../core/project/project.cpp" line="89"/>
        <source>Default codebook</source>
        <translation>Standaardcodeboek</translation>
    </message>
    <message>
        <location filename="../core/project/project.cpp" line="113"/>
        <source>There is no project file %1.</source>
        <translation>Er is geen projectbestand %1.</translation>
    </message>
    <message>
        <location filename="../core/project/project.cpp" line="191"/>
        <source>A coder needs a name and a pseudonym.</source>
        <translation>Een codeur heeft een naam en een pseudoniem nodig.</translation>
    </message>
    <message>
        <location filename="../core/project/project.cpp" line="196"/>
        <source>%1 was not added: a lead is added with a passphrase (Lead → People or fourfold-cli people --add).</source>
        <translation>%1 is niet toegevoegd: een coördinator wordt met een wachtwoordzin toegevoegd (Coördinator → Personen of fourfold-cli people --add).</translation>
    </message>
    <message>
        <location filename="../core/project/project.cpp" line="246"/>
        <source>%1 is disabled and takes no new assignments; enable them first.</source>
        <translation>%1 is uitgeschakeld en krijgt geen nieuwe toewijzingen; schakel deze persoon eerst in.</translation>
    </message>
    <message>
        <location filename="../core/project/project.cpp" line="375"/>
        <source>An edit without its own savepoint needs a batch.</source>
        <translation>Een wijziging zonder eigen savepoint heeft een batch nodig.</translation>
    </message>
</context>
<context>
    <name>ProjectUnitsText</name>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="54"/>
        <source>There is no article &quot;%1&quot; in the project.</source>
        <translation>Er is geen artikel ‘%1’ in het project.</translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="68"/>
        <source>There is no coder &quot;%1&quot; in the project.</source>
        <translation>Er is geen codeur ‘%1’ in het project.</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/agreement/project_units.cpp" line="92"/>
        <location filename="../core/agreement/project_units.cpp" line="433"/>
        <source>Reliability needs at least two coders; the selection has %n.</source>
        <translation>
            <numerusform>Betrouwbaarheid vereist ten minste twee codeurs; de selectie heeft er %n.</numerusform>
            <numerusform>Betrouwbaarheid vereist ten minste twee codeurs; de selectie heeft er %n.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="168"/>
        <source>%1: 1 article in progress left out</source>
        <translation>%1: 1 artikel in bewerking weggelaten</translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="169"/>
        <source>%1: %2 articles in progress left out</source>
        <translation>%1: %2 artikelen in bewerking weggelaten</translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="319"/>
        <source>Continuum units are compared with unitizing alpha, not as a table.</source>
        <translation>Continuüm-eenheden worden vergeleken met unitizing-alfa, niet als tabel.</translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="323"/>
        <source>Span units compare an attribute: name one function and one of its attributes.</source>
        <translation>Fragmenteenheden vergelijken een kenmerk: noem één functie en een van haar kenmerken.</translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="410"/>
        <source>None of the selected coders has marked any of the selected articles done.</source>
        <translation>Geen van de gekozen codeurs heeft een van de gekozen artikelen als klaar gemarkeerd.</translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="486"/>
        <source>No article was marked done by all of the selected coders, so there is no common continuum.</source>
        <translation>Geen enkel artikel is door alle gekozen codeurs als klaar gemarkeerd, dus er is geen gemeenschappelijk continuüm.</translation>
    </message>
    <message>
        <location filename="../core/agreement/project_units.cpp" line="505"/>
        <source>the codebook has no attribute &quot;%1&quot; for %2.</source>
        <translation>het codeboek heeft geen kenmerk ‘%1’ voor %2.</translation>
    </message>
</context>
<context>
    <name>RangeBlob</name>
    <message>
        <location filename="../core/store/range_blob.cpp" line="24"/>
        <source>A stored list of text ranges is damaged (%1 bytes).</source>
        <translation>Een opgeslagen lijst van tekstbereiken is beschadigd (%1 bytes).</translation>
    </message>
</context>
<context>
    <name>ReliabilityJob</name>
    <message>
        <location filename="../app/desktop/reliability/reliability_job.cpp" line="39"/>
        <source>The computation was cancelled.</source>
        <translation>De berekening is geannuleerd.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_job.cpp" line="49"/>
        <source>Choose at least one framing function.</source>
        <translation>Kies ten minste één framingfunctie.</translation>
    </message>
</context>
<context>
    <name>ReliabilityTableReaderText</name>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="118"/>
        <source>the first column of the header must be &quot;unit&quot;, found &quot;%1&quot;.</source>
        <translation>de eerste kolom van de kopregel moet ‘unit’ zijn, gevonden: ‘%1’.</translation>
    </message>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="125"/>
        <source>column %1 of the header has no coder name.</source>
        <translation>kolom %1 van de kopregel heeft geen codeursnaam.</translation>
    </message>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="129"/>
        <source>the coder &quot;%1&quot; appears twice in the header.</source>
        <translation>de codeur ‘%1’ komt twee keer voor in de kopregel.</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/io/reliability_table_reader.cpp" line="136"/>
        <source>reliability needs at least two coders; the header names %n.</source>
        <translation>
            <numerusform>betrouwbaarheid vereist ten minste twee codeurs; de kopregel noemt er %n.</numerusform>
            <numerusform>betrouwbaarheid vereist ten minste twee codeurs; de kopregel noemt er %n.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="144"/>
        <source>this row has %1 fields but the header has %2.</source>
        <translation>deze rij heeft %1 velden, maar de kopregel %2.</translation>
    </message>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="150"/>
        <source>the unit id is empty.</source>
        <translation>de eenheid-id is leeg.</translation>
    </message>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="159"/>
        <source>the unit &quot;%1&quot; appears twice (first on line %2).</source>
        <translation>de eenheid ‘%1’ komt twee keer voor (eerst op regel %2).</translation>
    </message>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="167"/>
        <source>the file is empty; expected a header row &quot;unit,&lt;coder&gt;,&lt;coder&gt;,...&quot;.</source>
        <translation>het bestand is leeg; verwacht een kopregel ‘unit,&lt;codeur&gt;,&lt;codeur&gt;,...’.</translation>
    </message>
    <message>
        <location filename="../core/io/reliability_table_reader.cpp" line="171"/>
        <source>the file has a header but no units.</source>
        <translation>het bestand heeft een kopregel, maar geen eenheden.</translation>
    </message>
</context>
<context>
    <name>ReportChartsText</name>
    <message>
        <location filename="../app/report/report_charts.cpp" line="144"/>
        <source>undef.</source>
        <translation>ongedef.</translation>
    </message>
    <message>
        <location filename="../app/report/report_charts.cpp" line="157"/>
        <source>95% CI, pairs resampled</source>
        <translation>95%-BI, paren opnieuw getrokken</translation>
    </message>
    <message>
        <location filename="../app/report/report_charts.cpp" line="165"/>
        <source>95% CI, units resampled</source>
        <translation>95%-BI, eenheden opnieuw getrokken</translation>
    </message>
    <message>
        <location filename="../app/report/report_charts.cpp" line="202"/>
        <source>undefined</source>
        <translation>niet gedefinieerd</translation>
    </message>
    <message>
        <location filename="../app/report/report_charts.cpp" line="219"/>
        <source>Cohen&apos;s kappa</source>
        <translation>Cohens kappa</translation>
    </message>
</context>
<context>
    <name>ReportDataText</name>
    <message>
        <location filename="../app/report/report_data.cpp" line="66"/>
        <source>a sample stratified by %1</source>
        <translation>een naar %1 gestratificeerde steekproef</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="67"/>
        <source>a simple random sample</source>
        <translation>een enkelvoudige aselecte steekproef</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="68"/>
        <source>The %1 articles of the %2 phase were drawn as %3 (seed %4) from a frame of %5 articles not yet assigned to training, pilot or reliability coding, on %6.</source>
        <translation>De %1 artikelen van fase %2 zijn getrokken als %3 (seed %4) uit een steekproefkader van %5 artikelen die nog niet voor training, pilot of betrouwbaarheidscodering waren toegewezen, op %6.</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="201"/>
        <source>The report&apos;s unit must be paragraph, sentence or token.</source>
        <translation>De eenheid van het rapport moet paragraph, sentence of token zijn.</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="206"/>
        <source>Reliability report</source>
        <translation>Betrouwbaarheidsrapport</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="207"/>
        <source>Reliability report: %1</source>
        <translation>Betrouwbaarheidsrapport: %1</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="249"/>
        <source>All four functions (MASI)</source>
        <translation>Alle vier functies (MASI)</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="249"/>
        <source>All four (MASI)</source>
        <translation>Alle vier (MASI)</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="297"/>
        <source>Spans on the continuum</source>
        <translation>Fragmenten op het continuüm</translation>
    </message>
    <message>
        <location filename="../app/report/report_data.cpp" line="298"/>
        <source>continuum</source>
        <translation>continuüm</translation>
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
        <translation>niet gedefinieerd</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="92"/>
        <source>reliable</source>
        <translation>betrouwbaar</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="94"/>
        <source>tentative</source>
        <translation>voorlopig</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="98"/>
        <source>unreliable</source>
        <translation>onbetrouwbaar</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="135"/>
        <source>paragraph</source>
        <translation>alinea</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="135"/>
        <source>paragraphs</source>
        <translation>alinea&apos;s</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="137"/>
        <source>token</source>
        <translation>token</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="137"/>
        <source>tokens</source>
        <translation>tokens</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="139"/>
        <source>sentence</source>
        <translation>zin</translation>
    </message>
    <message>
        <location filename="../app/report/report_markup.cpp" line="139"/>
        <source>sentences</source>
        <translation>zinnen</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="40"/>
        <source>unit: %1</source>
        <translation>eenheid: %1</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="41"/>
        <source>phase: %1</source>
        <translation>fase: %1</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="43"/>
        <source>all phases</source>
        <translation>alle fasen</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="44"/>
        <source>bootstrap: %1 replicates, seed %2</source>
        <translation>bootstrap: %1 replicaties, seed %2</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="48"/>
        <source>Inter-coder reliability</source>
        <translation>Intercodeursbetrouwbaarheid</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="51"/>
        <source>Project “%1” · written %2 by %3 · %4</source>
        <translation>Project ‘%1’ · geschreven %2 door %3 · %4</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="20"/>
        <source>%1 coded %2 articles (%3 spans)</source>
        <translation>%1 codeerde %2 artikelen (%3 fragmenten)</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="30"/>
        <source>Inter-coder reliability was assessed on a reliability sample of %1 articles that two or more coders coded independently (%2 of them by all %3 coders), out of %4 articles in the project. </source>
        <translation>De intercodeursbetrouwbaarheid is bepaald op een betrouwbaarheidssteekproef van %1 artikelen die twee of meer codeurs onafhankelijk van elkaar codeerden (%2 daarvan door alle %3 codeurs), van de %4 artikelen in het project. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="42"/>
        <source>The sample was drawn %1. </source>
        <translation>De steekproef is %1 getrokken. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="43"/>
        <source>state how the articles were drawn, e.g. a simple random sample of the study&apos;s articles, with its size and seed</source>
        <translation>vermeld hoe de artikelen zijn getrokken, bijv. als enkelvoudige aselecte steekproef uit de artikelen van het onderzoek, met omvang en seed</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="47"/>
        <source>%1 coders (%2) took part: %3. </source>
        <translation>%1 codeurs (%2) namen deel: %3. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="51"/>
        <source>Articles that coders had started but not yet marked as finished were included. </source>
        <translation>Artikelen die codeurs waren begonnen maar nog niet als afgerond hadden gemarkeerd, zijn meegenomen. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="54"/>
        <source>Only articles that a coder had marked as finished count for that coder. </source>
        <translation>Voor elke codeur tellen alleen de artikelen die hij of zij als afgerond had gemarkeerd. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="58"/>
        <source>%1 (%2)</source>
        <translation>%1 (%2)</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="62"/>
        <source>Articles still in progress were left out: %1. </source>
        <translation>Artikelen die nog in bewerking waren, zijn weggelaten: %1. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="66"/>
        <source>Before the reliability coding, coders trained on %1 articles and coded a pilot of %2 articles; %3. </source>
        <translation>Vóór de betrouwbaarheidscodering oefenden de codeurs op %1 artikelen en codeerden ze een pilot van %2 artikelen; %3. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="73"/>
        <source>hours of training</source>
        <translation>uren training</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="75"/>
        <source>Coder training: %1. </source>
        <translation>Codeurstraining: %1. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="77"/>
        <source>describe the training and its approximate hours</source>
        <translation>beschrijf de training en de geschatte duur in uren</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="86"/>
        <source>%1 α = %2</source>
        <translation>%1 α = %2</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="91"/>
        <source> (95% CI %1)</source>
        <translation> (95%-BI %1)</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="96"/>
        <source>Each of Entman&apos;s (1993) four framing functions was coded as a span of text; for reliability, each function became a binary variable (present or absent) per %1, a %2 carrying a function when a coder&apos;s span of that function overlaps it. </source>
        <translation>Elk van de vier framingfuncties van Entman (1993) is gecodeerd als een tekstfragment; voor de betrouwbaarheid werd elke functie een binaire variabele (aanwezig of afwezig) per %1: een eenheid (%2) draagt een functie wanneer het fragment van een codeur met die functie ermee overlapt. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="101"/>
        <source>We report Krippendorff&apos;s alpha (Krippendorff, 2004) because it handles any number of coders, missing data and any level of measurement (Hayes &amp; Krippendorff, 2007). </source>
        <translation>We rapporteren Krippendorffs alfa (Krippendorff, 2004) omdat die met elk aantal codeurs, ontbrekende gegevens en elk meetniveau overweg kan (Hayes &amp; Krippendorff, 2007). </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="105"/>
        <source>Alpha was %1</source>
        <translation>Alfa was %1</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="107"/>
        <source>; for the set of functions per %1, compared with the MASI distance (Passonneau, 2006), α = %2</source>
        <translation>; voor de verzameling functies per %1, vergeleken met de MASI-afstand (Passonneau, 2006), α = %2</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="115"/>
        <source>Intervals are 95% percentile bootstrap intervals from %1 resamples of the units; the table also gives the interval from resampled pairable values (Hayes &amp; Krippendorff, 2007), which is narrower than its nominal level when more than two coders are compared. </source>
        <translation>De intervallen zijn 95%-percentiel-bootstrapintervallen uit %1 hersteekproeven van de eenheden; de tabel geeft ook het interval uit opnieuw getrokken paarbare waarden (Hayes &amp; Krippendorff, 2007), dat smaller is dan het nominale niveau wanneer meer dan twee codeurs worden vergeleken. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="122"/>
        <source>Following Krippendorff (2004), variables with α&#xa0;≥&#xa0;0.800 are relied on and variables with 0.667&#xa0;≤&#xa0;α&#xa0;&lt;&#xa0;0.800 support tentative conclusions only. </source>
        <translation>In navolging van Krippendorff (2004) wordt op variabelen met α&#xa0;≥&#xa0;0.800 vertrouwd en ondersteunen variabelen met 0.667&#xa0;≤&#xa0;α&#xa0;&lt;&#xa0;0.800 alleen voorlopige conclusies. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="133"/>
        <source>%1 (%2) α = %3</source>
        <translation>%1 (%2) α = %3</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="139"/>
        <source>For the other variables alpha was: %1.</source>
        <translation>Voor de overige variabelen was alfa: %1.</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="144"/>
        <source>Disagreements were resolved by adjudication into a separate gold standard: %1 spans on %2 articles, decided by %3, %4 of them with a written rationale. The independent codings were kept unchanged; every figure above comes from them. </source>
        <translation>Verschillen zijn opgelost door beslissing in een aparte gouden standaard: %1 fragmenten in %2 artikelen, beslist door %3, %4 daarvan met een schriftelijke motivering. De onafhankelijke coderingen bleven ongewijzigd; alle bovenstaande cijfers komen daaruit. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="180"/>
        <source>No adjudication is recorded in the project yet: %1. </source>
        <translation>In het project is nog geen beslissing vastgelegd: %1. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="181"/>
        <source>say how disagreements were resolved, e.g. by discussion or by the lead</source>
        <translation>vermeld hoe verschillen zijn opgelost, bijv. door overleg of door de coördinator</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="185"/>
        <source>Coding followed version %1 of the codebook (“%2”)</source>
        <translation>De codering volgde versie %1 van het codeboek (‘%2’)</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="190"/>
        <source>; %1 of %2 codings were made under an earlier version</source>
        <translation>; %1 van de %2 coderingen zijn gemaakt onder een eerdere versie</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="196"/>
        <source>, which is available at %1.</source>
        <translation>, dat beschikbaar is op %1.</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="197"/>
        <source>where readers can obtain it</source>
        <translation>waar lezers het kunnen verkrijgen</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="201"/>
        <source>Highlighted brackets are for the authors to complete: the project does not record these facts.</source>
        <translation>Gemarkeerde haakjes vullen de auteurs zelf in: het project legt deze gegevens niet vast.</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="219"/>
        <source>Size of the reliability sample and how it was selected</source>
        <translation>Omvang van de betrouwbaarheidssteekproef en hoe die is geselecteerd</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="221"/>
        <source>Relationship of the reliability sample to the full sample</source>
        <translation>Verhouding van de betrouwbaarheidssteekproef tot de volledige steekproef</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="223"/>
        <source>Number of reliability coders</source>
        <translation>Aantal codeurs in de betrouwbaarheidstoets</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="224"/>
        <source>Amount of coding conducted by each coder</source>
        <translation>Hoeveelheid codeerwerk per codeur</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="225"/>
        <source>Index or indices selected and why</source>
        <translation>Gekozen index of indices en waarom</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="226"/>
        <source>Reliability for each variable, for each index</source>
        <translation>Betrouwbaarheid per variabele, per index</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="227"/>
        <source>Amount of coder training required to reach reliability</source>
        <translation>Hoeveelheid codeurstraining die nodig was om betrouwbaarheid te bereiken</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="229"/>
        <source>How disagreements were resolved</source>
        <translation>Hoe verschillen zijn opgelost</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="231"/>
        <source>Where the codebook and coding instructions can be obtained</source>
        <translation>Waar het codeboek en de codeerinstructies te verkrijgen zijn</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="236"/>
        <source>#</source>
        <translation>#</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="237"/>
        <source>Item</source>
        <translation>Punt</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="238"/>
        <source>In this report</source>
        <translation>In dit rapport</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="247"/>
        <source>filled in from the project</source>
        <translation>ingevuld uit het project</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="248"/>
        <source>partly filled in; complete the bracket</source>
        <translation>deels ingevuld; vul de haakjes aan</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="21"/>
        <location filename="../app/report/report_sections.cpp" line="23"/>
        <location filename="../app/report/report_sections.cpp" line="109"/>
        <location filename="../app/report/report_sections.cpp" line="198"/>
        <location filename="../app/report/report_sections.cpp" line="242"/>
        <location filename="../app/report/report_sections.cpp" line="399"/>
        <source>Variable</source>
        <translation>Variabele</translation>
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
        <translation>Eenh.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="26"/>
        <location filename="../app/report/report_sections.cpp" line="110"/>
        <source>Pairable values</source>
        <translation>Paarb. waarden</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="27"/>
        <source>95% CI, units</source>
        <translation>95%-BI, eenheden</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="28"/>
        <source>95% CI, pairs</source>
        <translation>95%-BI, paren</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="29"/>
        <location filename="../app/report/report_sections.cpp" line="201"/>
        <source>Agreement</source>
        <translation>Overeenst.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="30"/>
        <location filename="../app/report/report_sections.cpp" line="306"/>
        <source>Verdict</source>
        <translation>Oordeel</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="45"/>
        <source>not computed: %1</source>
        <translation>niet berekend: %1</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="78"/>
        <source>Units: %1 (articles for article-level items; passages matched across coders for span attributes). Agreement: percent agreement, which is not chance-corrected and is never reported alone (Lombard et al., 2002). Units: units resampled, percentile interval (the interval to report); pairs: pairable values resampled with the expected disagreement held fixed (Hayes &amp; Krippendorff, 2007), too narrow with more than two coders.</source>
        <translation>Eenheden: %1 (artikelen voor items op artikelniveau; tussen codeurs gekoppelde passages voor kenmerken van fragmenten). Overeenstemming: procentuele overeenstemming, die niet voor toeval gecorrigeerd is en nooit alleen wordt gerapporteerd (Lombard et al., 2002). Eenheden: eenheden opnieuw getrokken, percentielinterval (het interval om te rapporteren); paren: paarbare waarden opnieuw getrokken met de verwachte onenigheid vastgehouden (Hayes &amp; Krippendorff, 2007), te smal bij meer dan twee codeurs.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="95"/>
        <source>Krippendorff&apos;s alpha per variable</source>
        <translation>Krippendorffs alfa per variabele</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="96"/>
        <source>Krippendorff&apos;s alpha per variable (dots) with 95% bootstrap intervals: whiskers resample pairable values (Hayes &amp; Krippendorff, 2007), bands resample units. The lines mark 0.667 and 0.800 (Krippendorff, 2004).</source>
        <translation>Krippendorffs alfa per variabele (punten) met 95%-bootstrapintervallen: de snorharen trekken paarbare waarden opnieuw (Hayes &amp; Krippendorff, 2007), de banden trekken eenheden opnieuw. De lijnen markeren 0.667 en 0.800 (Krippendorff, 2004).</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="111"/>
        <source>Rarest value</source>
        <translation>Zeldzaamste waarde</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="112"/>
        <source>Minimum for α ≥ 0.800</source>
        <translation>Minimum voor α ≥ 0.800</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="113"/>
        <source>Enough?</source>
        <translation>Genoeg?</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="130"/>
        <source>yes</source>
        <translation>ja</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="131"/>
        <source>too few values</source>
        <translation>te weinig waarden</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="134"/>
        <source>Krippendorff&apos;s (2004, §11.4) minimum number of pairable values for α ≥ 0.800 at p = 0.05, after Bloch &amp; Kraemer (1989), given the share of the rarest value.</source>
        <translation>Krippendorffs (2004, §11.4) minimale aantal paarbare waarden voor α ≥ 0.800 bij p = 0.05, naar Bloch &amp; Kraemer (1989), gegeven het aandeel van de zeldzaamste waarde.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="147"/>
        <source>Coder</source>
        <translation>Codeur</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="148"/>
        <source>Role</source>
        <translation>Rol</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="39"/>
        <location filename="../app/report/report_sections.cpp" line="149"/>
        <source>Articles</source>
        <translation>Artikelen</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="150"/>
        <source>Shared articles</source>
        <translation>Gedeelde artikelen</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="151"/>
        <source>Spans</source>
        <translation>Fragmenten</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="157"/>
        <source>Answers</source>
        <translation>Antwoorden</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="176"/>
        <source>Coders appear by pseudonym only. Articles: coded by the coder (assigned, or with a span or an answer); shared: also coded by another coder in this report.</source>
        <translation>Codeurs verschijnen alleen onder pseudoniem. Artikelen: door de codeur gecodeerd (toegewezen, of met een fragment of een antwoord); gedeeld: in dit rapport ook door een andere codeur gecodeerd.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="188"/>
        <source>Cohen&apos;s kappa per coder pair</source>
        <translation>Cohens kappa per codeurspaar</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="189"/>
        <source>Cohen&apos;s kappa (Cohen, 1960) for each pair of coders and each function, on the %1 both coded. Darker is higher; hatched cells are undefined.</source>
        <translation>Cohens kappa (Cohen, 1960) voor elk paar codeurs en elke functie, op de %1 die beiden codeerden. Donkerder is hoger; gearceerde cellen zijn niet gedefinieerd.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="199"/>
        <source>Pair</source>
        <translation>Paar</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="202"/>
        <source>95% CI</source>
        <translation>95%-BI</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="228"/>
        <source>95% CI: large-sample interval with the standard error of Fleiss, Cohen &amp; Everitt (1969). A coder whose kappa is low with everyone else is worth a look before the coders are retrained.</source>
        <translation>95%-BI: interval voor grote steekproeven met de standaardfout van Fleiss, Cohen &amp; Everitt (1969). Een codeur wiens kappa met alle anderen laag is, verdient een nadere blik voordat de codeurs opnieuw worden getraind.</translation>
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
        <translation>n.v.t.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="274"/>
        <source>For comparison with older studies: Fleiss (1971) and Light (1971) for any number of coders, Cohen (1960), Scott (1955) and Bennett, Alpert &amp; Goldstein (1954) for two; n/a where their assumptions (complete data, two coders) do not hold.</source>
        <translation>Ter vergelijking met oudere studies: Fleiss (1971) en Light (1971) voor elk aantal codeurs, Cohen (1960), Scott (1955) en Bennett, Alpert &amp; Goldstein (1954) voor twee; n.v.t. waar hun aannames (volledige gegevens, twee codeurs) niet opgaan.</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="290"/>
        <source>Not computed: %1</source>
        <translation>Niet berekend: %1</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="293"/>
        <source>Unitizing alpha (Krippendorff, 2004) compares where the coders put their spans, character by character, on the %1 articles that every coder coded (%2 characters laid end to end).</source>
        <translation>Unitizing-alfa (Krippendorff, 2004) vergelijkt teken voor teken waar de codeurs hun fragmenten plaatsen, op de %1 artikelen die elke codeur codeerde (%2 tekens achter elkaar).</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="303"/>
        <source>Function</source>
        <translation>Functie</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="304"/>
        <source>Observed disagreement</source>
        <translation>Waargenomen onenigheid</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="305"/>
        <source>Expected disagreement</source>
        <translation>Verwachte onenigheid</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="330"/>
        <source>all four</source>
        <translation>alle vier</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="353"/>
        <source>Alpha without each coder</source>
        <translation>Alfa zonder elke codeur</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="355"/>
        <source>Left out</source>
        <translation>Weggelaten</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="388"/>
        <source>Alpha recomputed without the coder&apos;s codings; in brackets the change against all coders (positive: the coder pulls alpha down). A diagnostic for retraining, not a licence to report the better figure (Krippendorff, 2004).</source>
        <translation>Alfa opnieuw berekend zonder de coderingen van de codeur; tussen haakjes de verandering ten opzichte van alle codeurs (positief: de codeur trekt alfa omlaag). Een diagnose voor hertraining, geen vrijbrief om het betere cijfer te rapporteren (Krippendorff, 2004).</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="395"/>
        <source>The article that costs most</source>
        <translation>Het artikel dat het meest kost</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="400"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="401"/>
        <source>α without it</source>
        <translation>α zonder dit artikel</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="402"/>
        <source>Change</source>
        <translation>Verandering</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="427"/>
        <source>Function confusion between coders</source>
        <translation>Functieverwarring tussen codeurs</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="430"/>
        <source>A coder&apos;s span</source>
        <translation>Fragment van een codeur</translation>
    </message>
    <message>
        <location filename="../app/report/report_sections.cpp" line="456"/>
        <source>For each coder&apos;s span, the function the other coder gave the span that overlaps it most (none: nothing there), summed over ordered pairs of coders. Off the diagonal are the confusions a codebook rule could settle.</source>
        <translation>Voor elk fragment van een codeur de functie die de andere codeur gaf aan het fragment dat het meest ermee overlapt (geen: daar staat niets), opgeteld over geordende paren codeurs. Buiten de diagonaal staan de verwarringen die een codeboekregel kan beslechten.</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="19"/>
        <source>The newest saved frame analysis, “%1” (saved %2): %3 frames of the layer %4 over %5 articles, by Ward&apos;s hierarchical clustering refined by k-means (Matthes &amp; Kohring 2008). A frame&apos;s characteristic elements are those with an adjusted residual above 1.96 (Haberman 1973), with their share in the frame and in all articles. The frames are only as good as their elements: beside each element variable stands its Krippendorff&apos;s alpha (nominal, articles as units) over the coders of this report.</source>
        <translation>De nieuwste opgeslagen frameanalyse, ‘%1’ (opgeslagen %2): %3 frames van de laag %4 over %5 artikelen, met hiërarchische clustering volgens Ward, verfijnd met k-means (Matthes &amp; Kohring 2008). De kenmerkende elementen van een frame zijn die met een gecorrigeerd residu boven 1.96 (Haberman 1973), met hun aandeel in het frame en in alle artikelen. De frames zijn maar zo goed als hun elementen: naast elke elementvariabele staat haar Krippendorffs alfa (nominaal, artikelen als eenheden) over de codeurs van dit rapport.</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="37"/>
        <source>Frame</source>
        <translation>Frame</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="38"/>
        <source>Name</source>
        <translation>Naam</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="40"/>
        <source>Share</source>
        <translation>Aandeel</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="41"/>
        <source>Characteristic elements</source>
        <translation>Kenmerkende elementen</translation>
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
        <translation>geen enkel valt op</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="69"/>
        <source>Element variable</source>
        <translation>Elementvariabele</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="70"/>
        <source>Pairable articles</source>
        <translation>Paarbare artikelen</translation>
    </message>
    <message>
        <location filename="../app/report/report_frames_section.cpp" line="71"/>
        <source>Characterises</source>
        <translation>Kenmerkt</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="257"/>
        <source>Every figure above is what these commands print (add --json for all digits):</source>
        <translation>Elk cijfer hierboven is wat deze opdrachten afdrukken (voeg --json toe voor alle cijfers):</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="63"/>
        <source>en</source>
        <extracomment>The report&apos;s language as a BCP 47 tag for &lt;html lang&gt;: nl, de.</extracomment>
        <translation>nl</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="81"/>
        <source>Method text</source>
        <translation>Methodetekst</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="83"/>
        <source>Reporting checklist (Lombard, Snyder-Duch &amp; Bracken, 2002)</source>
        <translation>Checklist voor de verslaglegging (Lombard, Snyder-Duch &amp; Bracken, 2002)</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="85"/>
        <source>Reliability per variable</source>
        <translation>Betrouwbaarheid per variabele</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="87"/>
        <source>Is the sample large enough?</source>
        <translation>Is de steekproef groot genoeg?</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="89"/>
        <source>Coders and the amount each coded</source>
        <translation>Codeurs en hoeveel elk codeerde</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="91"/>
        <source>Coder pairs</source>
        <translation>Codeursparen</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="92"/>
        <source>Other coefficients</source>
        <translation>Andere coëfficiënten</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="94"/>
        <source>Span boundaries: unitizing alpha</source>
        <translation>Grenzen van fragmenten: unitizing-alfa</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="98"/>
        <source>Where reliability is lost</source>
        <translation>Waar betrouwbaarheid verloren gaat</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="101"/>
        <source>Frames</source>
        <translation>Frames</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="102"/>
        <source>Reproducing the figures</source>
        <translation>De cijfers reproduceren</translation>
    </message>
    <message>
        <location filename="../app/report/report_document.cpp" line="104"/>
        <source>References</source>
        <translation>Literatuur</translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="156"/>
        <source>Answers to article-level items were adjudicated as well: %1 gold answers on %2 articles, %3 of them with a written rationale. </source>
        <translation>Ook antwoorden op items op artikelniveau zijn beslist: %1 antwoorden van de gouden standaard bij %2 artikelen, %3 daarvan met een schriftelijke motivering. </translation>
    </message>
    <message>
        <location filename="../app/report/report_method_text.cpp" line="167"/>
        <source>Disagreements on article-level items were resolved by adjudication into a separate gold standard: %1 gold answers on %2 articles, decided by %3, %4 of them with a written rationale. The independent codings were kept unchanged; every figure above comes from them. </source>
        <translation>Verschillen bij items op artikelniveau zijn opgelost door beslissing in een aparte gouden standaard: %1 antwoorden van de gouden standaard bij %2 artikelen, beslist door %3, %4 daarvan met een schriftelijke motivering. De onafhankelijke coderingen bleven ongewijzigd; alle bovenstaande cijfers komen daaruit. </translation>
    </message>
</context>
<context>
    <name>ReportWriterText</name>
    <message>
        <location filename="../app/report/report_writer.cpp" line="33"/>
        <source>Writing a report needs the graphical libraries; start the program with a QGuiApplication (the offscreen platform will do).</source>
        <translation>Voor het schrijven van een rapport zijn de grafische bibliotheken nodig; start het programma met een QGuiApplication (het offscreen-platform volstaat).</translation>
    </message>
    <message>
        <location filename="../app/report/report_writer.cpp" line="42"/>
        <location filename="../app/report/report_writer.cpp" line="55"/>
        <location filename="../app/report/report_writer.cpp" line="67"/>
        <source>The report could not be written to %1.</source>
        <translation>Het rapport kon niet naar %1 worden geschreven.</translation>
    </message>
    <message>
        <location filename="../app/report/report_writer.cpp" line="101"/>
        <source>The report file %1 must end in .html or .pdf.</source>
        <translation>Het rapportbestand %1 moet eindigen op .html of .pdf.</translation>
    </message>
</context>
<context>
    <name>RunAgreementText</name>
    <message>
        <location filename="../core/scoring/run_agreement.cpp" line="61"/>
        <source>The run joins the humans on paragraph, sentence or token units.</source>
        <translation>De run voegt zich bij de mensen op eenheden van alinea&apos;s, zinnen of tokens.</translation>
    </message>
</context>
<context>
    <name>RunErrorsText</name>
    <message>
        <location filename="../core/scoring/run_errors.cpp" line="136"/>
        <source>A run is compared with the gold standard or one coder, not &quot;%1&quot;.</source>
        <translation>Een run wordt vergeleken met de gouden standaard of met één codeur, niet met ‘%1’.</translation>
    </message>
    <message>
        <location filename="../core/scoring/run_errors.cpp" line="156"/>
        <source>The project has no gold spans yet, so there is nothing to compare with.</source>
        <translation>Het project heeft nog geen fragmenten in de gouden standaard, dus er is niets om mee te vergelijken.</translation>
    </message>
    <message>
        <location filename="../core/scoring/run_errors.cpp" line="158"/>
        <source>Coder &quot;%1&quot; has coded no article, so there is nothing to compare with.</source>
        <translation>Codeur ‘%1’ heeft geen artikel gecodeerd, dus er is niets om mee te vergelijken.</translation>
    </message>
</context>
<context>
    <name>RunScoresText</name>
    <message>
        <location filename="../core/scoring/run_scores.cpp" line="204"/>
        <source>A run is scored against the gold standard or one coder, not &quot;%1&quot;.</source>
        <translation>Een run wordt gescoord tegen de gouden standaard of één codeur, niet tegen ‘%1’.</translation>
    </message>
    <message>
        <location filename="../core/scoring/run_scores.cpp" line="224"/>
        <source>The project has no gold spans yet, so there is nothing to score against.</source>
        <translation>Het project heeft nog geen fragmenten in de gouden standaard, dus er is niets om tegen te scoren.</translation>
    </message>
    <message>
        <location filename="../core/scoring/run_scores.cpp" line="226"/>
        <source>Coder &quot;%1&quot; has coded no article, so there is nothing to score against.</source>
        <translation>Codeur ‘%1’ heeft geen artikel gecodeerd, dus er is niets om tegen te scoren.</translation>
    </message>
</context>
<context>
    <name>SavedFrames</name>
    <message>
        <location filename="../core/project/saved_frames.cpp" line="22"/>
        <source>%1 has no saved frame analysis &quot;%2&quot;.</source>
        <translation>%1 heeft geen opgeslagen frameanalyse ‘%2’.</translation>
    </message>
</context>
<context>
    <name>Schema</name>
    <message>
        <location filename="../core/store/schema.cpp" line="397"/>
        <source>Upgrading %1 to schema version %2 failed; the file is unchanged.</source>
        <translation>Het bijwerken van %1 naar schemaversie %2 is mislukt; het bestand is ongewijzigd.</translation>
    </message>
    <message>
        <location filename="../core/store/schema.cpp" line="463"/>
        <source>%1 is an SQLite file but not a Fourfold project.</source>
        <translation>%1 is een SQLite-bestand, maar geen Fourfold-project.</translation>
    </message>
    <message>
        <location filename="../core/store/schema.cpp" line="472"/>
        <source>%1 was written by a newer Fourfold (schema version %2; this version reads up to %3). Open it with a newer Fourfold; the file was not changed.</source>
        <translation>%1 is geschreven door een nieuwere Fourfold (schemaversie %2; deze versie leest tot en met %3). Open het met een nieuwere Fourfold; het bestand is niet gewijzigd.</translation>
    </message>
    <message>
        <location filename="../core/store/schema.cpp" line="520"/>
        <location filename="../core/store/schema.cpp" line="540"/>
        <source>Could not back up %1 to %2 before upgrading it; the file was not changed.</source>
        <translation>Kon vóór het bijwerken geen back-up van %1 maken naar %2; het bestand is niet gewijzigd.</translation>
    </message>
    <message>
        <location filename="../core/store/schema.cpp" line="530"/>
        <source>%1 needs upgrading from schema version %2, but its backup %3 from an earlier upgrade differs from it; move the backup away and open the file again. The file was not changed.</source>
        <translation>%1 moet worden bijgewerkt vanaf schemaversie %2, maar de back-up %3 van een eerdere update wijkt ervan af; verplaats de back-up en open het bestand opnieuw. Het bestand is niet gewijzigd.</translation>
    </message>
</context>
<context>
    <name>SegmenterText</name>
    <message>
        <location filename="../core/text/segmenter.cpp" line="257"/>
        <source>The text is too long to segment (more than 2^31 UTF-16 code units).</source>
        <translation>De tekst is te lang om te segmenteren (meer dan 2^31 UTF-16-code-eenheden).</translation>
    </message>
    <message>
        <location filename="../core/text/segmenter.cpp" line="265"/>
        <source>&quot;%1&quot; is not a valid BCP 47 language tag (for example &quot;en&quot;, &quot;nl&quot; or &quot;de-AT&quot;).</source>
        <translation>‘%1’ is geen geldige BCP 47-taaltag (bijvoorbeeld ‘en’, ‘nl’ of ‘de-AT’).</translation>
    </message>
    <message>
        <location filename="../core/text/segmenter.cpp" line="278"/>
        <source>ICU could not create its break iterators for &quot;%1&quot;.</source>
        <translation>ICU kon zijn break-iterators voor ‘%1’ niet aanmaken.</translation>
    </message>
    <message>
        <location filename="../core/text/segmenter.cpp" line="334"/>
        <source>ICU could not segment the text.</source>
        <translation>ICU kon de tekst niet segmenteren.</translation>
    </message>
</context>
<context>
    <name>ServerConnectionText</name>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="133"/>
        <source>Out of memory while connecting to the server.</source>
        <translation>Onvoldoende geheugen bij het verbinden met de server.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="142"/>
        <source>The server refused the login %1.</source>
        <translation>De server heeft de aanmelding %1 geweigerd.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="143"/>
        <source>Could not connect to the server %1.</source>
        <translation>Kon geen verbinding maken met de server %1.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="150"/>
        <source>The server %1 cannot speak UTF-8.</source>
        <translation>De server %1 ondersteunt geen UTF-8.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="164"/>
        <source>&quot;%1&quot; is not a PostgreSQL connection string.</source>
        <translation>‘%1’ is geen PostgreSQL-verbindingsreeks.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="204"/>
        <source>The server %1 does not allow this for the role %2.</source>
        <translation>De server %1 staat dit niet toe voor de rol %2.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="208"/>
        <source>The server %1 refused a row that breaks a rule of the team project.</source>
        <translation>De server %1 heeft een rij geweigerd die een regel van het teamproject overtreedt.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="214"/>
        <location filename="../core/team/server_store_connection.cpp" line="299"/>
        <source>The connection to the server %1 was lost.</source>
        <translation>De verbinding met de server %1 is verbroken.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="218"/>
        <source>The server %1 could not run a statement.</source>
        <translation>De server %1 kon een opdracht niet uitvoeren.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_connection.cpp" line="258"/>
        <source>Could not make a SCRAM verifier for the role %1.</source>
        <translation>Kon geen SCRAM-verifier maken voor de rol %1.</translation>
    </message>
</context>
<context>
    <name>ServerRolesText</name>
    <message>
        <location filename="../core/team/server_store_roles.cpp" line="37"/>
        <source>The server %1 has a role %2 already; a team project needs a new role for each person (use another database name, or drop the old role).</source>
        <translation>De server %1 heeft al een rol %2; een teamproject heeft voor elke persoon een nieuwe rol nodig (gebruik een andere databasenaam of verwijder de oude rol).</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_roles.cpp" line="101"/>
        <source>The server %1 has no login for the person %2.</source>
        <translation>De server %1 heeft geen aanmelding voor de persoon %2.</translation>
    </message>
</context>
<context>
    <name>ServerSchema</name>
    <message>
        <location filename="../core/team/server_store_schema.cpp" line="485"/>
        <source>The team project on %1 was written by a newer Fourfold (server schema version %2; this version reads up to %3); nothing was changed.</source>
        <translation>Het teamproject op %1 is geschreven door een nieuwere Fourfold (serverschemaversie %2; deze versie leest tot en met %3); er is niets gewijzigd.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_schema.cpp" line="494"/>
        <source>Upgrading the team project on %1 to server schema version %2 failed.</source>
        <translation>Het bijwerken van het teamproject op %1 naar serverschemaversie %2 is mislukt.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_schema.cpp" line="485"/>
        <source>The database %1 holds no team project.</source>
        <translation>De database %1 bevat geen teamproject.</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_schema.cpp" line="489"/>
        <source>The team project on %1 was written by a newer Fourfold (server schema version %2; this version reads up to %3).</source>
        <translation>Het teamproject op %1 is geschreven door een nieuwere Fourfold (serverschemaversie %2; deze versie leest tot en met %3).</translation>
    </message>
    <message>
        <location filename="../core/team/server_store_schema.cpp" line="497"/>
        <source>The team project on %1 has server schema version %2; this Fourfold works with version %3. The administrator who published it upgrades it first: fourfold-cli team upgrade --server CONNECTION (nothing was changed).</source>
        <translation>Het teamproject op %1 heeft serverschemaversie %2; deze Fourfold werkt met versie %3. De beheerder die het heeft gepubliceerd, werkt het eerst bij: fourfold-cli team upgrade --server VERBINDING (er is niets gewijzigd).</translation>
    </message>
</context>
<context>
    <name>SharedRows</name>
    <message>
        <location filename="../core/store/shared_rows.cpp" line="131"/>
        <source>A shared row is not a JSON object.</source>
        <translation>Een gedeelde rij is geen JSON-object.</translation>
    </message>
    <message>
        <location filename="../core/store/shared_rows.cpp" line="156"/>
        <source>The units of the article %1 are not pairs of 32-bit offsets.</source>
        <translation>De eenheden van artikel %1 zijn geen paren van 32-bits offsets.</translation>
    </message>
</context>
<context>
    <name>ShortcutTableText</name>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="25"/>
        <source> or </source>
        <translation> of </translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="114"/>
        <source>Mark the selected text as problem, cause, evaluation or remedy, snapped to whole words; with a span selected: relabel it</source>
        <translation>De geselecteerde tekst markeren als probleem, oorzaak, evaluatie of oplossing, uitgelijnd op hele woorden; met een fragment geselecteerd: de functie ervan wijzigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="117"/>
        <source>%1+1 – 4 (or Alt+1 – 4)</source>
        <translation>%1+1 – 4 (of Alt+1 – 4)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="118"/>
        <source>Mark exactly the selected text, without snapping to words</source>
        <translation>Precies de geselecteerde tekst markeren, zonder uitlijning op woorden</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="120"/>
        <source>Exact selection on or off (View menu): while on, 1 – 4 and handle drags take the text exactly as selected</source>
        <translation>Exacte selectie aan of uit (menu Beeld): zolang die aan staat, nemen 1 – 4 en het slepen aan grepen de tekst precies zoals geselecteerd</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="123"/>
        <source>%1 while dragging a handle (or Alt)</source>
        <translation>%1 tijdens het slepen aan een greep (of Alt)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="124"/>
        <source>Resize the selected span to the exact character</source>
        <translation>Het geselecteerde fragment tot op het teken groter of kleiner maken</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="125"/>
        <source>Delete or Backspace</source>
        <translation>Delete of Backspace</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="126"/>
        <source>Delete the selected span</source>
        <translation>Het geselecteerde fragment verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="127"/>
        <source>%1+Left / Right (or Alt+Left / Right)</source>
        <translation>%1+Links / Rechts (of Alt+Links / Rechts)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="128"/>
        <source>Move the selected span&apos;s start by a word</source>
        <translation>Het begin van het geselecteerde fragment een woord verplaatsen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="129"/>
        <source>%1+Shift+Left / Right (or Alt+Shift+Left / Right)</source>
        <translation>%1+Shift+Links / Rechts (of Alt+Shift+Links / Rechts)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="130"/>
        <source>Move the selected span&apos;s end by a word</source>
        <translation>Het einde van het geselecteerde fragment een woord verplaatsen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="131"/>
        <source>%1+Up / Down (or Alt+Up / Down)</source>
        <translation>%1+Omhoog / Omlaag (of Alt+Omhoog / Omlaag)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="132"/>
        <source>Select the previous / next span</source>
        <translation>Het vorige / volgende fragment selecteren</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="133"/>
        <source>Esc</source>
        <translation>Esc</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="134"/>
        <source>Clear the span selection, then the text selection; cancel a drag</source>
        <translation>Eerst de fragmentselectie opheffen, dan de tekstselectie; een sleepbeweging annuleren</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="136"/>
        <location filename="../app/desktop/shortcut_table.cpp" line="179"/>
        <source>Undo the last change</source>
        <translation>De laatste wijziging ongedaan maken</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="137"/>
        <location filename="../app/desktop/shortcut_table.cpp" line="180"/>
        <source>Redo</source>
        <translation>Opnieuw</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="139"/>
        <source>Mark the article as done and open the next</source>
        <translation>Het artikel als klaar markeren en het volgende openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="140"/>
        <source>Next article that is not done</source>
        <translation>Volgend artikel dat niet klaar is</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="141"/>
        <source>Start a new project</source>
        <translation>Een nieuw project beginnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="142"/>
        <source>Open a project</source>
        <translation>Een project openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="143"/>
        <source>Search the texts</source>
        <translation>In de teksten zoeken</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="145"/>
        <source>Compare coders and adjudicate (leads)</source>
        <translation>Codeurs vergelijken en beslissen (coördinatoren)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="146"/>
        <source>Reliability (leads)</source>
        <translation>Betrouwbaarheid (coördinatoren)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="147"/>
        <location filename="../app/desktop/shortcut_table.cpp" line="181"/>
        <source>This list of keys</source>
        <translation>Deze lijst met toetsen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="155"/>
        <source>Next undecided disagreement</source>
        <translation>Volgend onbeslist verschil</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="157"/>
        <source>Previous undecided disagreement</source>
        <translation>Vorig onbeslist verschil</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="158"/>
        <source>Next article in the queue</source>
        <translation>Volgend artikel in de wachtrij</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="160"/>
        <source>Previous article in the queue</source>
        <translation>Vorig artikel in de wachtrij</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="162"/>
        <source>Re-sort the queue: most undecided disagreements first (the queue keeps its order while you decide)</source>
        <translation>De wachtrij opnieuw sorteren: de meeste onbesliste verschillen eerst (tot dan houdt de wachtrij haar volgorde terwijl je beslist)</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="165"/>
        <source>Accept the chosen coder&apos;s span into gold</source>
        <translation>Het fragment van de gekozen codeur in de gouden standaard opnemen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="167"/>
        <source>Put one span covering the chosen spans into gold</source>
        <translation>Eén fragment dat de gekozen fragmenten omvat in de gouden standaard opnemen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="169"/>
        <source>Decide a gold span with a function and boundaries of your own</source>
        <translation>Een fragment voor de gouden standaard vastleggen met een eigen functie en eigen grenzen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="171"/>
        <source>Record that the chosen spans do not belong in gold</source>
        <translation>Vastleggen dat de gekozen fragmenten niet in de gouden standaard horen</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="172"/>
        <source>Withdraw the chosen gold span</source>
        <translation>Het gekozen fragment uit de gouden standaard terugtrekken</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="174"/>
        <source>Accept every span all coders of the article agree on</source>
        <translation>Elk fragment accepteren waarover alle codeurs van het artikel het eens zijn</translation>
    </message>
    <message>
        <location filename="../app/desktop/shortcut_table.cpp" line="176"/>
        <source>Write the rationale kept with the next decision</source>
        <translation>De motivering schrijven die bij de volgende beslissing wordt bewaard</translation>
    </message>
</context>
<context>
    <name>SpanLayerText</name>
    <message>
        <location filename="../core/scoring/span_layer.cpp" line="54"/>
        <source>Unknown layer &quot;%1&quot; (expected gold, coders, coder:PSEUDONYM or run:NAME).</source>
        <translation>Onbekende laag ‘%1’ (verwacht: gold, coders, coder:PSEUDONYM of run:NAME).</translation>
    </message>
    <message>
        <location filename="../core/scoring/span_layer.cpp" line="108"/>
        <source>There is no coder &quot;%1&quot; in the project.</source>
        <translation>Er is geen codeur ‘%1’ in het project.</translation>
    </message>
    <message>
        <location filename="../core/scoring/span_layer.cpp" line="149"/>
        <source>There is no extractor run &quot;%1&quot; in the project.</source>
        <translation>Er is geen extractorrun ‘%1’ in het project.</translation>
    </message>
</context>
<context>
    <name>StudyDesignText</name>
    <message numerus="yes">
        <location filename="../core/project/assignment_plans.cpp" line="158"/>
        <source>Assign %n article(s)</source>
        <translation>
            <numerusform>%n artikel toewijzen</numerusform>
            <numerusform>%n artikelen toewijzen</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="239"/>
        <source>Draw the %1 subsample</source>
        <translation>De deelsteekproef van de fase %1 trekken</translation>
    </message>
    <message>
        <location filename="../core/project/study_progress.cpp" line="41"/>
        <source>Show effort per coder</source>
        <translation>Inspanning per persoon tonen</translation>
    </message>
    <message>
        <location filename="../core/project/study_progress.cpp" line="42"/>
        <source>Hide effort per coder</source>
        <translation>Inspanning per persoon verbergen</translation>
    </message>
    <message>
        <location filename="../core/project/assignment_plans.cpp" line="138"/>
        <location filename="../core/project/study_names.cpp" line="42"/>
        <source>There is no coder &quot;%1&quot; in the project.</source>
        <translation>Er is geen codeur ‘%1’ in het project.</translation>
    </message>
    <message>
        <location filename="../core/project/study_names.cpp" line="45"/>
        <source>The coder &quot;%1&quot; is named twice.</source>
        <translation>De codeur ‘%1’ is twee keer genoemd.</translation>
    </message>
    <message>
        <location filename="../core/project/assignment_plans.cpp" line="141"/>
        <location filename="../core/project/study_names.cpp" line="48"/>
        <source>%1 is disabled and takes no new assignments; enable them first.</source>
        <translation>%1 is uitgeschakeld en krijgt geen nieuwe toewijzingen; schakel deze persoon eerst in.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="60"/>
        <source>A subsample is drawn for the reliability or the pilot phase, not for %1.</source>
        <translation>Een deelsteekproef wordt getrokken voor de betrouwbaarheids- of de pilotfase, niet voor %1.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="65"/>
        <source>Give either the size of the subsample or its fraction of the articles.</source>
        <translation>Geef ofwel de omvang van de deelsteekproef ofwel haar aandeel in de artikelen.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="69"/>
        <source>The fraction %1 does not lie in (0, 1].</source>
        <translation>Het aandeel %1 ligt niet in (0, 1].</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="72"/>
        <source>A reliability subsample needs at least two coders; %1 given.</source>
        <translation>Een betrouwbaarheidsdeelsteekproef heeft ten minste twee codeurs nodig; opgegeven: %1.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="85"/>
        <source>The %1 phase already has a subsample (drawn %2 with seed %3).</source>
        <translation>De fase %1 heeft al een deelsteekproef (getrokken %2 met seed %3).</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="118"/>
        <source>A subsample of %1 articles cannot be drawn from a sampling frame of %2 articles.</source>
        <translation>Een deelsteekproef van %1 artikelen kan niet worden getrokken uit een steekproefkader van %2 artikelen.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="234"/>
        <source>The %1 phase already has a subsample.</source>
        <translation>De fase %1 heeft al een deelsteekproef.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="305"/>
        <source>The record of the %1 subsample is not a JSON object.</source>
        <translation>Het record van de deelsteekproef %1 is geen JSON-object.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="351"/>
        <source>The subsample record is damaged: %1.</source>
        <translation>Het record van de deelsteekproef is beschadigd: %1.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="362"/>
        <source>no valid phase</source>
        <translation>geen geldige fase</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="366"/>
        <source>unknown method &quot;%1&quot;</source>
        <translation>onbekende methode ‘%1’</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="371"/>
        <source>unknown stratum &quot;%1&quot;</source>
        <translation>onbekende stratum ‘%1’</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="376"/>
        <source>no valid seed</source>
        <translation>geen geldige seed</translation>
    </message>
    <message>
        <location filename="../core/project/assignment_plans.cpp" line="26"/>
        <source>Double coding needs at least two coders; %1 given.</source>
        <translation>Dubbele codering heeft ten minste twee codeurs nodig; opgegeven: %1.</translation>
    </message>
    <message>
        <location filename="../core/project/assignment_plans.cpp" line="28"/>
        <source>Name at least one coder for the remaining articles.</source>
        <translation>Noem ten minste één codeur voor de overige artikelen.</translation>
    </message>
    <message>
        <location filename="../core/project/assignment_plans.cpp" line="80"/>
        <source>Name at least one article and one coder.</source>
        <translation>Noem ten minste één artikel en één codeur.</translation>
    </message>
    <message>
        <location filename="../core/project/assignment_plans.cpp" line="90"/>
        <location filename="../core/project/assignment_plans.cpp" line="134"/>
        <source>There is no article &quot;%1&quot; in the project.</source>
        <translation>Er is geen artikel ‘%1’ in het project.</translation>
    </message>
    <message>
        <location filename="../core/project/assignment_plans.cpp" line="151"/>
        <source>Article &quot;%1&quot; is already assigned to %2 in the %3 phase.</source>
        <translation>Artikel ‘%1’ is in de fase %3 al aan %2 toegewezen.</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_version_edit.cpp" line="91"/>
        <source>%1 span(s) of %2 carry the value &quot;%3&quot; of the attribute &quot;%4&quot;, which the new version neither lists nor recodes; add &quot;recode&quot;: {&quot;%3&quot;: &quot;…&quot;} to the attribute with one of its values (%5).</source>
        <translation>%1 fragment(en) van %2 dragen de waarde ‘%3’ van het kenmerk ‘%4’, die de nieuwe versie niet noemt en niet hercodeert; voeg &quot;recode&quot;: {&quot;%3&quot;: &quot;…&quot;} met een van zijn waarden aan het kenmerk toe (%5).</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_version_edit.cpp" line="110"/>
        <source>%1 answer(s) to the item &quot;%2&quot; are &quot;%3&quot;, which the new version neither lists nor recodes; add &quot;recode&quot;: {&quot;%3&quot;: &quot;…&quot;} to the item with one of its values (%4).</source>
        <translation>%1 antwoord(en) op het item ‘%2’ zijn ‘%3’, dat de nieuwe versie niet noemt en niet hercodeert; voeg &quot;recode&quot;: {&quot;%3&quot;: &quot;…&quot;} met een van zijn waarden aan het item toe (%4).</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_versions.cpp" line="186"/>
        <source>A new codebook version needs a note that says what changed and why.</source>
        <translation>Een nieuwe codeboekversie heeft een notitie nodig die zegt wat er is veranderd en waarom.</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_versions.cpp" line="200"/>
        <source>The codebook is the same as version %1; no new version was made.</source>
        <translation>Het codeboek is gelijk aan versie %1; er is geen nieuwe versie gemaakt.</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_versions.cpp" line="309"/>
        <source>Codebook version %1 → %2</source>
        <translation>Codeboekversie %1 → %2</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_versions.cpp" line="311"/>
        <source>no changes</source>
        <translation>geen wijzigingen</translation>
    </message>
    <message>
        <location filename="../core/project/training_feedback.cpp" line="24"/>
        <source>Training feedback is computed on paragraphs, sentences or tokens, not on %1 units.</source>
        <translation>Trainingsfeedback wordt berekend op alinea&apos;s, zinnen of tokens, niet op %1-eenheden.</translation>
    </message>
    <message>
        <location filename="../core/project/training_feedback.cpp" line="42"/>
        <source>Name the lead whose training coding is the master: there is not exactly one lead with training annotations.</source>
        <translation>Noem de coördinator wiens trainingscodering de maatstaf is: er is niet precies één coördinator met trainingsannotaties.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="266"/>
        <source>The %1 phase has no subsample to withdraw.</source>
        <translation>De fase %1 heeft geen deelsteekproef om in te trekken.</translation>
    </message>
    <message>
        <location filename="../core/project/subsample_draw.cpp" line="280"/>
        <source>Withdraw the %1 subsample</source>
        <translation>Deelsteekproef van fase %1 intrekken</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_version_edit.cpp" line="38"/>
        <source>Save codebook version %1</source>
        <translation>Codeboekversie %1 opslaan</translation>
    </message>
    <message>
        <location filename="../core/project/codebook_version_edit.cpp" line="48"/>
        <source>The codebook is at version %1 now; this change was made to version %2 and is not saved. Make it again on version %1.</source>
        <translation>Het codeboek staat nu op versie %1; deze wijziging is op versie %2 gemaakt en niet opgeslagen. Breng haar opnieuw aan op versie %1.</translation>
    </message>
    <message numerus="yes">
        <location filename="../core/project/codebook_version_edit.cpp" line="66"/>
        <source>%n span(s) or answer(s) were made under codebook version %1; undo them before the version.</source>
        <translation>
            <numerusform>%n markering of antwoord is onder codeboekversie %1 gemaakt; maak die eerst ongedaan, dan de versie.</numerusform>
            <numerusform>%n markeringen of antwoorden zijn onder codeboekversie %1 gemaakt; maak die eerst ongedaan, dan de versie.</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>StudyEditText</name>
    <message>
        <location filename="../core/project/study_edits.cpp" line="59"/>
        <source>The project already holds %1.</source>
        <translation>Het project bevat %1 al.</translation>
    </message>
    <message>
        <location filename="../core/project/study_edits.cpp" line="132"/>
        <source>The %1 phase has no subsample to withdraw.</source>
        <translation>De fase %1 heeft geen deelsteekproef om in te trekken.</translation>
    </message>
    <message>
        <location filename="../core/project/study_edits.cpp" line="152"/>
        <source>The %1 subsample cannot be withdrawn: coding has started on %2 of its %3 assignments (spans, answers, coding time, or a status of started or done). A draw can be withdrawn only before anyone codes it.</source>
        <translation>De deelsteekproef van fase %1 kan niet worden ingetrokken: bij %2 van haar %3 toewijzingen is het coderen begonnen (fragmenten, antwoorden, codeertijd, of de status begonnen of klaar). Een trekking kan alleen worden ingetrokken voordat iemand haar codeert.</translation>
    </message>
    <message>
        <location filename="../core/project/study_edits.cpp" line="183"/>
        <source>An edit that was never applied cannot be undone.</source>
        <translation>Een wijziging die nooit is uitgevoerd, kan niet ongedaan worden gemaakt.</translation>
    </message>
    <message>
        <location filename="../core/project/study_edits.cpp" line="102"/>
        <source>&quot;%1&quot; cannot be undone: coding has started on %2 of its %3 assignments (spans, answers, coding time, or a status of started or done).</source>
        <translation>„%1” kan niet ongedaan worden gemaakt: bij %2 van de %3 toewijzingen is het coderen begonnen (fragmenten, antwoorden, codeertijd, of de status begonnen of klaar).</translation>
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
        <translation>Betrouwbaarheid</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="19"/>
        <source>Production</source>
        <translation>Hoofdcodering</translation>
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
        <translation>%1 u %2 min</translation>
    </message>
</context>
<context>
    <name>TeamPeopleText</name>
    <message>
        <location filename="../core/team/team_people.cpp" line="38"/>
        <source>%1 is not a team working file (made by team publish or team join).</source>
        <translation>%1 is geen werkbestand van een teamproject (gemaakt met team publish of team join).</translation>
    </message>
    <message>
        <location filename="../core/team/team_people.cpp" line="47"/>
        <source>The login %1 may not create or change login roles. Adding or disabling a person needs the administrator&apos;s login that published the team project (give it with --server).</source>
        <translation>De aanmelding %1 mag geen aanmeldrollen aanmaken of wijzigen. Een persoon toevoegen of uitschakelen vraagt de aanmelding van de beheerder die het teamproject publiceerde (geef die met --server).</translation>
    </message>
    <message>
        <location filename="../core/team/team_people.cpp" line="88"/>
        <source>%1 exists already; a new person&apos;s password file needs a new name.</source>
        <translation>%1 bestaat al; het wachtwoordbestand van een nieuwe persoon heeft een nieuwe naam nodig.</translation>
    </message>
</context>
<context>
    <name>TeamProjectText</name>
    <message>
        <location filename="../core/team/team_join.cpp" line="64"/>
        <source>%1 already exists; name a new file for the working file.</source>
        <translation>%1 bestaat al; noem een nieuw bestand voor het werkbestand.</translation>
    </message>
    <message>
        <location filename="../core/team/team_join.cpp" line="84"/>
        <source>The database %1 holds no team project.</source>
        <translation>De database %1 bevat geen teamproject.</translation>
    </message>
    <message>
        <location filename="../core/team/team_join.cpp" line="87"/>
        <source>The team project on %1 was written by a newer Fourfold (server schema version %2; this version reads up to %3).</source>
        <translation>Het teamproject op %1 is geschreven door een nieuwere Fourfold (serverschemaversie %2; deze versie leest tot en met %3).</translation>
    </message>
    <message>
        <location filename="../core/team/team_join.cpp" line="100"/>
        <location filename="../core/team/team_sync.cpp" line="101"/>
        <source>The login %1 is not a person of the team project.</source>
        <translation>De aanmelding %1 is geen persoon van het teamproject.</translation>
    </message>
    <message>
        <location filename="../core/team/team_join.cpp" line="106"/>
        <source>The login %1 is %2, not %3.</source>
        <translation>De aanmelding %1 is %2, niet %3.</translation>
    </message>
    <message>
        <location filename="../core/team/team_password_files.cpp" line="53"/>
        <source>Could not write the password file %1.</source>
        <translation>Kon het wachtwoordbestand %1 niet schrijven.</translation>
    </message>
    <message>
        <location filename="../core/team/team_password_files.cpp" line="65"/>
        <source>%1 is a symbolic link; name a new folder for the password files.</source>
        <translation>%1 is een symbolische koppeling; noem een nieuwe map voor de wachtwoordbestanden.</translation>
    </message>
    <message>
        <location filename="../core/team/team_password_files.cpp" line="73"/>
        <source>%1 is not an empty folder; name a new folder for the password files.</source>
        <translation>%1 is geen lege map; noem een nieuwe map voor de wachtwoordbestanden.</translation>
    </message>
    <message>
        <location filename="../core/team/team_password_files.cpp" line="79"/>
        <source>Could not create the folder %1.</source>
        <translation>Kon de map %1 niet aanmaken.</translation>
    </message>
    <message>
        <location filename="../core/team/team_password_files.cpp" line="85"/>
        <source>Could not make %1 private to its owner.</source>
        <translation>Kon %1 niet alleen voor de eigenaar toegankelijk maken.</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="91"/>
        <source>%1 is a coder copy; publish the main project.</source>
        <translation>%1 is een codeurskopie; publiceer het hoofdproject.</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="98"/>
        <source>%1 has no people; add the lead and the coders before publishing it.</source>
        <translation>%1 heeft geen personen; voeg de coördinator en de codeurs toe voordat u het publiceert.</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="111"/>
        <source>%1 has several leads (%2); name the one publishing it.</source>
        <translation>%1 heeft meerdere coördinatoren (%2); noem degene die het publiceert.</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="113"/>
        <source>%1 has no lead with the pseudonym %2 (leads: %3).</source>
        <translation>%1 heeft geen coördinator met het pseudoniem %2 (coördinatoren: %3).</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="115"/>
        <source>none</source>
        <translation>geen</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="136"/>
        <source>The pseudonyms %1 and %2 make the same login role %3; rename one of them.</source>
        <translation>De pseudoniemen %1 en %2 leveren dezelfde aanmeldrol %3 op; hernoem er een.</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="165"/>
        <source>The database %1 holds a team project already; publish into an empty database.</source>
        <translation>De database %1 bevat al een teamproject; publiceer in een lege database.</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="269"/>
        <source>The team project is on %1, but %2 could not record it: %3</source>
        <translation>Het teamproject staat op %1, maar %2 kon dat niet vastleggen: %3</translation>
    </message>
    <message>
        <location filename="../core/team/team_project.cpp" line="300"/>
        <location filename="../core/team/team_sync.cpp" line="74"/>
        <source>%1 is not a team working file (made by team publish or team join).</source>
        <translation>%1 is geen teamwerkbestand (gemaakt met team publish of team join).</translation>
    </message>
    <message>
        <location filename="../core/team/team_sync.cpp" line="105"/>
        <source>The login %1 is %2, but %3 is the working file of %4.</source>
        <translation>De aanmelding %1 is %2, maar %3 is het werkbestand van %4.</translation>
    </message>
</context>
<context>
    <name>TeamStatusText</name>
    <message>
        <location filename="../core/team/team_status.cpp" line="39"/>
        <source>%1 is not a team working file (made by team publish or team join).</source>
        <translation>%1 is geen teamwerkbestand (gemaakt met team publish of team join).</translation>
    </message>
</context>
<context>
    <name>TeamUpgradeText</name>
    <message>
        <location filename="../core/team/team_upgrade.cpp" line="34"/>
        <source>The database %1 holds no team project.</source>
        <translation>De database %1 bevat geen teamproject.</translation>
    </message>
</context>
<context>
    <name>ValueEncodingText</name>
    <message>
        <location filename="../core/agreement/value_encoding.cpp" line="30"/>
        <source>unit &quot;%1&quot;, coder &quot;%2&quot;: %3</source>
        <translation>eenheid ‘%1’, codeur ‘%2’: %3</translation>
    </message>
    <message>
        <location filename="../core/agreement/value_encoding.cpp" line="126"/>
        <source>A set distance (Jaccard, MASI) cannot be combined with the %1 level.</source>
        <translation>Een verzamelingsafstand (Jaccard, MASI) kan niet worden gecombineerd met het niveau %1.</translation>
    </message>
    <message>
        <location filename="../core/agreement/value_encoding.cpp" line="179"/>
        <source>&quot;%1&quot; is not one of the ordered values (%2).</source>
        <translation>‘%1’ is geen van de geordende waarden (%2).</translation>
    </message>
    <message>
        <location filename="../core/agreement/value_encoding.cpp" line="186"/>
        <source>&quot;%1&quot; is not a number, as the %2 level needs.</source>
        <translation>‘%1’ is geen getal, zoals het niveau %2 vereist.</translation>
    </message>
    <message>
        <location filename="../core/agreement/value_encoding.cpp" line="190"/>
        <source>%1 is negative; ratio values cannot be.</source>
        <translation>%1 is negatief; ratiowaarden kunnen dat niet zijn.</translation>
    </message>
</context>
<context>
    <name>W3cFormatText</name>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="118"/>
        <source>its &quot;type&quot; is not &quot;Annotation&quot;.</source>
        <translation>het ‘type’ ervan is niet ‘Annotation’.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="130"/>
        <source>its target has no source of the form &quot;ni:///sha-256;…&quot; naming the article&apos;s text (found &quot;%1&quot;).</source>
        <translation>het target heeft geen source van de vorm ‘ni:///sha-256;…’ die de tekst van het artikel noemt (gevonden: ‘%1’).</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="144"/>
        <source>its TextPositionSelector needs whole numbers &quot;start&quot; and &quot;end&quot;.</source>
        <translation>de TextPositionSelector ervan heeft gehele getallen ‘start’ en ‘end’ nodig.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="148"/>
        <source>its TextPositionSelector range [%1, %2) is empty or negative.</source>
        <translation>het bereik [%1, %2) van de TextPositionSelector ervan is leeg of negatief.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="160"/>
        <source>its target has no TextPositionSelector.</source>
        <translation>het target heeft geen TextPositionSelector.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="169"/>
        <source>its classifying body &quot;%1&quot; is not a framing function (problem, cause, evaluation or remedy).</source>
        <translation>de classificerende body ‘%1’ ervan is geen framingfunctie (problem, cause, evaluation of remedy).</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="182"/>
        <source>its describing body is not a JSON object of attributes.</source>
        <translation>de beschrijvende body ervan is geen JSON-object met kenmerken.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="187"/>
        <source>it has no classifying body naming a framing function.</source>
        <translation>ze heeft geen classificerende body die een framingfunctie noemt.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_format.cpp" line="199"/>
        <source>it has no creator with a pseudonym (&quot;nickname&quot;).</source>
        <translation>ze heeft geen creator met een pseudoniem (‘nickname’).</translation>
    </message>
</context>
<context>
    <name>W3cImportText</name>
    <message>
        <location filename="../core/exchange/w3c_import.cpp" line="64"/>
        <source>Annotation %1%2: %3</source>
        <translation>Annotatie %1%2: %3</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_import.cpp" line="72"/>
        <source>its creator &quot;%1&quot; is software; only coders&apos; annotations can be imported.</source>
        <translation>de creator ‘%1’ ervan is software; alleen annotaties van codeurs kunnen worden geïmporteerd.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_import.cpp" line="77"/>
        <source>no article of the project has the text with SHA-256 %1.</source>
        <translation>geen artikel van het project heeft de tekst met SHA-256 %1.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_import.cpp" line="98"/>
        <source>the range [%1, %2) lies outside the article&apos;s %3 code points.</source>
        <translation>het bereik [%1, %2) ligt buiten de %3 codepunten van het artikel.</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_import.cpp" line="103"/>
        <source>the quote &quot;%1&quot; is not the article&apos;s text at [%2, %3).</source>
        <translation>het citaat ‘%1’ is niet de tekst van het artikel op [%2, %3).</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_import.cpp" line="177"/>
        <source>The collection does not hold its annotations inline (&quot;first&quot; must be an AnnotationPage object with &quot;items&quot;).</source>
        <translation>De collectie bevat haar annotaties niet ingesloten (‘first’ moet een AnnotationPage-object met ‘items’ zijn).</translation>
    </message>
    <message>
        <location filename="../core/exchange/w3c_import.cpp" line="184"/>
        <location filename="../core/exchange/w3c_import.cpp" line="190"/>
        <source>The file holds neither an AnnotationCollection, nor an Annotation, nor an array of annotations.</source>
        <translation>Het bestand bevat geen AnnotationCollection, geen Annotation en geen array van annotaties.</translation>
    </message>
</context>
<context>
    <name>cli</name>
    <message>
        <location filename="../app/cli/cli_output.cpp" line="54"/>
        <source>Run &quot;fourfold-cli %1 --help&quot; for its options.</source>
        <translation>Voer ‘fourfold-cli %1 --help’ uit voor de opties.</translation>
    </message>
    <message>
        <location filename="../app/cli/cli_output.cpp" line="70"/>
        <source>Show this help.</source>
        <translation>Deze hulp tonen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="37"/>
        <source>Left out      %1</source>
        <translation>Weggelaten    %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="38"/>
        <source>Coders        %1 (%2)</source>
        <translation>Codeurs       %1 (%2)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="41"/>
        <source>Continuum     %1 articles coded by all, %2 characters</source>
        <translation>Continuüm     %1 artikelen door iedereen gecodeerd, %2 tekens</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="47"/>
        <location filename="../app/cli/command_agree.cpp" line="84"/>
        <source>undefined</source>
        <translation>niet gedefinieerd</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="50"/>
        <source>Unitizing alpha (Krippendorff 2004)</source>
        <translation>Unitizing-alfa (Krippendorff 2004)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="54"/>
        <source>all</source>
        <translation>alle</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="55"/>
        <source>Positive specific agreement per pair (span F1: same boundaries / any overlap)</source>
        <translation>Positieve specifieke overeenstemming per paar (fragment-F1: dezelfde grenzen / elke overlap)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="93"/>
        <source>Function confusion on matched spans (rows: a coder&apos;s function; columns: the other coder&apos;s at the best-overlapping span)</source>
        <translation>Functieverwarring bij gekoppelde fragmenten (rijen: de functie van een codeur; kolommen: die van de andere codeur bij het best overlappende fragment)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="106"/>
        <source>Boundary habits (this coder&apos;s span − the other&apos;s, code points, same function)</source>
        <translation>Grensgewoonten (fragment van deze codeur − dat van de ander, codepunten, zelfde functie)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="117"/>
        <source>  systematic</source>
        <translation>  systematisch</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="162"/>
        <source>Alpha without each coder (costliest first; change = without − with all)</source>
        <translation>Alfa zonder telkens één codeur (kostbaarste eerst; verandering = zonder − met allen)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="168"/>
        <source>Alpha without each article (costliest first)</source>
        <translation>Alfa zonder telkens één artikel (kostbaarste eerst)</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_agree.cpp" line="171"/>
        <source>  … and %n more (--json lists every one)</source>
        <translation>
            <numerusform>  … en %n andere (--json somt ze allemaal op)</numerusform>
            <numerusform>  … en %n andere (--json somt ze allemaal op)</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="186"/>
        <source>A raw reliability matrix: CSV with the header unit,&lt;coder&gt;,&lt;coder&gt;,...; an empty cell is missing.</source>
        <translation>Een ruwe betrouwbaarheidsmatrix: CSV met de kopregel unit,&lt;codeur&gt;,&lt;codeur&gt;,...; een lege cel ontbreekt.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="191"/>
        <source>Level of measurement: nominal (default), ordinal, interval or ratio.</source>
        <translation>Meetniveau: nominal (standaard), ordinal, interval of ratio.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="194"/>
        <source>Ordinal labels from lowest to highest, e.g. negative,neutral,positive.</source>
        <translation>Ordinale labels van laag naar hoog, bijv. negative,neutral,positive.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="197"/>
        <source>Cells are sets of labels separated by | (braces allowed; {} = empty set), compared with jaccard or masi.</source>
        <translation>Cellen zijn verzamelingen labels gescheiden door | (accolades toegestaan; {} = lege verzameling), vergeleken met jaccard of masi.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="203"/>
        <source>With a project: article, paragraph, sentence, token, span (an attribute on matched passages) or continuum.</source>
        <translation>Met een project: article, paragraph, sentence, token, span (een kenmerk op gekoppelde passages) of continuum.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="208"/>
        <source>With a project: problem, cause, evaluation, remedy or all (default all).</source>
        <translation>Met een project: problem, cause, evaluation, remedy of all (standaard all).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="211"/>
        <source>With a project: the coders&apos; pseudonyms (default: everyone who coded).</source>
        <translation>Met een project: de pseudoniemen van de codeurs (standaard: iedereen die heeft gecodeerd).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="214"/>
        <source>With a project: only this phase (training, pilot, reliability, production).</source>
        <translation>Met een project: alleen deze fase (training, pilot, reliability, production).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="217"/>
        <source>With --unit span: the attribute compared on passages matched across coders, e.g. polarity (with --function evaluation).</source>
        <translation>Met --unit span: het kenmerk dat wordt vergeleken op tussen codeurs gekoppelde passages, bijv. polarity (met --function evaluation).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="222"/>
        <source>With a project: add the adjudicated gold standard as one more coder, &quot;gold&quot;.</source>
        <translation>Met een project: de beslechte gouden standaard toevoegen als extra codeur, ‘gold’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="225"/>
        <source>With a project: only these articles (ids).</source>
        <translation>Met een project: alleen deze artikelen (id&apos;s).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="227"/>
        <source>With a project: also count articles that coders started but did not mark done (left out and listed by default).</source>
        <translation>Met een project: ook artikelen meetellen die codeurs zijn begonnen maar niet als klaar hebben gemarkeerd (standaard weggelaten en opgesomd).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="230"/>
        <source>With --unit article: the article-level item (default dominant_function).</source>
        <translation>Met --unit article: het item op artikelniveau (standaard dominant_function).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="233"/>
        <source>Bootstrap replicates for alpha&apos;s 95% interval (both methods, labelled).</source>
        <translation>Bootstrapreplicaties voor het 95%-interval van alfa (beide methoden, gelabeld).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="236"/>
        <location filename="../app/cli/command_frames.cpp" line="203"/>
        <location filename="../app/cli/command_report.cpp" line="51"/>
        <location filename="../app/cli/command_score.cpp" line="122"/>
        <source>Seed of the bootstrap (default 1).</source>
        <translation>Seed van de bootstrap (standaard 1).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="239"/>
        <source>Cohen&apos;s kappa with disagreement weights by the values&apos; order (Cohen 1968): none (default), linear or quadratic. For ordered values: an ordinal item, --order, or numbers.</source>
        <translation>Cohens kappa met gewichten voor onenigheid naar de volgorde van de waarden (Cohen 1968): none (standaard), linear of quadratic. Voor geordende waarden: een ordinaal item, --order of getallen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="245"/>
        <location filename="../app/cli/command_frames.cpp" line="211"/>
        <location filename="../app/cli/command_info.cpp" line="35"/>
        <location filename="../app/cli/command_score.cpp" line="133"/>
        <source>Print the figures as JSON.</source>
        <translation>De cijfers als JSON afdrukken.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="247"/>
        <source>Also show where reliability is lost: alpha without each coder and without each article (the costliest first), and with a project the function confusion on matched spans and the coders&apos; boundary habits.</source>
        <translation>Ook tonen waar betrouwbaarheid verloren gaat: alfa zonder telkens één codeur en zonder telkens één artikel (kostbaarste eerst), en met een project de functieverwarring bij gekoppelde fragmenten en de grensgewoonten van de codeurs.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="254"/>
        <location filename="../app/cli/command_frames.cpp" line="235"/>
        <source>The project file (unless --data is given).</source>
        <translation>Het projectbestand (tenzij --data is opgegeven).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="256"/>
        <source>Inter-coder reliability: Krippendorff&apos;s alpha (with bootstrap intervals), percent agreement, Cohen&apos;s, Fleiss&apos; and Light&apos;s kappa, Scott&apos;s pi, Bennett&apos;s S; unitizing alpha on the continuum.</source>
        <translation>Intercodeursbetrouwbaarheid: Krippendorffs alfa (met bootstrapintervallen), procentuele overeenstemming, Cohens, Fleiss&apos; en Lights kappa, Scotts pi, Bennetts S; unitizing-alfa op het continuüm.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="271"/>
        <location filename="../app/cli/command_report.cpp" line="140"/>
        <location filename="../app/cli/command_score.cpp" line="159"/>
        <source>--bootstrap expects a number of replicates from 0 to 1000000.</source>
        <translation>--bootstrap verwacht een aantal replicaties van 0 tot 1000000.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="274"/>
        <location filename="../app/cli/command_export.cpp" line="111"/>
        <location filename="../app/cli/command_frames.cpp" line="276"/>
        <location filename="../app/cli/command_report.cpp" line="143"/>
        <location filename="../app/cli/command_score.cpp" line="162"/>
        <source>--seed expects a non-negative whole number.</source>
        <translation>--seed verwacht een niet-negatief geheel getal.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="285"/>
        <source>unknown weights &quot;%1&quot; (expected none, linear or quadratic).</source>
        <translation>onbekende gewichten ‘%1’ (verwacht: none, linear of quadratic).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="292"/>
        <source>unknown level &quot;%1&quot; (expected nominal, ordinal, interval or ratio).</source>
        <translation>onbekend niveau ‘%1’ (verwacht: nominal, ordinal, interval of ratio).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="301"/>
        <source>--order is for the ordinal level; add --level ordinal.</source>
        <translation>--order is voor het ordinale niveau; voeg --level ordinal toe.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="307"/>
        <source>unknown distance &quot;%1&quot; (expected jaccard or masi).</source>
        <translation>onbekende afstand ‘%1’ (verwacht: jaccard of masi).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="316"/>
        <location filename="../app/cli/command_frames.cpp" line="288"/>
        <source>give either --data FILE or a project, not both.</source>
        <translation>geef --data BESTAND of een project, niet allebei.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="319"/>
        <source>--include-unfinished is for a project, not --data.</source>
        <translation>--include-unfinished is voor een project, niet voor --data.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="331"/>
        <location filename="../app/cli/command_frames.cpp" line="303"/>
        <source>expected a project file, or --data FILE.</source>
        <translation>een projectbestand of --data BESTAND verwacht.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="334"/>
        <source>with a project, say which units to compare: --unit article|paragraph|sentence|token|span|continuum.</source>
        <translation>zeg bij een project welke eenheden moeten worden vergeleken: --unit article|paragraph|sentence|token|span|continuum.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="338"/>
        <location filename="../app/cli/command_assign.cpp" line="439"/>
        <source>unknown unit &quot;%1&quot;.</source>
        <translation>onbekende eenheid ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="346"/>
        <source>unknown function &quot;%1&quot; (expected problem, cause, evaluation, remedy or all).</source>
        <translation>onbekende functie ‘%1’ (verwacht: problem, cause, evaluation, remedy of all).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_agree.cpp" line="357"/>
        <location filename="../app/cli/command_assign.cpp" line="348"/>
        <location filename="../app/cli/command_assign.cpp" line="374"/>
        <location filename="../app/cli/command_assign.cpp" line="455"/>
        <location filename="../app/cli/command_report.cpp" line="132"/>
        <source>unknown phase &quot;%1&quot;.</source>
        <translation>onbekende fase ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="63"/>
        <source>%1 subsample: %2%3, seed %4; %5 of %6 articles in the sampling frame; coders %7</source>
        <translation>deelsteekproef %1: %2%3, seed %4; %5 van %6 artikelen in het steekproefkader; codeurs %7</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="66"/>
        <source> by %1</source>
        <translation> naar %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="72"/>
        <source>  near copies left out of the sampling frame</source>
        <translation>  bijna-kopieën uit het steekproefkader weggelaten</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="74"/>
        <source>  drawn at %1</source>
        <translation>  getrokken op %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="76"/>
        <source>  stratum %1: %2 of %3</source>
        <translation>  stratum %1: %2 van %3</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="80"/>
        <source>  articles: %1</source>
        <translation>  artikelen: %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="83"/>
        <source>  Krippendorff&apos;s minimum for alpha_min %1 at p = %2 with the rarest value at %3: %4 values</source>
        <translation>  Krippendorffs minimum voor alpha_min %1 bij p = %2 met de zeldzaamste waarde op %3: %4 waarden</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="91"/>
        <source>  Krippendorff&apos;s minimum: not defined for these arguments</source>
        <translation>  Krippendorffs minimum: niet gedefinieerd voor deze argumenten</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="92"/>
        <source>  this draw delivers %1 article values, %2 paragraph values, %3 sentence values (units × coders)</source>
        <translation>  deze trekking levert %1 artikelwaarden, %2 alineawaarden, %3 zinswaarden op (eenheden × codeurs)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="98"/>
        <source>  enough for: none of these units; draw more articles or expect a wider interval</source>
        <translation>  genoeg voor: geen van deze eenheden; trek meer artikelen of reken op een breder interval</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="100"/>
        <source>  enough for: %1 units</source>
        <translation>  genoeg voor: %1-eenheden</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="137"/>
        <source>Assignments: %1</source>
        <translation>Toewijzingen: %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="168"/>
        <source>%1  %2  %3  %4  %5  %6  %7</source>
        <translation>%1  %2  %3  %4  %5  %6  %7</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="169"/>
        <source>phase</source>
        <translation>fase</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="170"/>
        <location filename="../app/cli/command_team.cpp" line="259"/>
        <source>coder</source>
        <translation>codeur</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="171"/>
        <source>assigned</source>
        <translation>toegewezen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="172"/>
        <source>started</source>
        <translation>begonnen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="173"/>
        <source>done</source>
        <translation>klaar</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="174"/>
        <location filename="../app/cli/command_assign.cpp" line="225"/>
        <source>alpha</source>
        <translation>alfa</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="175"/>
        <source>active</source>
        <translation>actief</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="185"/>
        <source>%1 min</source>
        <translation>%1 min</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="189"/>
        <source>Effort (active time; idle time not counted):</source>
        <translation>Inspanning (actieve tijd; inactieve tijd niet meegeteld):</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="190"/>
        <source>Effort in aggregate (active time per coder is off; see --effort):</source>
        <translation>Inspanning in totaal (actieve tijd per codeur staat uit; zie --effort):</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="192"/>
        <source>  %1  %2 articles done, %3 min active, %4 min per done article</source>
        <translation>  %1  %2 artikelen klaar, %3 min actief, %4 min per afgerond artikel</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="199"/>
        <source>alpha: Krippendorff&apos;s alpha (nominal) on present/absent per sentence and function, against the lead&apos;s master coding in training, else the mean over the coder&apos;s partners; finished articles only.</source>
        <translation>alfa: Krippendorffs alfa (nominaal) op aanwezig/afwezig per zin en functie, tegen de mastercodering van de coördinator in de training, anders het gemiddelde over de partners van de codeur; alleen afgeronde artikelen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="215"/>
        <source>Training feedback for %1 against the master coding of %2 (%3 units)</source>
        <translation>Trainingsfeedback voor %1 tegen de mastercodering van %2 (%3 eenheden)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="217"/>
        <source>Finished training articles compared: %1; still open: %2</source>
        <translation>Vergeleken afgeronde trainingsartikelen: %1; nog open: %2</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="218"/>
        <location filename="../app/cli/command_extract.cpp" line="105"/>
        <location filename="../app/cli/command_extract.cpp" line="312"/>
        <source>none</source>
        <translation>geen</translation>
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
        <translation>functie</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="223"/>
        <source>units</source>
        <translation>eenheden</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="224"/>
        <source>agree %</source>
        <translation>overeenst. %</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="226"/>
        <source>marked (you / master)</source>
        <translation>gemarkeerd (u / master)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="238"/>
        <source>Training complete: the coder can move on to the real work.</source>
        <translation>Training afgerond: de codeur kan door naar het echte werk.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="239"/>
        <source>Training not complete yet.</source>
        <translation>Training nog niet afgerond.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="249"/>
        <source>Draw the subsample of this phase (reliability or pilot) that every --coders codes.</source>
        <translation>De deelsteekproef van deze fase (reliability of pilot) trekken die elke --coders codeert.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="257"/>
        <source>With --draw: the number of articles.</source>
        <translation>Met --draw: het aantal artikelen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="259"/>
        <source>With --draw: the share of the sampling frame (0 &lt; F &lt;= 1, rounded up).</source>
        <translation>Met --draw: het aandeel van het steekproefkader (0 &lt; F &lt;= 1, naar boven afgerond).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="262"/>
        <source>With --draw: draw proportionally within outlet, language or topic (metadata key &quot;topic&quot;).</source>
        <translation>Met --draw: proportioneel trekken binnen medium, taal of onderwerp (metadatasleutel ‘topic’).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="267"/>
        <source>With --draw: leave articles found to be near copies of older ones at import out of the sampling frame.</source>
        <translation>Met --draw: artikelen die bij de import zijn herkend als bijna-kopie van een ouder artikel, uit het steekproefkader weglaten.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="270"/>
        <source>Seed of the draw or of dealing the rest (default: a random seed, printed and recorded).</source>
        <translation>Seed van de trekking of van het verdelen van de rest (standaard: een willekeurige seed, afgedrukt en vastgelegd).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="274"/>
        <source>With --draw: the smallest acceptable alpha for the sample-size advice (default 0.8).</source>
        <translation>Met --draw: de kleinste aanvaardbare alfa voor het advies over de steekproefomvang (standaard 0.8).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="279"/>
        <source>With --draw: the expected share of the rarest value (default 0.25).</source>
        <translation>Met --draw: het verwachte aandeel van de zeldzaamste waarde (standaard 0.25).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="282"/>
        <source>Deal every article without any assignment to --coders for production: single or double coding.</source>
        <translation>Elk artikel zonder toewijzing verdelen over --coders voor de productie: enkele of dubbele codering.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="287"/>
        <source>With --articles: assign in this phase (training, pilot, reliability, production); with --show or --progress: only this phase.</source>
        <translation>Met --articles: in deze fase toewijzen (training, pilot, reliability, production); met --show of --progress: alleen deze fase.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="292"/>
        <source>Assign these articles (ids) to every one of --coders in --phase.</source>
        <translation>Deze artikelen (id&apos;s) aan elk van --coders in --phase toewijzen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="295"/>
        <source>The coders&apos; pseudonyms.</source>
        <translation>De pseudoniemen van de codeurs.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="297"/>
        <source>With --draw, --rest or --articles: show the plan, write nothing.</source>
        <translation>Met --draw, --rest of --articles: het plan tonen, niets wegschrijven.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="299"/>
        <source>Show the assignments and the draws with their advice.</source>
        <translation>De toewijzingen en de trekkingen met hun advies tonen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="301"/>
        <source>Show per coder and phase the articles done, agreement so far and effort.</source>
        <translation>Per codeur en fase de afgeronde artikelen, de overeenstemming tot nu toe en de inspanning tonen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="303"/>
        <source>Show this coder&apos;s agreement with the master coding on finished training articles.</source>
        <translation>De overeenstemming van deze codeur met de mastercodering op afgeronde trainingsartikelen tonen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="307"/>
        <source>With --training: the lead whose training coding is the master (default: the one lead who coded training articles).</source>
        <translation>Met --training: de coördinator wiens trainingscodering de master is (standaard: de enige coördinator die trainingsartikelen heeft gecodeerd).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="312"/>
        <source>With --training: paragraph, sentence (default) or token.</source>
        <translation>Met --training: paragraph, sentence (standaard) of token.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="315"/>
        <source>Show active time per coder (on) or only in aggregate (off, the default).</source>
        <translation>Actieve tijd per codeur tonen (on) of alleen in totaal (off, de standaard).</translation>
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
        <translation>Het resultaat als JSON afdrukken.</translation>
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
        <translation>Het projectbestand.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="323"/>
        <source>Assign articles to coders per phase (training, pilot, reliability, production), draw the reliability subsample with a recorded seed, and follow progress. Give one of --draw, --withdraw-draw, --rest, --articles, --show, --progress, --training, --effort.</source>
        <translation>Artikelen per fase (training, pilot, reliability, production) aan codeurs toewijzen, de betrouwbaarheidsdeelsteekproef met een vastgelegde seed trekken en de voortgang volgen. Geef een van --draw, --withdraw-draw, --rest, --articles, --show, --progress, --training, --effort.</translation>
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
        <translation>precies één projectbestand verwacht.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="340"/>
        <source>give exactly one of --draw, --withdraw-draw, --rest, --articles, --show, --progress, --training, --effort.</source>
        <translation>geef precies een van --draw, --withdraw-draw, --rest, --articles, --show, --progress, --training, --effort.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="357"/>
        <source>the seed &quot;%1&quot; is not a whole number from 0 to 18446744073709551615.</source>
        <translation>de seed ‘%1’ is geen geheel getal van 0 tot 18446744073709551615.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="378"/>
        <source>give --size or --fraction, not both.</source>
        <translation>geef --size of --fraction, niet allebei.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="379"/>
        <source>--draw needs --size or --fraction.</source>
        <translation>--draw heeft --size of --fraction nodig.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="385"/>
        <source>--size must be a whole number of articles, at least 1; &quot;%1&quot; given.</source>
        <translation>--size moet een geheel aantal artikelen zijn, ten minste 1; opgegeven: ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="393"/>
        <source>--fraction must be a number above 0 and at most 1; &quot;%1&quot; given.</source>
        <translation>--fraction moet een getal boven 0 en hoogstens 1 zijn; opgegeven: ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="401"/>
        <source>--stratify takes outlet, language or topic, not &quot;%1&quot;.</source>
        <translation>--stratify neemt outlet, language of topic, niet ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="407"/>
        <source>--alpha-min must lie between 0 and 1; &quot;%1&quot; given.</source>
        <translation>--alpha-min moet tussen 0 en 1 liggen; opgegeven: ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="412"/>
        <source>--rarest must lie above 0 and at most 0.5; &quot;%1&quot; given.</source>
        <translation>--rarest moet boven 0 en hoogstens 0.5 liggen; opgegeven: ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="425"/>
        <source>--rest takes single or double, not &quot;%1&quot;.</source>
        <translation>--rest neemt single of double, niet ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="430"/>
        <source>--articles needs --phase.</source>
        <translation>--articles heeft --phase nodig.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="432"/>
        <source>--articles needs --coders.</source>
        <translation>--articles heeft --coders nodig.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="445"/>
        <source>--effort takes on or off, not &quot;%1&quot;.</source>
        <translation>--effort neemt on of off, niet ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="448"/>
        <source>name the coders with --coders.</source>
        <translation>noem de codeurs met --coders.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="490"/>
        <source>Active time is now shown per coder.</source>
        <translation>Actieve tijd wordt nu per codeur getoond.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="491"/>
        <source>Active time is now shown in aggregate only.</source>
        <translation>Actieve tijd wordt nu alleen in totaal getoond.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="509"/>
        <location filename="../app/cli/command_assign.cpp" line="540"/>
        <source>Dry run: nothing was written.</source>
        <translation>Proefrun: er is niets weggeschreven.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="510"/>
        <location filename="../app/cli/command_assign.cpp" line="541"/>
        <source>%1 assignments written.</source>
        <translation>%1 toewijzingen weggeschreven.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="539"/>
        <source>Seed %1.</source>
        <translation>Seed %1.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="35"/>
        <source>Cannot read %1: %2</source>
        <translation>Kan %1 niet lezen: %2</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="40"/>
        <source>%1: not a JSON object (%2).</source>
        <translation>%1: geen JSON-object (%2).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="69"/>
        <source>%1: a coder&apos;s role must be &quot;coder&quot; or &quot;lead&quot;.</source>
        <translation>%1: de rol van een persoon moet ‘coder’ of ‘lead’ zijn.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="103"/>
        <source>%1: the reliability article &quot;%2&quot; is not in articles.jsonl.</source>
        <translation>%1: het betrouwbaarheidsartikel ‘%2’ staat niet in articles.jsonl.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="149"/>
        <source>Built %1: %2 articles, %3 coders, %4 spans, %5 article judgements, %6 gold spans, 2 baseline runs.</source>
        <translation>%1 gebouwd: %2 artikelen, %3 codeurs, %4 fragmenten, %5 oordelen op artikelniveau, %6 fragmenten in de gouden standaard, 2 baselineruns.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="174"/>
        <source>Replace OUT if it exists.</source>
        <translation>OUT vervangen als het bestaat.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="177"/>
        <source>The folder with study.json, articles.jsonl, codings.jsonl and gold.jsonl.</source>
        <translation>De map met study.json, articles.jsonl, codings.jsonl en gold.jsonl.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="179"/>
        <source>The project file to write (*.fourfold).</source>
        <translation>Het projectbestand om te schrijven (*.fourfold).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="181"/>
        <source>Build the demo project (invented data) from its source files.</source>
        <translation>Het demoproject (verzonnen gegevens) bouwen uit de bronbestanden.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="186"/>
        <source>expected a source folder and an output file.</source>
        <translation>een bronmap en een uitvoerbestand verwacht.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="191"/>
        <source>%1 already exists; add --force to replace it.</source>
        <translation>%1 bestaat al; voeg --force toe om het te vervangen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_build_sample.cpp" line="205"/>
        <source>Cannot move the new project to %1.</source>
        <translation>Kan het nieuwe project niet naar %1 verplaatsen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_check.cpp" line="18"/>
        <source>Check a project file: SQLite&apos;s integrity and foreign-key checks, the full-text index, every article&apos;s hash, length and canonical form, and every span and quote against its text. Exits 1 if anything is wrong.</source>
        <translation>Een projectbestand controleren: de integriteits- en foreign-keycontroles van SQLite, de volledige-tekstindex, hash, lengte en canonieke vorm van elk artikel, en elk fragment en citaat tegen de tekst. Eindigt met 1 als er iets mis is.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_check.cpp" line="46"/>
        <source>OK: %1 articles and %2 spans checked, no problems.</source>
        <translation>OK: %1 artikelen en %2 fragmenten gecontroleerd, geen problemen.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_check.cpp" line="52"/>
        <source>fourfold-cli: %1 has %n problem(s).</source>
        <translation>
            <numerusform>fourfold-cli: %1 heeft %n probleem.</numerusform>
            <numerusform>fourfold-cli: %1 heeft %n problemen.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="37"/>
        <source>Print what changed from version A to version B (&quot;--diff A B&quot; or &quot;--diff A,B&quot;; B defaults to the current version).</source>
        <translation>Afdrukken wat er is veranderd van versie A naar versie B (‘--diff A B’ of ‘--diff A,B’; B is standaard de huidige versie).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="42"/>
        <source>Add the codebook in this JSON file as a new version (needs --note).</source>
        <translation>Het codeboek in dit JSON-bestand als nieuwe versie toevoegen (vereist --note).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="45"/>
        <source>With --update: what changed and why.</source>
        <translation>Met --update: wat er is veranderd en waarom.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="47"/>
        <source>With --update: the lead&apos;s pseudonym, recorded as the author.</source>
        <translation>Met --update: het pseudoniem van de coördinator, vastgelegd als auteur.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="50"/>
        <source>Print version N as JSON (the form --update reads).</source>
        <translation>Versie N als JSON afdrukken (de vorm die --update leest).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="52"/>
        <source>List the annotations made under an older version than the current one.</source>
        <translation>De annotaties opsommen die zijn gemaakt onder een oudere versie dan de huidige.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="57"/>
        <source>Codebook versions: without options, list them; editing definitions, decision rules or attributes is recorded as a new version with --update.</source>
        <translation>Codeboekversies: zonder opties worden ze opgesomd; het bewerken van definities, beslisregels of kenmerken wordt met --update vastgelegd als nieuwe versie.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="68"/>
        <source>give at most one of --diff, --update, --show, --outdated.</source>
        <translation>geef hoogstens een van --diff, --update, --show, --outdated.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="81"/>
        <source>--diff takes two version numbers.</source>
        <translation>--diff neemt twee versienummers.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="87"/>
        <source>--diff takes version numbers (1, 2, ...), not &quot;%1&quot;.</source>
        <translation>--diff neemt versienummers (1, 2, ...), niet ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="95"/>
        <source>--show takes a version number (1, 2, ...), not &quot;%1&quot;.</source>
        <translation>--show neemt een versienummer (1, 2, ...), niet ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="100"/>
        <source>--update needs --note saying what changed and why.</source>
        <translation>--update heeft --note nodig dat zegt wat er is veranderd en waarom.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="115"/>
        <source>There is no coder &quot;%1&quot; in the project.</source>
        <translation>Er is geen codeur ‘%1’ in het project.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="134"/>
        <source>Codebook version %1 added.</source>
        <translation>Codeboekversie %1 toegevoegd.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="181"/>
        <source>%1 annotations were made under an older codebook version.</source>
        <translation>%1 annotaties zijn gemaakt onder een oudere codeboekversie.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="184"/>
        <source>  #%1  %2  %3  %4  version %5%6</source>
        <translation>  #%1  %2  %3  %4  versie %5%6</translation>
    </message>
    <message>
        <location filename="../app/cli/command_codebook.cpp" line="190"/>
        <source>  (its function changed since: re-check)</source>
        <translation>  (de functie ervan is sindsdien veranderd: opnieuw controleren)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="32"/>
        <source>fourfold-cli: note: the %1 split is empty; %2 article(s) are too few for these shares.</source>
        <translation>fourfold-cli: let op: de verdeling %1 is leeg; %2 artikel(en) zijn te weinig voor deze aandelen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="46"/>
        <source>What to export: gold, coders, coder:PSEUDONYM or run:NAME.</source>
        <translation>Wat te exporteren: gold, coders, coder:PSEUDONYM of run:NAME.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="49"/>
        <source>jsonl (spans and articles), w3c (Web Annotation JSON-LD), bio (IOB2 tokens, one column per function) or csv (article × variable).</source>
        <translation>jsonl (fragmenten en artikelen), w3c (Web Annotation JSON-LD), bio (IOB2-tokens, één kolom per functie) of csv (artikel × variabele).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="54"/>
        <source>The output directory: new or empty (created if needed); the export appears in it whole or not at all.</source>
        <translation>De uitvoermap: nieuw of leeg (aangemaakt indien nodig); de export verschijnt er helemaal of helemaal niet in.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="59"/>
        <source>Replace an earlier export in --out DIR (a folder holding only export files).</source>
        <translation>Een eerdere export in --out DIR vervangen (een map met alleen exportbestanden).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="62"/>
        <source>Split by article, stratified by function presence: train/dev/test or train/test percentages, e.g. 80/10/10.</source>
        <translation>Splitsen per artikel, gestratificeerd naar aanwezigheid van functies: percentages train/dev/test of train/test, bijv. 80/10/10.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="67"/>
        <source>Seed of the split (default 1).</source>
        <translation>Seed van de verdeling (standaard 1).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="69"/>
        <source>Write offsets and hashes only: no texts, quotes, tokens or titles.</source>
        <translation>Alleen offsets en hashes schrijven: geen teksten, citaten, tokens of titels.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="71"/>
        <source>Print the manifest as JSON.</source>
        <translation>Het manifest als JSON afdrukken.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="75"/>
        <source>Exports gold, codings or a run&apos;s spans for data teams and statistics packages; coders appear only by pseudonym.</source>
        <translation>Exporteert de gouden standaard, coderingen of de fragmenten van een run voor datateams en statistiekpakketten; codeurs verschijnen alleen onder pseudoniem.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="82"/>
        <location filename="../app/cli/command_report.cpp" line="80"/>
        <location filename="../app/cli/command_score.cpp" line="145"/>
        <source>expected one project file.</source>
        <translation>één projectbestand verwacht.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="85"/>
        <source>say what to export: --layer gold|coders|coder:PSEUDONYM|run:NAME.</source>
        <translation>zeg wat er moet worden geëxporteerd: --layer gold|coders|coder:PSEUDONYM|run:NAME.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="87"/>
        <source>say which format: --format jsonl|w3c|bio|csv.</source>
        <translation>zeg welk formaat: --format jsonl|w3c|bio|csv.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="89"/>
        <source>say where to write: --out DIR.</source>
        <translation>zeg waarheen moet worden geschreven: --out DIR.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="98"/>
        <source>unknown format &quot;%1&quot; (expected jsonl, w3c, bio or csv).</source>
        <translation>onbekend formaat ‘%1’ (verwacht: jsonl, w3c, bio of csv).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="127"/>
        <source>Exported %1 as %2 into %3:</source>
        <translation>%1 als %2 geëxporteerd naar %3:</translation>
    </message>
    <message>
        <location filename="../app/cli/command_export.cpp" line="135"/>
        <source>  %1: %2 articles, %3 spans</source>
        <translation>  %1: %2 artikelen, %3 fragmenten</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="94"/>
        <source>No extractor runs.</source>
        <translation>Geen extractorruns.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="103"/>
        <source>%1  (%2, version %3, %4)</source>
        <translation>%1  (%2, versie %3, %4)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="106"/>
        <source>    %1 spans in %2 articles (%3)</source>
        <translation>    %1 fragmenten in %2 artikelen (%3)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="110"/>
        <source>    %1</source>
        <translation>    %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="124"/>
        <source>Run a built-in baseline: position or cues.</source>
        <translation>Een ingebouwde baseline uitvoeren: position of cues.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="126"/>
        <source>Run an external extractor: a program reading one JSON object per article on stdin and writing one per article on stdout (see the README).</source>
        <translation>Een externe extractor uitvoeren: een programma dat per artikel één JSON-object van stdin leest en per artikel één naar stdout schrijft (zie de README).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="131"/>
        <source>Import a finished run from a JSON Lines file of spans.</source>
        <translation>Een afgeronde run importeren uit een JSON Lines-bestand met fragmenten.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="134"/>
        <source>Name of the new run (unique in the project).</source>
        <translation>Naam van de nieuwe run (uniek in het project).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="136"/>
        <source>Set a parameter, stored with the run. Repeatable. position: intro, body, conclusion (a function or none), unit (paragraph or sentence). cues: weight.modal, weight.imperative, weight.connective, weight.attribution, weight.negative, weight.positive (numbers), minWeight (number), multiple (true/false), otherLanguages (error or skip). --command and --from-file: recorded as given.</source>
        <translation>Een parameter instellen, opgeslagen bij de run. Herhaalbaar. position: intro, body, conclusion (een functie of none), unit (paragraph of sentence). cues: weight.modal, weight.imperative, weight.connective, weight.attribution, weight.negative, weight.positive (getallen), minWeight (getal), multiple (true/false), otherLanguages (error of skip). --command en --from-file: vastgelegd zoals opgegeven.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="144"/>
        <source>--command: stop the program and store nothing when the whole run takes longer than this many seconds (default: no limit).</source>
        <translation>--command: het programma stoppen en niets opslaan als de hele run langer duurt dan dit aantal seconden (standaard: geen limiet).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="149"/>
        <source>--command: stop the program and store nothing when it writes nothing for this many seconds (default 120; 0: no limit).</source>
        <translation>--command: het programma stoppen en niets opslaan als het dit aantal seconden niets schrijft (standaard 120; 0: geen limiet).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="154"/>
        <source>--command and --from-file: the extractor&apos;s own version, stored with the run.</source>
        <translation>--command en --from-file: de eigen versie van de extractor, opgeslagen bij de run.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="157"/>
        <source>Only these articles (external ids, comma-separated; default: all).</source>
        <translation>Alleen deze artikelen (externe id&apos;s, gescheiden door komma&apos;s; standaard: alle).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="160"/>
        <source>List the project&apos;s runs instead.</source>
        <translation>In plaats daarvan de runs van het project opsommen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="162"/>
        <source>Delete the run called NAME and its spans instead.</source>
        <translation>In plaats daarvan de run NAME en zijn fragmenten verwijderen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="168"/>
        <source>Run an extractor over a project&apos;s articles and store its spans as a named run, whole or not at all; or import, list or delete runs. Offsets are code points.</source>
        <translation>Een extractor over de artikelen van een project laten lopen en de fragmenten ervan opslaan als benoemde run, helemaal of helemaal niet; of runs importeren, opsommen of verwijderen. Offsets zijn codepunten.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="183"/>
        <source>give --extractor, --command or --from-file with --run NAME, or --list, or --delete NAME.</source>
        <translation>geef --extractor, --command of --from-file met --run NAME, of --list, of --delete NAME.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="187"/>
        <source>give only one of --extractor, --command, --from-file, --list and --delete.</source>
        <translation>geef maar één van --extractor, --command, --from-file, --list en --delete.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="194"/>
        <location filename="../app/cli/command_import.cpp" line="202"/>
        <source>Upgraded the project file; the old version is kept as %1.</source>
        <translation>Het projectbestand is bijgewerkt; de oude versie is bewaard als %1.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="207"/>
        <source>Deleted run %1.</source>
        <translation>Run %1 verwijderd.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="212"/>
        <source>name the new run with --run NAME.</source>
        <translation>geef de nieuwe run een naam met --run NAME.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="226"/>
        <source>parameter &quot;%1&quot; is set by Fourfold itself; choose another key.</source>
        <translation>parameter ‘%1’ wordt door Fourfold zelf ingesteld; kies een andere sleutel.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="231"/>
        <source>--version, --timeout and --idle-timeout are for --command and --from-file; a built-in baseline has its own version.</source>
        <translation>--version, --timeout en --idle-timeout zijn voor --command en --from-file; een ingebouwde baseline heeft een eigen versie.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="238"/>
        <source>--articles does not apply to --from-file.</source>
        <translation>--articles geldt niet voor --from-file.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="246"/>
        <source>There is no article &quot;%1&quot; in the project.</source>
        <translation>Er is geen artikel ‘%1’ in het project.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="252"/>
        <source>--articles names no article.</source>
        <translation>--articles noemt geen artikel.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="275"/>
        <source>unknown extractor &quot;%1&quot; (expected position or cues; use --command for your own).</source>
        <translation>onbekende extractor ‘%1’ (verwacht: position of cues; gebruik --command voor een eigen extractor).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="285"/>
        <source>--timeout expects a number of seconds (0 for no limit), got &quot;%1&quot;.</source>
        <translation>--timeout verwacht een aantal seconden (0 voor geen limiet), gekregen: ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="291"/>
        <source>--idle-timeout expects a number of seconds (0 for no limit), got &quot;%1&quot;.</source>
        <translation>--idle-timeout verwacht een aantal seconden (0 voor geen limiet), gekregen: ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="310"/>
        <source>Run          %1 (%2, version %3)</source>
        <translation>Run          %1 (%2, versie %3)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="313"/>
        <source>Parameters   %1</source>
        <translation>Parameters   %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_extract.cpp" line="314"/>
        <source>Spans        %1 in %2 articles (%3)</source>
        <translation>Fragmenten   %1 in %2 artikelen (%3)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="70"/>
        <source>chi-square undefined: %1</source>
        <translation>chikwadraat niet gedefinieerd: %1</translation>
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
            <numerusform>; %n cel verwacht minder dan 5</numerusform>
            <numerusform>; %n cellen verwachten minder dan 5</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="87"/>
        <location filename="../app/cli/command_frames.cpp" line="100"/>
        <source>%1 could not be written.</source>
        <translation>%1 kon niet worden geschreven.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="137"/>
        <source>%1 holds no saved frame analysis (save one with frames PROJECT --save NAME).</source>
        <translation>%1 bevat geen opgeslagen frameanalyse (sla er een op met frames PROJECT --save NAME).</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_frames.cpp" line="144"/>
        <source>%1  (%2; layer %3, k = %4, %n article(s))</source>
        <translation>
            <numerusform>%1  (%2; laag %3, k = %4, %n artikel)</numerusform>
            <numerusform>%1  (%2; laag %3, k = %4, %n artikelen)</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_frames.cpp" line="150"/>
        <source>  F%1  %2  %n article(s)</source>
        <translation>
            <numerusform>  F%1  %2  %n artikel</numerusform>
            <numerusform>  F%1  %2  %n artikelen</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="153"/>
        <source>(no name)</source>
        <translation>(zonder naam)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="171"/>
        <source>Deleted the saved frame analysis &quot;%1&quot;.</source>
        <translation>De opgeslagen frameanalyse ‘%1’ is verwijderd.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="182"/>
        <source>An articles × variables matrix: CSV with a header row &lt;id&gt;,&lt;variable&gt;,... and one row per article, its id first; every cell a number (0/1 for element indicators).</source>
        <translation>Een matrix artikelen × variabelen: CSV met een kopregel &lt;id&gt;,&lt;variabele&gt;,... en één rij per artikel, met de id eerst; elke cel een getal (0/1 voor elementindicatoren).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="187"/>
        <source>With a project: whose codings give the element variables: gold (default), consensus (an element counts when at least half of the article&apos;s coders coded it), coder:PSEUDONYM or run:NAME.</source>
        <translation>Met een project: wiens coderingen de elementvariabelen leveren: gold (standaard), consensus (een element telt als ten minste de helft van de codeurs van het artikel het heeft gecodeerd), coder:PSEUDONYM of run:NAME.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="193"/>
        <source>The number of frames (default: the one most k-choice indices point at).</source>
        <translation>Het aantal frames (standaard: het aantal waar de meeste k-keuze-indices naar wijzen).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="196"/>
        <source>Compute the k-choice indices for k = 2..K (default 10).</source>
        <translation>De k-keuze-indices berekenen voor k = 2..K (standaard 10).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="199"/>
        <source>Bootstrap replicates for each frame&apos;s stability (Hennig 2007; default 0: none).</source>
        <translation>Bootstrapreplicaties voor de stabiliteit van elk frame (Hennig 2007; standaard 0: geen).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="206"/>
        <source>With a project: also cluster this layer on the articles both layers hold, with the same k, and compare the frames (adjusted Rand index, matched cross-table).</source>
        <translation>Met een project: ook deze laag clusteren op de artikelen die beide lagen bevatten, met dezelfde k, en de frames vergelijken (aangepaste Rand-index, gekoppelde kruistabel).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="213"/>
        <source>Write each article&apos;s frame as CSV rows article,frame (frames counted from 1).</source>
        <translation>Het frame van elk artikel als CSV-rijen article,frame schrijven (frames geteld vanaf 1).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="217"/>
        <source>Replace the --out file if it exists.</source>
        <translation>Het --out-bestand vervangen als het bestaat.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="219"/>
        <source>With a project: save the analysis in the project under this name (its settings, each frame&apos;s profile and name, each article&apos;s frame).</source>
        <translation>Met een project: de analyse onder deze naam in het project opslaan (de instellingen, het profiel en de naam van elk frame, het frame van elk artikel).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="224"/>
        <source>With --save: the name of the next frame (give it once per frame, largest first).</source>
        <translation>Met --save: de naam van het volgende frame (geef hem één keer per frame, grootste eerst).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="228"/>
        <source>List the frame analyses saved in the project.</source>
        <translation>De in het project opgeslagen frameanalyses opsommen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="230"/>
        <source>Delete the saved frame analysis of this name from the project.</source>
        <translation>De opgeslagen frameanalyse met deze naam uit het project verwijderen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="237"/>
        <source>Frames as clusters of articles by their frame elements: Ward&apos;s method, then k-means from Ward&apos;s centroids (Matthes &amp; Kohring 2008); k-choice indices (silhouette, Calinski–Harabasz, fusion-coefficient elbow), bootstrap stability, frames by outlet, month and language.</source>
        <translation>Frames als clusters van artikelen naar hun frame-elementen: de methode van Ward, daarna k-means vanuit de centroïden van Ward (Matthes &amp; Kohring 2008); k-keuze-indices (silhouet, Calinski–Harabasz, elleboog van de fusiecoëfficiënt), bootstrapstabiliteit, frames naar medium, maand en taal.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="249"/>
        <source>--saved and --delete-saved expect a project file.</source>
        <translation>--saved en --delete-saved verwachten een projectbestand.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="255"/>
        <source>--save is for a project, not --data.</source>
        <translation>--save is voor een project, niet voor --data.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="257"/>
        <source>--frame-name goes with --save.</source>
        <translation>--frame-name hoort bij --save.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="265"/>
        <source>--k expects a whole number of frames from 1 up.</source>
        <translation>--k verwacht een geheel aantal frames vanaf 1.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="269"/>
        <source>--max-k expects a whole number from 2 to 100.</source>
        <translation>--max-k verwacht een geheel getal van 2 tot 100.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="273"/>
        <source>--bootstrap expects a number of replicates from 0 to 100000.</source>
        <translation>--bootstrap verwacht een aantal replicaties van 0 tot 100000.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="279"/>
        <location filename="../app/cli/command_report.cpp" line="103"/>
        <source>%1 exists already; choose another name or replace it with --force.</source>
        <translation>%1 bestaat al; kies een andere naam of vervang het met --force.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="291"/>
        <source>--layer and --compare are for a project, not --data.</source>
        <translation>--layer en --compare zijn voor een project, niet voor --data.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_frames.cpp" line="323"/>
        <source>%1 holds %n article(s); frames need at least 3.</source>
        <translation>
            <numerusform>%1 bevat %n artikel; frames hebben er ten minste 3 nodig.</numerusform>
            <numerusform>%1 bevat %n artikelen; frames hebben er ten minste 3 nodig.</numerusform>
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
            <numerusform>%1 en %2 delen %n artikel; het vergelijken van %3 frames vereist meer.</numerusform>
            <numerusform>%1 en %2 delen %n artikelen; het vergelijken van %3 frames vereist meer.</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_frames.cpp" line="407"/>
        <source>Frames of %1 against %2 on the %n article(s) both hold (k = %3 for both)</source>
        <translation>
            <numerusform>Frames van %1 tegen %2 op het %n artikel dat beide bevatten (k = %3 voor beide)</numerusform>
            <numerusform>Frames van %1 tegen %2 op de %n artikelen die beide bevatten (k = %3 voor beide)</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="414"/>
        <source>  Adjusted Rand index (Hubert &amp; Arabie 1985)  %1</source>
        <translation>  Aangepaste Rand-index (Hubert &amp; Arabie 1985)  %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="415"/>
        <source>  Articles on matched frames                   %1%</source>
        <translation>  Artikelen in gekoppelde frames               %1%</translation>
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
        <translation>   (rijen: %1; kolommen: %2; * gekoppeld)</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_frames.cpp" line="437"/>
        <source>%n --frame-name given for %1 frame(s).</source>
        <translation>
            <numerusform>%n --frame-name opgegeven voor %1 frame(s).</numerusform>
            <numerusform>%n --frame-name opgegeven voor %1 frame(s).</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="448"/>
        <source>Saved the frames as &quot;%1&quot; in %2.</source>
        <translation>De frames zijn opgeslagen als ‘%1’ in %2.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="545"/>
        <source>Frames of %1: %2 articles × %3 variables</source>
        <translation>Frames van %1: %2 artikelen × %3 variabelen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="558"/>
        <source>Consensus: an element counts when at least half of the article&apos;s coders coded it; %1 of the %2 elements present rest on exactly half.</source>
        <translation>Consensus: een element telt als ten minste de helft van de codeurs van het artikel het heeft gecodeerd; %1 van de %2 aanwezige elementen berusten op precies de helft.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="564"/>
        <source>Choosing k (each k: Ward, then k-means from Ward&apos;s centroids)</source>
        <translation>Keuze van k (per k: Ward, daarna k-means vanuit de centroïden van Ward)</translation>
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
        <translation>silhouet</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="568"/>
        <source>Calinski–Harabasz</source>
        <translation>Calinski–Harabasz</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="569"/>
        <source>fusion jump</source>
        <translation>fusiesprong</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="576"/>
        <source>  Largest: silhouette at k = %1, Calinski–Harabasz at k = %2, fusion jump at k = %3</source>
        <translation>  Grootste: silhouet bij k = %1, Calinski–Harabasz bij k = %2, fusiesprong bij k = %3</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="581"/>
        <source>Frames (k = %1, given)</source>
        <translation>Frames (k = %1, opgegeven)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="583"/>
        <source>Frames (k = %1, where most indices point)</source>
        <translation>Frames (k = %1, waar de meeste indices naar wijzen)</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_frames.cpp" line="589"/>
        <source>  Frame %1  %n article(s) (%2%)</source>
        <translation>
            <numerusform>  Frame %1  %n artikel (%2%)</numerusform>
            <numerusform>  Frame %1  %n artikelen (%2%)</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="593"/>
        <source>  stability %1%2</source>
        <translation>  stabiliteit %1%2</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="597"/>
        <source> (dissolves on resampling)</source>
        <translation> (valt uiteen bij opnieuw trekken)</translation>
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
        <translation>    elementen: %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="626"/>
        <source>none stands out</source>
        <translation>geen enkel valt op</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="632"/>
        <source>    closest to the centre: %1</source>
        <translation>    het dichtst bij het centrum: %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="635"/>
        <source>Frames by %1: %2</source>
        <translation>Frames naar %1: %2</translation>
    </message>
    <message>
        <location filename="../app/cli/command_handout.cpp" line="13"/>
        <source>The coder the copy is for: pseudonym (preferred) or name.</source>
        <translation>De codeur voor wie de kopie is: pseudoniem (bij voorkeur) of naam.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_handout.cpp" line="17"/>
        <source>The coder copy to write (a new file).</source>
        <translation>De codeurskopie om te schrijven (een nieuw bestand).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_handout.cpp" line="27"/>
        <source>Write a coder copy: a project file holding only the articles assigned to the coder, the codebook and the coder&apos;s own annotations, links and answers, never another coder&apos;s. The coder codes in it with the same program; merge it back with &quot;fourfold-cli merge&quot;.</source>
        <translation>Een codeurskopie schrijven: een projectbestand met alleen de aan de codeur toegewezen artikelen, het codeboek en de eigen annotaties, koppelingen en antwoorden van de codeur, nooit die van een andere codeur. De codeur codeert erin met hetzelfde programma; voeg haar terug samen met ‘fourfold-cli merge’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_handout.cpp" line="40"/>
        <source>name the coder with --coder NAME.</source>
        <translation>noem de codeur met --coder NAME.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_handout.cpp" line="43"/>
        <source>name the copy to write with --out FILE.</source>
        <translation>noem de te schrijven kopie met --out BESTAND.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_handout.cpp" line="64"/>
        <source>Wrote the coder copy %1 for %2 (copy %3).</source>
        <translation>Codeurskopie %1 voor %2 geschreven (kopie %3).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_handout.cpp" line="66"/>
        <source>It holds %1 articles, %2 annotations, %3 links and %4 article judgements.</source>
        <translation>Ze bevat %1 artikelen, %2 annotaties, %3 koppelingen en %4 oordelen op artikelniveau.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="50"/>
        <source>%1: %2 spans, %3 answers, %4 gold spans added</source>
        <translation>%1: %2 fragmenten, %3 antwoorden, %4 fragmenten in de gouden standaard toegevoegd</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="56"/>
        <source>  %1 line(s) skipped: already in the project (the same annotation, or the same coder, function and range; the same answer; the same gold span)</source>
        <translation>  %1 regel(s) overgeslagen: al in het project (dezelfde annotatie, of dezelfde codeur, functie en hetzelfde bereik; hetzelfde antwoord; hetzelfde fragment in de gouden standaard)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="61"/>
        <source>  %1 article(s) marked done for their coders (imported codings count as finished)</source>
        <translation>  %1 artikel(en) als klaar gemarkeerd voor hun codeurs (geïmporteerde coderingen tellen als afgerond)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="66"/>
        <source>  new coders: %1</source>
        <translation>  nieuwe codeurs: %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="83"/>
        <source>Read every file as txt, html, jsonl, csv, feed (RSS or Atom), newsxml (NITF or NewsML-G2), docx, odt, pdf or epub (default: from each file&apos;s suffix; .xml and unknown suffixes from the content).</source>
        <translation>Elk bestand lezen als txt, html, jsonl, csv, feed (RSS of Atom), newsxml (NITF of NewsML-G2), docx, odt, pdf of epub (standaard: naar de extensie van elk bestand; .xml en onbekende extensies naar de inhoud).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="89"/>
        <source>Language (BCP 47 tag) of articles that name none (default: the project&apos;s).</source>
        <translation>Taal (BCP 47-tag) van artikelen die er geen noemen (standaard: die van het project).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="93"/>
        <source>CSV: take FIELD (id, title, text, outlet, published, language) from the column HEADER. Repeatable.</source>
        <translation>CSV: VELD (id, title, text, outlet, published, language) uit de kolom HEADER nemen. Herhaalbaar.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="98"/>
        <source>EPUB: import each book as one article instead of one article per chapter.</source>
        <translation>EPUB: elk boek als één artikel importeren in plaats van één artikel per hoofdstuk.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="101"/>
        <source>txt, docx, odt, pdf: cut each document into articles at the lines matching REGEX; named groups (?&lt;title&gt;...), (?&lt;outlet&gt;...), (?&lt;date&gt;...) fill those fields, else the first line of each part is its title.</source>
        <translation>txt, docx, odt, pdf: elk document in artikelen knippen bij de regels die met REGEX overeenkomen; benoemde groepen (?&lt;title&gt;...), (?&lt;outlet&gt;...), (?&lt;date&gt;...) vullen die velden, anders is de eerste regel van elk deel de titel.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="107"/>
        <source>List and record an added article as a near copy of an article in the project when the estimated Jaccard similarity of their 5-word shingles is at least J, in (0, 1] (default 0.8).</source>
        <translation>Een toegevoegd artikel opsommen en vastleggen als bijna-kopie van een artikel in het project wanneer de geschatte Jaccard-gelijkenis van hun shingles van 5 woorden ten minste J is, in (0, 1] (standaard 0.8).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="113"/>
        <source>Print the report as JSON.</source>
        <translation>Het verslag als JSON afdrukken.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="115"/>
        <source>The files hold W3C Web Annotations (from &quot;export --format w3c&quot;): import them as codings of the articles already in the project.</source>
        <translation>De bestanden bevatten W3C-webannotaties (uit ‘export --format w3c’): importeer ze als coderingen van de artikelen die al in het project staan.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="119"/>
        <source>The files hold quote-anchored codings (JSON Lines, see sample-project/README.md).</source>
        <translation>De bestanden bevatten aan citaten verankerde coderingen (JSON Lines, zie sample-project/README.md).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="122"/>
        <source>With --w3c or --codings: the phase of the imported codings (training, pilot, reliability, production; default production).</source>
        <translation>Met --w3c of --codings: de fase van de geïmporteerde coderingen (training, pilot, reliability, production; standaard production).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="131"/>
        <source>Files or folders to import. Each file is imported whole or not at all; a folder (with its subfolders) likewise, as one.</source>
        <translation>Te importeren bestanden of mappen. Elk bestand wordt helemaal of helemaal niet geïmporteerd; een map (met submappen) evenzo, als geheel.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="135"/>
        <source>Import articles into a project (or, with --w3c or --codings, codings of its articles).</source>
        <translation>Artikelen in een project importeren (of, met --w3c of --codings, coderingen van de artikelen ervan).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="144"/>
        <source>expected a project file and at least one file to import.</source>
        <translation>een projectbestand en ten minste één te importeren bestand verwacht.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="152"/>
        <source>unknown format &quot;%1&quot; (expected txt, html, jsonl, csv, feed, newsxml, docx, odt, pdf or epub).</source>
        <translation>onbekend formaat ‘%1’ (verwacht: txt, html, jsonl, csv, feed, newsxml, docx, odt, pdf of epub).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="163"/>
        <source>--split-on: %1</source>
        <translation>--split-on: %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="171"/>
        <source>--near-copy-threshold expects a number in (0, 1], got &quot;%1&quot;.</source>
        <translation>--near-copy-threshold verwacht een getal in (0, 1], gekregen: ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="179"/>
        <source>--column expects FIELD=HEADER, got &quot;%1&quot;.</source>
        <translation>--column verwacht VELD=HEADER, gekregen: ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="186"/>
        <source>choose either --w3c or --codings.</source>
        <translation>kies --w3c of --codings.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="192"/>
        <source>unknown phase &quot;%1&quot; (expected training, pilot, reliability or production).</source>
        <translation>onbekende fase ‘%1’ (verwacht: training, pilot, reliability of production).</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_import.cpp" line="222"/>
        <source>fourfold-cli: the %n article(s) imported before this file stay in the project.</source>
        <translation>
            <numerusform>fourfold-cli: het %n artikel dat vóór dit bestand is geïmporteerd, blijft in het project.</numerusform>
            <numerusform>fourfold-cli: de %n artikelen die vóór dit bestand zijn geïmporteerd, blijven in het project.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="251"/>
        <source>%1: %2 added, %3 skipped</source>
        <translation>%1: %2 toegevoegd, %3 overgeslagen</translation>
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
            <numerusform>… %n andere</numerusform>
            <numerusform>… %n andere</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="268"/>
        <source>  %1: %2 added (%3), %4 skipped</source>
        <translation>  %1: %2 toegevoegd (%3), %4 overgeslagen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="275"/>
        <source>  line %1 (%2): skipped, %3</source>
        <translation>  regel %1 (%2): overgeslagen, %3</translation>
    </message>
    <message>
        <location filename="../app/cli/command_import.cpp" line="279"/>
        <source>  line %1 (%2): added, a near copy of &quot;%3&quot; (similarity %4)</source>
        <translation>  regel %1 (%2): toegevoegd, een bijna-kopie van ‘%3’ (gelijkenis %4)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="40"/>
        <source>Show what a project holds. Coders appear by pseudonym only.</source>
        <translation>Tonen wat een project bevat. Codeurs verschijnen alleen onder pseudoniem.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="106"/>
        <source>Project      %1 (%2)</source>
        <translation>Project      %1 (%2)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="108"/>
        <source>Schema       version %1; codebook version %2; default language %3</source>
        <translation>Schema       versie %1; codeboekversie %2; standaardtaal %3</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="113"/>
        <source>Articles     %1 (%2)</source>
        <translation>Artikelen    %1 (%2)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="116"/>
        <source>Near copies  %1 article(s) a near copy of an older one (%2 pair(s))</source>
        <translation>Kopieën      %1 artikel(en) een bijna-kopie van een ouder artikel (%2 paar/paren)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="120"/>
        <source>Units        %1 paragraphs, %2 sentences, %3 tokens, %4 characters</source>
        <translation>Eenheden     %1 alinea&apos;s, %2 zinnen, %3 tokens, %4 tekens</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="126"/>
        <source>Coders       %1; %2 assignments</source>
        <translation>Codeurs      %1; %2 toewijzingen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="129"/>
        <source>Annotations  %1 (%2)</source>
        <translation>Annotaties   %1 (%2)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="133"/>
        <source>  %1 (%2)  %3 (%4)</source>
        <translation>  %1 (%2)  %3 (%4)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_info.cpp" line="137"/>
        <source>Links        %1; article judgements %2; gold spans %3; extractor runs %4</source>
        <translation>Koppelingen  %1; oordelen op artikelniveau %2; fragmenten in de gouden standaard %3; extractorruns %4</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="17"/>
        <source>(none)</source>
        <translation>(geen)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="31"/>
        <source> note &quot;%1&quot;</source>
        <translation> notitie ‘%1’</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="34"/>
        <source> confidence %1</source>
        <translation> betrouwbaarheidsscore %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="43"/>
        <source> (deleted)</source>
        <translation> (verwijderd)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="58"/>
        <source>List the open merge conflicts instead of merging.</source>
        <translation>In plaats van samenvoegen de open samenvoegconflicten opsommen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="60"/>
        <source>With --conflicts: list resolved conflicts too.</source>
        <translation>Met --conflicts: ook opgeloste conflicten opsommen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="62"/>
        <source>Resolve the open conflict UUID (the conflict&apos;s or the object&apos;s uuid).</source>
        <translation>Het open conflict UUID oplossen (de uuid van het conflict of van het object).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="66"/>
        <source>With --resolve: keep &quot;mine&quot; (the version the project holds) or &quot;theirs&quot; (the version that lost).</source>
        <translation>Met --resolve: ‘mine’ (de versie in het project) of ‘theirs’ (de versie die verloor) behouden.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="77"/>
        <source>Coder copies to merge, in this order.</source>
        <translation>Samen te voegen codeurskopieën, in deze volgorde.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="79"/>
        <source>Merge returned coder copies into the project, all in one transaction: new and changed annotations, links, answers and statuses are taken by uuid, deletions as tombstones, coding time is added. Merging a copy again changes nothing. A copy of another project, with changed article texts or with rows or log entries it cannot hold is refused. An object changed differently in the project and a copy, or in two copies, is a conflict: the later change is kept (in any order of merging), the other is stored until you resolve it with --resolve UUID --keep mine|theirs.</source>
        <translation>Teruggekomen codeurskopieën in één transactie in het project samenvoegen: nieuwe en gewijzigde annotaties, koppelingen, antwoorden en statussen worden op uuid overgenomen, verwijderingen als grafstenen, codeertijd wordt opgeteld. Een kopie opnieuw samenvoegen verandert niets. Een kopie van een ander project, met gewijzigde artikelteksten of met rijen of logboekregels die ze niet kan bevatten, wordt geweigerd. Een object dat in het project en een kopie, of in twee kopieën, verschillend is gewijzigd, is een conflict: de latere wijziging blijft (in elke volgorde van samenvoegen), de andere wordt bewaard tot u het oplost met --resolve UUID --keep mine|theirs.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="95"/>
        <source>name the project file.</source>
        <translation>noem het projectbestand.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="100"/>
        <source>use either --conflicts or --resolve.</source>
        <translation>gebruik --conflicts of --resolve.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="103"/>
        <source>--conflicts and --resolve take the project file only, no copies.</source>
        <translation>--conflicts en --resolve nemen alleen het projectbestand, geen kopieën.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="107"/>
        <source>name at least one coder copy to merge.</source>
        <translation>noem ten minste één samen te voegen codeurskopie.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="110"/>
        <source>--resolve UUID needs --keep mine|theirs.</source>
        <translation>--resolve UUID heeft --keep mine|theirs nodig.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="114"/>
        <source>--keep takes &quot;mine&quot; or &quot;theirs&quot;.</source>
        <translation>--keep neemt ‘mine’ of ‘theirs’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="117"/>
        <source>--all goes with --conflicts.</source>
        <translation>--all hoort bij --conflicts.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="131"/>
        <source>Resolved %1: kept %2.</source>
        <translation>%1 opgelost: %2 behouden.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="172"/>
        <source>No open merge conflicts.</source>
        <translation>Geen open samenvoegconflicten.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="177"/>
        <source>%1  %2 %3 of %4%5%6</source>
        <translation>%1  %2 %3 van %4%5%6</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="181"/>
        <source> on article %1</source>
        <translation> bij artikel %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="184"/>
        <source> (resolved: kept %1)</source>
        <translation> (opgelost: %1 behouden)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="186"/>
        <source>    mine (kept):   %1</source>
        <translation>    mine (behouden):    %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="188"/>
        <source>    theirs (lost): %1</source>
        <translation>    theirs (verloren):  %1</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="191"/>
        <source>    the assignment was withdrawn in the project while %1 coded the article in a copy: keep mine to leave it withdrawn, theirs to assign it again.</source>
        <translation>    de toewijzing is in het project ingetrokken terwijl %1 het artikel in een kopie codeerde: mine laat haar ingetrokken, theirs wijst het artikel opnieuw toe.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="227"/>
        <source>%1 (%2): nothing new; it was merged before.</source>
        <translation>%1 (%2): niets nieuws; het is al eerder samengevoegd.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="230"/>
        <source>%1 (%2): added %3, changed %4 (of which deleted %5), conflicts %6, coding time %7 s.</source>
        <translation>%1 (%2): %3 toegevoegd, %4 gewijzigd (waarvan %5 verwijderd), %6 conflicten, codeertijd %7 s.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_merge.cpp" line="243"/>
        <source>Open conflicts waiting for your decision: %1 (see fourfold-cli merge %2 --conflicts).</source>
        <translation>Open conflicten die op uw beslissing wachten: %1 (zie fourfold-cli merge %2 --conflicts).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_new.cpp" line="12"/>
        <source>Default language of articles that name none (BCP 47 tag, default en).</source>
        <translation>Standaardtaal van artikelen die er geen noemen (BCP 47-tag, standaard en).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_new.cpp" line="16"/>
        <source>The project&apos;s name (default: the file name).</source>
        <translation>De naam van het project (standaard: de bestandsnaam).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_new.cpp" line="21"/>
        <source>The project file to create (*.fourfold).</source>
        <translation>Het aan te maken projectbestand (*.fourfold).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_new.cpp" line="23"/>
        <location filename="../app/cli/main.cpp" line="35"/>
        <source>Create an empty project file with the default codebook.</source>
        <translation>Een leeg projectbestand met het standaardcodeboek aanmaken.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_new.cpp" line="38"/>
        <source>Created %1 (default language %2).</source>
        <translation>%1 aangemaakt (standaardtaal %2).</translation>
    </message>
    <message>
        <location filename="../app/cli/passphrase_input.cpp" line="22"/>
        <source>The passphrase file %1 could not be read.</source>
        <translation>Het bestand met de wachtwoordzin %1 kon niet worden gelezen.</translation>
    </message>
    <message>
        <location filename="../app/cli/passphrase_input.cpp" line="31"/>
        <source>The passphrase in %1 is not UTF-8.</source>
        <translation>De wachtwoordzin in %1 is geen UTF-8.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="40"/>
        <source>List everyone: pseudonym, role, enabled or disabled, and whether a lead&apos;s passphrase is set (names are not printed).</source>
        <translation>Iedereen opsommen: pseudoniem, rol, in- of uitgeschakeld, en of de wachtwoordzin van een coördinator is ingesteld (namen worden niet afgedrukt).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="44"/>
        <source>Add a person with this name (kept in the project, never printed or exported).</source>
        <translation>Een persoon met deze naam toevoegen (bewaard in het project, nooit afgedrukt of geëxporteerd).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="48"/>
        <source>The new person&apos;s pseudonym, unique in the project (the only name in exports).</source>
        <translation>Het pseudoniem van de nieuwe persoon, uniek in het project (de enige naam in exports).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="52"/>
        <location filename="../app/cli/command_team_people.cpp" line="35"/>
        <source>coder (the default) or lead.</source>
        <translation>coder (standaard) of lead.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="55"/>
        <source>A new lead&apos;s passphrase: the first line of FILE, or of standard input when FILE is -.</source>
        <translation>De wachtwoordzin van een nieuwe coördinator: de eerste regel van BESTAND, of van standaardinvoer als BESTAND - is.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="60"/>
        <source>Give the person with pseudonym P the name NAME (the second argument).</source>
        <translation>De persoon met pseudoniem P de naam NAME (het tweede argument) geven.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="63"/>
        <source>Disable the person with pseudonym P: their codings stay; they take no new assignments and cannot be chosen on the desk.</source>
        <translation>De persoon met pseudoniem P uitschakelen: de coderingen blijven; de persoon krijgt geen nieuwe toewijzingen en kan bij het coderen niet worden gekozen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="67"/>
        <location filename="../app/cli/command_team_people.cpp" line="46"/>
        <source>Enable a disabled person again.</source>
        <translation>Een uitgeschakelde persoon weer inschakelen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="69"/>
        <source>The lead making the change (needed once the project has a lead).</source>
        <translation>De coördinator die de wijziging maakt (nodig zodra het project een coördinator heeft).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="72"/>
        <location filename="../app/cli/command_team_people.cpp" line="51"/>
        <source>That lead&apos;s passphrase: the first line of FILE (- or left out: standard input).</source>
        <translation>De wachtwoordzin van die coördinator: de eerste regel van BESTAND (- of weggelaten: standaardinvoer).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="76"/>
        <source>Print the list or the result as JSON.</source>
        <translation>De lijst of het resultaat als JSON afdrukken.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="82"/>
        <source>The new name, with --rename.</source>
        <translation>De nieuwe naam, met --rename.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="84"/>
        <source>List and change the people of a project. Changes need a lead (--lead and its passphrase) once the project has one; each is logged. Output names people by pseudonym only.</source>
        <translation>De personen van een project opsommen en wijzigen. Wijzigingen vereisen een coördinator (--lead en diens wachtwoordzin) zodra het project er een heeft; elke wijziging wordt gelogd. De uitvoer noemt personen alleen bij pseudoniem.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="96"/>
        <source>give exactly one of --list, --add, --rename, --disable and --enable.</source>
        <translation>geef precies een van --list, --add, --rename, --disable en --enable.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="100"/>
        <source>expected the project file and the new name.</source>
        <translation>het projectbestand en de nieuwe naam verwacht.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="107"/>
        <location filename="../app/cli/command_team_people.cpp" line="92"/>
        <source>--role takes coder or lead, not &quot;%1&quot;.</source>
        <translation>--role neemt coder of lead, niet ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="110"/>
        <location filename="../app/cli/command_team_people.cpp" line="95"/>
        <source>name the new person&apos;s pseudonym with --pseudonym.</source>
        <translation>noem het pseudoniem van de nieuwe persoon met --pseudonym.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="113"/>
        <location filename="../app/cli/command_team_people.cpp" line="98"/>
        <source>a lead needs a passphrase: give it with --passphrase-file FILE (- for standard input).</source>
        <translation>een coördinator heeft een wachtwoordzin nodig: geef die met --passphrase-file BESTAND (- voor standaardinvoer).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="121"/>
        <location filename="../app/cli/command_team_people.cpp" line="104"/>
        <source>only one passphrase can come from standard input; give the other in a file.</source>
        <translation>maar één wachtwoordzin kan uit standaardinvoer komen; geef de andere in een bestand.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="145"/>
        <source>disabled</source>
        <translation>uitgeschakeld</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="145"/>
        <source>enabled</source>
        <translation>ingeschakeld</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="147"/>
        <source>passphrase set</source>
        <translation>wachtwoordzin ingesteld</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="148"/>
        <source>no passphrase yet (set when first chosen)</source>
        <translation>nog geen wachtwoordzin (ingesteld bij de eerste keuze)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="175"/>
        <location filename="../app/cli/command_team_people.cpp" line="85"/>
        <source>changing people needs a lead: name yourself with --lead L (your passphrase on standard input or with --lead-passphrase-file FILE).</source>
        <translation>personen wijzigen vereist een coördinator: noem uzelf met --lead L (uw wachtwoordzin via standaardinvoer of met --lead-passphrase-file BESTAND).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="194"/>
        <source>Added %1 (%2).</source>
        <translation>%1 (%2) toegevoegd.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="198"/>
        <source>Renamed %1.</source>
        <translation>%1 hernoemd.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="205"/>
        <source>Disabled %1: their codings stay; they take no new assignments.</source>
        <translation>%1 uitgeschakeld: de coderingen blijven; de persoon krijgt geen nieuwe toewijzingen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_people.cpp" line="206"/>
        <source>Enabled %1.</source>
        <translation>%1 ingeschakeld.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="34"/>
        <source>The report file: FILE.html (self-contained) or FILE.pdf; give --out twice for both.</source>
        <translation>Het rapportbestand: BESTAND.html (op zichzelf staand) of BESTAND.pdf; geef --out twee keer voor beide.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="38"/>
        <source>The unit of the four function variables: paragraph, sentence (default) or token.</source>
        <translation>De eenheid van de vier functievariabelen: paragraph, sentence (standaard) of token.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="42"/>
        <source>Only this phase (training, pilot, reliability, production); default all.</source>
        <translation>Alleen deze fase (training, pilot, reliability, production); standaard alle.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="45"/>
        <source>The coders&apos; pseudonyms (default: everyone who coded).</source>
        <translation>De pseudoniemen van de codeurs (standaard: iedereen die heeft gecodeerd).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="48"/>
        <source>Bootstrap replicates for alpha&apos;s 95% intervals (default 1000; 0 = none).</source>
        <translation>Bootstrapreplicaties voor de 95%-intervallen van alfa (standaard 1000; 0 = geen).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="54"/>
        <source>The report&apos;s title.</source>
        <translation>De titel van het rapport.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="56"/>
        <source>Also print the report&apos;s figures as JSON on stdout.</source>
        <translation>De cijfers van het rapport ook als JSON op stdout afdrukken.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="58"/>
        <source>Replace report files that exist already.</source>
        <translation>Rapportbestanden vervangen die al bestaan.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="60"/>
        <source>The report&apos;s language: en, nl or de (default: the language of the messages, from LANGUAGE or LANG).</source>
        <translation>De taal van het rapport: en, nl of de (standaard: de taal van de meldingen, uit LANGUAGE of LANG).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="64"/>
        <source>Also count articles that coders started but did not mark done (left out and listed by default).</source>
        <translation>Ook artikelen meetellen die codeurs zijn begonnen maar niet als klaar hebben gemarkeerd (standaard weggelaten en opgesomd).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="71"/>
        <source>Write the reliability report: method text with the items of Lombard, Snyder-Duch &amp; Bracken (2002), Krippendorff&apos;s alpha per variable with bootstrap intervals, coders and pairs, charts. Every figure equals what &quot;fourfold-cli agree&quot; prints for the same selection.</source>
        <translation>Het betrouwbaarheidsrapport schrijven: methodetekst met de punten van Lombard, Snyder-Duch &amp; Bracken (2002), Krippendorffs alfa per variabele met bootstrapintervallen, codeurs en paren, grafieken. Elk cijfer is gelijk aan wat ‘fourfold-cli agree’ voor dezelfde selectie afdrukt.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="84"/>
        <source>say where to write the report: --out FILE.html|FILE.pdf.</source>
        <translation>zeg waarheen het rapport moet worden geschreven: --out BESTAND.html|BESTAND.pdf.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="90"/>
        <source>the report file &quot;%1&quot; must end in .html or .pdf.</source>
        <translation>het rapportbestand ‘%1’ moet eindigen op .html of .pdf.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="96"/>
        <source>The report file %1 is a symbolic link; name a real file.</source>
        <translation>Het rapportbestand %1 is een symbolische koppeling; noem een echt bestand.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="100"/>
        <source>%1 exists and is not a file.</source>
        <translation>%1 bestaat en is geen bestand.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="112"/>
        <source>--language takes en, nl or de, not &quot;%1&quot;.</source>
        <translation>--language neemt en, nl of de, niet ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="125"/>
        <location filename="../app/cli/command_score.cpp" line="169"/>
        <source>unknown unit &quot;%1&quot; (expected paragraph, sentence or token).</source>
        <translation>onbekende eenheid ‘%1’ (verwacht: paragraph, sentence of token).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="168"/>
        <source>Wrote %1</source>
        <translation>%1 geschreven</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="181"/>
        <source>Write the reliability report (needs a build with FOURFOLD_BUILD_DESKTOP=ON).</source>
        <translation>Het betrouwbaarheidsrapport schrijven (vereist een build met FOURFOLD_BUILD_DESKTOP=ON).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_report.cpp" line="187"/>
        <source>This fourfold-cli was built without the graphical libraries, so it cannot write reports; rebuild with FOURFOLD_BUILD_DESKTOP=ON.</source>
        <translation>Deze fourfold-cli is gebouwd zonder de grafische bibliotheken en kan dus geen rapporten schrijven; bouw opnieuw met FOURFOLD_BUILD_DESKTOP=ON.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="108"/>
        <source>The extractor run to score (its name).</source>
        <translation>De te scoren extractorrun (de naam ervan).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="110"/>
        <source>The reference: gold (default) or a coder&apos;s pseudonym.</source>
        <translation>De referentie: gold (standaard) of het pseudoniem van een codeur.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="113"/>
        <source>Span matching (SemEval-2013 Task 9.1): strict (same boundaries and function, default), exact (same boundaries), partial (overlap counts half), type (same function, any overlap).</source>
        <translation>Koppeling van fragmenten (SemEval-2013 Task 9.1): strict (dezelfde grenzen en functie, standaard), exact (dezelfde grenzen), partial (overlap telt half), type (dezelfde functie, elke overlap).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="118"/>
        <source>Bootstrap replicates over articles for the 95% intervals (default 1000; 0 = none).</source>
        <translation>Bootstrapreplicaties over artikelen voor de 95%-intervallen (standaard 1000; 0 = geen).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="125"/>
        <source>Units on which the run joins the humans for alpha: paragraph, sentence (default) or token.</source>
        <translation>Eenheden waarop de run zich voor alfa bij de mensen voegt: paragraph, sentence (standaard) of token.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="130"/>
        <source>The human coders for alpha (default: everyone who coded).</source>
        <translation>De menselijke codeurs voor alfa (standaard: iedereen die heeft gecodeerd).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="137"/>
        <source>Scores an extractor run against the gold standard or one coder: precision, recall and F1 per function, micro and macro, with bootstrap intervals over articles; and the run&apos;s alpha with the humans beside their pairwise range.</source>
        <translation>Scoort een extractorrun tegen de gouden standaard of één codeur: precisie, recall en F1 per functie, micro en macro, met bootstrapintervallen over artikelen; en de alfa van de run met de mensen naast hun paarsgewijze spreiding.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="147"/>
        <source>say which run to score: --run NAME.</source>
        <translation>zeg welke run moet worden gescoord: --run NAME.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="151"/>
        <source>unknown match mode &quot;%1&quot; (expected strict, exact, partial or type).</source>
        <translation>onbekende koppelingsmodus ‘%1’ (verwacht: strict, exact, partial of type).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="235"/>
        <source>Run %1 against %2, %3 matching, %4 articles</source>
        <translation>Run %1 tegen %2, koppeling %3, %4 artikelen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="237"/>
        <source>gold</source>
        <translation>de gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="253"/>
        <source>  F1 95% interval (articles resampled)</source>
        <translation>  F1 95%-interval (artikelen opnieuw getrokken)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="258"/>
        <source>micro</source>
        <translation>micro</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="261"/>
        <source>macro</source>
        <translation>macro</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="272"/>
        <source>Intervals: %1 bootstrap replicates over articles, seed %2, percentile method.</source>
        <translation>Intervallen: %1 bootstrapreplicaties over artikelen, seed %2, percentielmethode.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="278"/>
        <source>Alpha with the humans: not available (%1)</source>
        <translation>Alfa met de mensen: niet beschikbaar (%1)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="281"/>
        <source>Alpha with the humans (%1 units present/absent, nominal; humans: %2)</source>
        <translation>Alfa met de mensen (%1-eenheden aanwezig/afwezig, nominaal; mensen: %2)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="285"/>
        <source>human band</source>
        <translation>bandbreedte mensen</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="286"/>
        <source>run (mean)</source>
        <translation>run (gemiddelde)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="287"/>
        <source>all+run</source>
        <translation>alle+run</translation>
    </message>
    <message>
        <location filename="../app/cli/command_score.cpp" line="288"/>
        <source>position</source>
        <translation>positie</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="20"/>
        <source>The empty database to publish into, as a libpq connection string or URI (postgresql://ADMIN@HOST/DATABASE). Its login must own the database and may create roles; its password comes from ~/.pgpass, PGPASSFILE or PGPASSWORD.</source>
        <translation>De lege database om in te publiceren, als libpq-verbindingsreeks of URI (postgresql://ADMIN@HOST/DATABASE). De aanmelding moet eigenaar van de database zijn en rollen mogen aanmaken; het wachtwoord komt uit ~/.pgpass, PGPASSFILE of PGPASSWORD.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="26"/>
        <source>The new (or empty) folder for the people&apos;s password files, one PSEUDONYM.pgpass each (default: PROJECT.credentials beside the project).</source>
        <translation>De nieuwe (of lege) map voor de wachtwoordbestanden van de personen, elk één PSEUDONYM.pgpass (standaard: PROJECT.credentials naast het project).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="31"/>
        <source>The lead whose working file the project becomes (needed with several leads).</source>
        <translation>De coördinator wiens werkbestand het project wordt (nodig bij meerdere coördinatoren).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="40"/>
        <source>Create the team project of PROJECT on a PostgreSQL server: the schema, one login role per person with a random password (written to a password file per person), the row-level security that keeps coders blind, and every shared row. No password is stored in the project file.</source>
        <translation>Het teamproject van PROJECT aanmaken op een PostgreSQL-server: het schema, per persoon één aanmeldrol met een willekeurig wachtwoord (per persoon in een wachtwoordbestand geschreven), de beveiliging op rijniveau die codeurs blind houdt, en elke gedeelde rij. Er wordt geen wachtwoord in het projectbestand opgeslagen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="53"/>
        <source>name the database with --server URL.</source>
        <translation>noem de database met --server URL.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="84"/>
        <source>Published %1 to %2 (server schema version %3): %4 articles, %5 annotations, %6 links, %7 article judgements, %8 gold decisions, %9 events.</source>
        <translation>%1 gepubliceerd naar %2 (serverschemaversie %3): %4 artikelen, %5 annotaties, %6 koppelingen, %7 oordelen op artikelniveau, %8 beslissingen voor de gouden standaard, %9 gebeurtenissen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="95"/>
        <source>One login per person; hand each person their own password file (mode 0600) and nothing else:</source>
        <translation>Eén aanmelding per persoon; geef elke persoon het eigen wachtwoordbestand (modus 0600) en verder niets:</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="102"/>
        <source>  (lead)</source>
        <translation>  (coördinator)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="111"/>
        <source>Your pseudonym in the team project.</source>
        <translation>Uw pseudoniem in het teamproject.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="114"/>
        <source>The working file to write (a new file).</source>
        <translation>Het te schrijven werkbestand (een nieuw bestand).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="120"/>
        <source>The team project&apos;s database with your login role, as a libpq connection string or URI (postgresql://ROLE@HOST/DATABASE); the password from your password file (PGPASSFILE=PSEUDONYM.pgpass or ~/.pgpass).</source>
        <translation>De database van het teamproject met uw aanmeldrol, als libpq-verbindingsreeks of URI (postgresql://ROLE@HOST/DATABASE); het wachtwoord uit uw wachtwoordbestand (PGPASSFILE=PSEUDONYM.pgpass of ~/.pgpass).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="125"/>
        <source>Write your working file of a team project: what your login role may read on the server (for a coder: the codebook, your articles and your own codings).</source>
        <translation>Uw werkbestand van een teamproject schrijven: wat uw aanmeldrol op de server mag lezen (voor een codeur: het codeboek, uw artikelen en uw eigen coderingen).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="133"/>
        <source>expected exactly one server URL.</source>
        <translation>precies één server-URL verwacht.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="136"/>
        <source>name yourself with --as PSEUDONYM.</source>
        <translation>noem uzelf met --as PSEUDONYM.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="139"/>
        <source>name the working file with --out FILE.</source>
        <translation>noem het werkbestand met --out BESTAND.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="159"/>
        <source>Wrote %1, the working file of %2 from %3: %4 articles, %5 annotations, %6 links, %7 article judgements (through change %8).</source>
        <translation>%1 geschreven, het werkbestand van %2 uit %3: %4 artikelen, %5 annotaties, %6 koppelingen, %7 oordelen op artikelniveau (tot en met wijziging %8).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="179"/>
        <location filename="../app/cli/command_team.cpp" line="224"/>
        <source>Your team working file.</source>
        <translation>Uw teamwerkbestand.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="181"/>
        <source>Push your changed codings to the team project&apos;s server and pull the ones you may see, once (assignments, spans, links, answers; coding time adds up). An object changed on both sides keeps the later version and is listed as a conflict for the lead.</source>
        <translation>Uw gewijzigde coderingen één keer naar de server van het teamproject sturen en de coderingen ophalen die u mag zien (toewijzingen, fragmenten, koppelingen, antwoorden; codeertijd wordt opgeteld). Een object dat aan beide kanten is gewijzigd, houdt de latere versie en wordt voor de coördinator als conflict vermeld.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="191"/>
        <location filename="../app/cli/command_team.cpp" line="234"/>
        <location filename="../app/cli/command_team_people.cpp" line="82"/>
        <source>expected exactly one working file.</source>
        <translation>precies één werkbestand verwacht.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="206"/>
        <source>Synced with %1: %2 sent, %3 received, %4 conflicts (through change %5).</source>
        <translation>Gesynchroniseerd met %1: %2 verzonden, %3 ontvangen, %4 conflicten (tot en met wijziging %5).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="226"/>
        <source>Show a working file&apos;s team project: its server, whose file it is, when it last synced and what the next sync would send. Reads the file only (works offline).</source>
        <translation>Het teamproject van een werkbestand tonen: de server, van wie het bestand is, wanneer het voor het laatst is gesynchroniseerd en wat de volgende synchronisatie zou versturen. Leest alleen het bestand (werkt offline).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="256"/>
        <source>Working file of %1 (%2) on %3, through change %4.</source>
        <translation>Werkbestand van %1 (%2) op %3, tot en met wijziging %4.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="258"/>
        <source>lead</source>
        <translation>coördinator</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="263"/>
        <source>Not synced since it was made.</source>
        <translation>Niet gesynchroniseerd sinds het is gemaakt.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="264"/>
        <source>Last synced %1.</source>
        <translation>Laatst gesynchroniseerd %1.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="269"/>
        <source>Nothing waiting to be sent.</source>
        <translation>Er wacht niets om te worden verzonden.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_team.cpp" line="270"/>
        <source>%n change(s) waiting to be sent (%1).</source>
        <translation>
            <numerusform>%n wijziging wacht om te worden verzonden (%1).</numerusform>
            <numerusform>%n wijzigingen wachten om te worden verzonden (%1).</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_team.cpp" line="274"/>
        <source>%n conflict(s) from syncs wait for the lead.</source>
        <translation>
            <numerusform>%n conflict uit synchronisaties wacht op de coördinator.</numerusform>
            <numerusform>%n conflicten uit synchronisaties wachten op de coördinator.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="295"/>
        <source>Usage: fourfold-cli team SUBCOMMAND [options]</source>
        <translation>Gebruik: fourfold-cli team SUBOPDRACHT [opties]</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="296"/>
        <source>  publish   Create the team project of a project file on a PostgreSQL server.</source>
        <translation>  publish   Het teamproject van een projectbestand op een PostgreSQL-server aanmaken.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="298"/>
        <source>  join      Write your working file of a team project from its server.</source>
        <translation>  join      Uw werkbestand van een teamproject vanaf de server schrijven.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="300"/>
        <source>  sync      Push and pull a working file&apos;s codings once.</source>
        <translation>  sync      De coderingen van een werkbestand één keer versturen en ophalen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="302"/>
        <source>  status    What a working file last synced and what waits to be sent.</source>
        <translation>  status    Wat een werkbestand het laatst heeft gesynchroniseerd en wat wacht om te worden verzonden.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="309"/>
        <source>unknown subcommand &quot;%1&quot;.</source>
        <translation>onbekende subopdracht ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="38"/>
        <source>Import articles from text, HTML, JSON Lines or CSV files.</source>
        <translation>Artikelen importeren uit tekst-, HTML-, JSON Lines- of CSV-bestanden.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="41"/>
        <source>Show what a project holds: articles, units, coders, annotations.</source>
        <translation>Tonen wat een project bevat: artikelen, eenheden, codeurs, annotaties.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="45"/>
        <source>Check a project file&apos;s integrity.</source>
        <translation>De integriteit van een projectbestand controleren.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="47"/>
        <source>Inter-coder reliability of a matrix file or of a project&apos;s codings.</source>
        <translation>Intercodeursbetrouwbaarheid van een matrixbestand of van de coderingen van een project.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="51"/>
        <source>Frames as clusters of articles by their frame elements (Ward, then k-means).</source>
        <translation>Frames als clusters van artikelen naar hun frame-elementen (Ward, daarna k-means).</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="55"/>
        <source>Run an extractor (built-in baseline or external command) over a project&apos;s articles.</source>
        <translation>Een extractor (ingebouwde baseline of externe opdracht) over de artikelen van een project laten lopen.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="60"/>
        <source>Score an extractor run against gold or a coder.</source>
        <translation>Een extractorrun scoren tegen de gouden standaard of een codeur.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="63"/>
        <source>Export gold, codings or a run as JSON Lines, W3C Web Annotation, IOB2 or CSV.</source>
        <translation>De gouden standaard, coderingen of een run exporteren als JSON Lines, W3C Web Annotation, IOB2 of CSV.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="67"/>
        <source>Write the reliability report (HTML or PDF).</source>
        <translation>Het betrouwbaarheidsrapport schrijven (HTML of PDF).</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="69"/>
        <source>Assign articles to coders and draw the reliability subsample.</source>
        <translation>Artikelen aan codeurs toewijzen en de betrouwbaarheidsdeelsteekproef trekken.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="73"/>
        <source>List codebook versions, add one from a JSON file, and show what changed.</source>
        <translation>Codeboekversies opsommen, er een toevoegen uit een JSON-bestand en tonen wat er is veranderd.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="77"/>
        <source>Write a coder copy holding only that coder&apos;s articles and annotations.</source>
        <translation>Een codeurskopie schrijven met alleen de artikelen en annotaties van die codeur.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="81"/>
        <source>Merge returned coder copies into the project.</source>
        <translation>Teruggekomen codeurskopieën in het project samenvoegen.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="83"/>
        <source>Team projects on a PostgreSQL server: publish a project, join one (team publish, team join).</source>
        <translation>Teamprojecten op een PostgreSQL-server: een project publiceren, aan een project deelnemen (team publish, team join).</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="88"/>
        <source>List, add, rename, disable and enable the people of a project (by pseudonym).</source>
        <translation>De personen van een project opsommen, toevoegen, hernoemen, uitschakelen en inschakelen (op pseudoniem).</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="92"/>
        <source>Build the demo project from its source files.</source>
        <translation>Het demoproject bouwen uit de bronbestanden.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="100"/>
        <source>Usage: fourfold-cli COMMAND [options] [arguments]</source>
        <translation>Gebruik: fourfold-cli OPDRACHT [opties] [argumenten]</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="102"/>
        <source>Commands:</source>
        <translation>Opdrachten:</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="108"/>
        <source>Run &quot;fourfold-cli COMMAND --help&quot; for a command&apos;s options.</source>
        <translation>Voer ‘fourfold-cli OPDRACHT --help’ uit voor de opties van een opdracht.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="163"/>
        <source>fourfold-cli: unknown command &quot;%1&quot;.</source>
        <translation>fourfold-cli: onbekende opdracht ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/cli/main.cpp" line="164"/>
        <source>Run &quot;fourfold-cli --help&quot; for the list of commands.</source>
        <translation>Voer ‘fourfold-cli --help’ uit voor de lijst met opdrachten.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="30"/>
        <source>Add a person with this name (kept in the project files, never printed).</source>
        <translation>Een persoon met deze naam toevoegen (blijft in de projectbestanden, wordt nooit getoond).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="33"/>
        <source>The new person&apos;s pseudonym, unique in the project.</source>
        <translation>Het pseudoniem van de nieuwe persoon, uniek in het project.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="38"/>
        <source>A new lead&apos;s passphrase for the desk: the first line of FILE (- for standard input).</source>
        <translation>Het wachtwoord van een nieuwe coördinator voor de werkplek: de eerste regel van FILE (- voor standaardinvoer).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="42"/>
        <source>Disable the person with pseudonym P: their codings stay; their login may no longer reach the server.</source>
        <translation>De persoon met pseudoniem P uitschakelen: de coderingen blijven; de aanmelding bereikt de server niet meer.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="48"/>
        <source>The lead making the change (your pseudonym in the working file).</source>
        <translation>De coördinator die de wijziging maakt (uw pseudoniem in het werkbestand).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="55"/>
        <source>The administrator&apos;s login that may create roles, as a libpq connection string or URI (default: the working file&apos;s server); its password comes from ~/.pgpass, PGPASSFILE or PGPASSWORD.</source>
        <translation>De aanmelding van de beheerder die rollen mag aanmaken, als libpq-verbindingstekst of URI (standaard: de server van het werkbestand); het wachtwoord komt uit ~/.pgpass, PGPASSFILE of PGPASSWORD.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="60"/>
        <source>The folder for a new person&apos;s password file (default: FILE.credentials beside the working file; created private if new).</source>
        <translation>De map voor het wachtwoordbestand van een nieuwe persoon (standaard: FILE.credentials naast het werkbestand; nieuw aangemaakt alleen voor u leesbaar).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="67"/>
        <source>The lead&apos;s working file of the team project.</source>
        <translation>Het werkbestand van de coördinator in het teamproject.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="69"/>
        <source>Add a person to a running team project (in the working file, on the server and as a login role with its own password file), or disable or enable one. Needs a lead of the project and the administrator&apos;s login.</source>
        <translation>Een persoon toevoegen aan een lopend teamproject (in het werkbestand, op de server en als aanmeldrol met een eigen wachtwoordbestand), of een persoon uit- of inschakelen. Vraagt een coördinator van het project en de aanmelding van de beheerder.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="80"/>
        <source>give exactly one of --add, --disable and --enable.</source>
        <translation>geef precies een van --add, --disable en --enable.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="157"/>
        <source>Added %1 with the login %2; the password is in %3 (hand it to them alone).</source>
        <translation>%1 toegevoegd met de aanmelding %2; het wachtwoord staat in %3 (geef het alleen aan die persoon).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="161"/>
        <source>Enabled %1: the login %2 may log in again.</source>
        <translation>%1 ingeschakeld: de aanmelding %2 mag weer aanmelden.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team_people.cpp" line="164"/>
        <source>Disabled %1: the login %2 may no longer log in; their codings stay.</source>
        <translation>%1 uitgeschakeld: de aanmelding %2 mag niet meer aanmelden; de coderingen blijven.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="304"/>
        <source>  people    Add a person to a running team project, or disable one.</source>
        <translation>  people    Een persoon toevoegen aan een lopend teamproject, of een persoon uitschakelen.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_assign.cpp" line="253"/>
        <source>Withdraw the committed subsample of this phase (reliability or pilot) while nobody has coded any of its assignments yet.</source>
        <translation>De vastgelegde deelsteekproef van deze fase (reliability of pilot) intrekken zolang nog niemand een van haar toewijzingen heeft gecodeerd.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/cli/command_assign.cpp" line="471"/>
        <source>The %1 subsample is withdrawn: %n assignment(s) removed.</source>
        <translation>
            <numerusform>De deelsteekproef van fase %1 is ingetrokken: %n toewijzing verwijderd.</numerusform>
            <numerusform>De deelsteekproef van fase %1 is ingetrokken: %n toewijzingen verwijderd.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/cli/command_frames.cpp" line="584"/>
        <source>Frames (k = %1, the largest mean silhouette: the three indices point at different k)</source>
        <translation>Frames (k = %1, het grootste gemiddelde silhouet: de drie indices wijzen verschillende k aan)</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="286"/>
        <source>The login that owns the team project&apos;s schema, as a libpq connection string: the administrator who published it.</source>
        <translation>De login die eigenaar is van het schema van het teamproject, als libpq-verbindingsreeks: de beheerder die het heeft gepubliceerd.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="294"/>
        <source>Bring a team project&apos;s server to the schema this version of Fourfold works with, in one transaction (a project published by an older version: its syncs and joins are refused until then).</source>
        <translation>Brengt de server van een teamproject in één transactie naar het schema waarmee deze versie van Fourfold werkt (een project dat door een oudere versie is gepubliceerd: synchronisaties en deelnames worden tot dan geweigerd).</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="303"/>
        <source>expected --server and no other argument.</source>
        <translation>verwacht --server en geen ander argument.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="313"/>
        <source>The team project on %1 has server schema version %2 already.</source>
        <translation>Het teamproject op %1 heeft al serverschemaversie %2.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="317"/>
        <source>Upgraded the team project on %1 from server schema version %2 to %3.</source>
        <translation>Het teamproject op %1 is bijgewerkt van serverschemaversie %2 naar %3.</translation>
    </message>
    <message>
        <location filename="../app/cli/command_team.cpp" line="352"/>
        <source>  upgrade   Bring a team project&apos;s server to this version&apos;s schema.</source>
        <translation>  upgrade   Brengt de server van een teamproject naar het schema van deze versie.</translation>
    </message>
</context>
<context>
    <name>fourfold::AnswerPanel</name>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="49"/>
        <source>Answers to article-level items</source>
        <translation>Antwoorden op items op artikelniveau</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="62"/>
        <source>Gold answer</source>
        <translation>Antwoord van de gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="63"/>
        <source>Gold &amp;answer:</source>
        <translation>&amp;Antwoord gouden standaard:</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="65"/>
        <source>Why this answer, for the method section</source>
        <translation>Waarom dit antwoord, voor de methodesectie</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="66"/>
        <source>Ra&amp;tionale:</source>
        <translation>Mo&amp;tivering:</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="69"/>
        <source>&amp;Decide gold answer</source>
        <translation>Antwoord gouden standaard &amp;vastleggen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="70"/>
        <source>Put the chosen value into gold as the answer to this item; it replaces a gold answer decided before</source>
        <translation>De gekozen waarde als antwoord op dit item in de gouden standaard opnemen; die vervangt een eerder vastgelegd antwoord van de gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="72"/>
        <source>&amp;Withdraw gold answer</source>
        <translation>Antwoord gouden standaard &amp;intrekken</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="73"/>
        <source>Withdraw the gold answer to this item</source>
        <translation>Het antwoord van de gouden standaard op dit item intrekken</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="97"/>
        <source>No article open.</source>
        <translation>Geen artikel geopend.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="140"/>
        <source>Item</source>
        <translation>Item</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="141"/>
        <source>Agreement</source>
        <translation>Overeenstemming</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="141"/>
        <source>Gold</source>
        <translation>Gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="153"/>
        <source>%1 has not answered</source>
        <translation>%1 heeft niet geantwoord</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="158"/>
        <source>no answers</source>
        <translation>geen antwoorden</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="161"/>
        <source>✓ agree</source>
        <translation>✓ eens</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="164"/>
        <source>agree, not all answered</source>
        <translation>eens, niet iedereen heeft geantwoord</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="167"/>
        <source>≠ differ</source>
        <translation>≠ verschillend</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="177"/>
        <source>Decided by %1.</source>
        <translation>Beslist door %1.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="178"/>
        <source>Decided by %1: “%2”</source>
        <translation>Beslist door %1: ‘%2’</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="183"/>
        <source>The codebook has no article-level items.</source>
        <translation>Het codeboek heeft geen items op artikelniveau.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/answer_panel.cpp" line="248"/>
        <source>%1 (given by %2)</source>
        <translation>%1 (door %2)</translation>
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
        <translation>klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="52"/>
        <source>in progress</source>
        <translation>bezig</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="53"/>
        <source>not started</source>
        <translation>niet begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="91"/>
        <source>%1
Near copy of %2</source>
        <translation>%1
Bijna-kopie van %2</translation>
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
        <translation>Taal</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="132"/>
        <source>Status</source>
        <translation>Status</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="134"/>
        <source>Time</source>
        <translation>Tijd</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="130"/>
        <source>Characters</source>
        <translation>Tekens</translation>
    </message>
</context>
<context>
    <name>fourfold::BackgroundSync</name>
    <message numerus="yes">
        <location filename="../app/desktop/team/background_sync.cpp" line="104"/>
        <source>offline — %n change(s) waiting</source>
        <translation>
            <numerusform>offline — %n wijziging wacht</numerusform>
            <numerusform>offline — %n wijzigingen wachten</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/team/background_sync.cpp" line="106"/>
        <source>syncing…</source>
        <translation>synchroniseren…</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/team/background_sync.cpp" line="110"/>
        <source>synced %n s ago</source>
        <translation>
            <numerusform>%n s geleden gesynchroniseerd</numerusform>
            <numerusform>%n s geleden gesynchroniseerd</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/team/background_sync.cpp" line="112"/>
        <source>conflict — lead decides</source>
        <translation>conflict — de coördinator beslist</translation>
    </message>
</context>
<context>
    <name>fourfold::CodebookEditor</name>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="79"/>
        <source>nominal</source>
        <translation>nominaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="81"/>
        <source>ordinal</source>
        <translation>ordinaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="83"/>
        <source>interval</source>
        <translation>interval</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="85"/>
        <source>ratio</source>
        <translation>ratio</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="274"/>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="344"/>
        <source>Codebook</source>
        <translation>Codeboek</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="281"/>
        <source>&amp;Name:</source>
        <translation>&amp;Naam:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="317"/>
        <source>Article-level items</source>
        <translation>Items op artikelniveau</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="322"/>
        <source>&amp;Undo:</source>
        <translation>&amp;Ongedaan maken:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="324"/>
        <source>&amp;Redo:</source>
        <translation>Opn&amp;ieuw:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="338"/>
        <source>&amp;Save as new version…</source>
        <translation>Opslaan als nieuwe &amp;versie…</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="344"/>
        <source>Codebook (changed)</source>
        <translation>Codeboek (gewijzigd)</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="348"/>
        <source>Edit the codebook&apos;s name</source>
        <translation>Naam van het codeboek bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="409"/>
        <source>Level of measurement: it decides which agreement coefficient compares the values (Krippendorff 2004, ch. 11).</source>
        <translation>Meetniveau: dit bepaalt welke overeenstemmingscoëfficiënt de waarden vergelijkt (Krippendorff 2004, hfst. 11).</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="425"/>
        <source>&amp;Label:</source>
        <translation>&amp;Label:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="428"/>
        <source>&amp;Definition:</source>
        <translation>&amp;Definitie:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="142"/>
        <source>One decision rule per paragraph (an empty line between two).</source>
        <translation>Eén beslisregel per alinea (een lege regel ertussen).</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="431"/>
        <source>Decision &amp;rules:</source>
        <translation>Beslis&amp;regels:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="147"/>
        <source>One example per paragraph (an empty line between two).</source>
        <translation>Eén voorbeeld per alinea (een lege regel ertussen).</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="154"/>
        <source>Base language</source>
        <translation>Basistaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="286"/>
        <source>Texts &amp;in:</source>
        <translation>Te&amp;ksten in:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="290"/>
        <source>The language whose texts the fields show and edit. Coders whose program speaks that language read these texts.</source>
        <translation>De taal waarvan de velden de teksten tonen en bewerken. Codeurs bij wie het programma die taal spreekt, lezen deze teksten.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="434"/>
        <source>E&amp;xamples:</source>
        <translation>Voor&amp;beelden:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="437"/>
        <source>Attributes of %1 spans</source>
        <translation>Kenmerken van %1-fragmenten</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="444"/>
        <source>&amp;Add attribute</source>
        <translation>Kenmerk &amp;toevoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="445"/>
        <source>Re&amp;move attribute</source>
        <translation>Kenmerk &amp;verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="454"/>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="591"/>
        <source>&amp;Key:</source>
        <translation>&amp;Sleutel:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="457"/>
        <source>La&amp;bel:</source>
        <translation>La&amp;bel:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="459"/>
        <source>closed list of values</source>
        <translation>gesloten lijst van waarden</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="460"/>
        <source>free text</source>
        <translation>vrije tekst</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="461"/>
        <source>&amp;Type:</source>
        <translation>&amp;Type:</translation>
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
        <translation>Eén waarde per regel, op volgorde.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="467"/>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="596"/>
        <source>&amp;Values:</source>
        <translation>&amp;Waarden:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="489"/>
        <source>Edit the label of %1</source>
        <translation>Label van %1 bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="496"/>
        <source>Edit the definition of %1</source>
        <translation>Definitie van %1 bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="503"/>
        <source>Edit the decision rules of %1</source>
        <translation>Beslisregels van %1 bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="510"/>
        <source>Edit the examples of %1</source>
        <translation>Voorbeelden van %1 bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="516"/>
        <source>Edit an attribute&apos;s key</source>
        <translation>Sleutel van een kenmerk bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="529"/>
        <source>Edit an attribute&apos;s label</source>
        <translation>Label van een kenmerk bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="538"/>
        <source>Change an attribute&apos;s type</source>
        <translation>Type van een kenmerk wijzigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="546"/>
        <source>Change an attribute&apos;s level</source>
        <translation>Niveau van een kenmerk wijzigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="551"/>
        <source>Edit an attribute&apos;s values</source>
        <translation>Waarden van een kenmerk bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="572"/>
        <source>Questions answered once per article, such as which function dominates it.</source>
        <translation>Vragen die één keer per artikel worden beantwoord, zoals welke functie erin overheerst.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="579"/>
        <source>&amp;Add item</source>
        <translation>Item &amp;toevoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="580"/>
        <source>Re&amp;move item</source>
        <translation>Item &amp;verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="593"/>
        <source>&amp;Question:</source>
        <translation>&amp;Vraag:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="615"/>
        <source>Edit an item&apos;s key</source>
        <translation>Sleutel van een item bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="629"/>
        <source>Edit an item&apos;s question</source>
        <translation>Vraag van een item bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="637"/>
        <source>Edit an item&apos;s values</source>
        <translation>Waarden van een item bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="643"/>
        <source>Change an item&apos;s level</source>
        <translation>Niveau van een item wijzigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="689"/>
        <source>%1 (%2)</source>
        <translation>%1 (%2)</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="733"/>
        <source>“%1” is not a language code: a codebook names a language by two or three lower-case letters (ISO 639), such as “fr” or “pl”.</source>
        <translation>‘%1’ is geen taalcode: een codeboek noemt een taal met twee of drie kleine letters (ISO 639), zoals ‘fr’ of ‘pl’.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="749"/>
        <source>Add a language</source>
        <translation>Taal toevoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="750"/>
        <source>Language code (ISO 639: two or three lower-case letters, such as “fr” or “pl”):</source>
        <translation>Taalcode (ISO 639: twee of drie kleine letters, zoals ‘fr’ of ‘pl’):</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="766"/>
        <source>Add a language…</source>
        <translation>Taal toevoegen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="770"/>
        <source>Showing the texts in %1. A field left empty shows the base text in grey, and coders read that one. Keys, values, levels and the lists of attributes and items are the same in every language: change them in the base language.</source>
        <translation>De teksten in %1 worden getoond. Een leeg gelaten veld toont de tekst in de basistaal in grijs, en die lezen de codeurs. Sleutels, waarden, niveaus en de lijsten van kenmerken en items zijn in elke taal dezelfde: wijzig ze in de basistaal.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="828"/>
        <source>Editing a draft of version %1; saving makes version %2.</source>
        <translation>U bewerkt een concept van versie %1; opslaan maakt versie %2.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="933"/>
        <source>Add an item</source>
        <translation>Een item toevoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="942"/>
        <source>Add an attribute to %1</source>
        <translation>Een kenmerk toevoegen aan %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="962"/>
        <source>Remove the item “%1”</source>
        <translation>Het item ‘%1’ verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="976"/>
        <source>Remove the attribute “%1”</source>
        <translation>Het kenmerk ‘%1’ verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1066"/>
        <source>The translation of this text may need updating too: %1 (choose the language under “Texts in”).</source>
        <translation>De vertaling van deze tekst moet misschien ook worden bijgewerkt: %1 (kies de taal bij ‘Teksten in’).</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1106"/>
        <source>Fix the marked field first.</source>
        <translation>Verbeter eerst het gemarkeerde veld.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1168"/>
        <source>Version %1 was added since this draft was started from version %2; nothing was saved. Close the editor and open it again to edit the new version.</source>
        <translation>Versie %1 is toegevoegd sinds dit concept vanuit versie %2 is begonnen; er is niets opgeslagen. Sluit de editor en open hem opnieuw om de nieuwe versie te bewerken.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1182"/>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1229"/>
        <source>The codebook was not saved: the marked field needs a change first.</source>
        <translation>Het codeboek is niet opgeslagen: het gemarkeerde veld moet eerst worden gewijzigd.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1187"/>
        <source>Nothing was saved: the draft is the same as version %1.</source>
        <translation>Er is niets opgeslagen: het concept is gelijk aan versie %1.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1214"/>
        <source>Codebook version %1 saved. %n annotation(s) made under an older version are now outdated; %2 of them belong to a function that changed and need a re-check.</source>
        <translation>
            <numerusform>Codeboekversie %1 opgeslagen. %n annotatie gemaakt onder een oudere versie is nu verouderd; %2 daarvan horen bij een gewijzigde functie en moeten opnieuw worden gecontroleerd.</numerusform>
            <numerusform>Codeboekversie %1 opgeslagen. %n annotaties gemaakt onder een oudere versie zijn nu verouderd; %2 daarvan horen bij een gewijzigde functie en moeten opnieuw worden gecontroleerd.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1233"/>
        <source>Save as version %1</source>
        <translation>Opslaan als versie %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1235"/>
        <source>What changes against version %1:</source>
        <translation>Wat er verandert ten opzichte van versie %1:</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook/codebook_editor.cpp" line="1241"/>
        <source>&amp;Note (what changed and why):</source>
        <translation>&amp;Notitie (wat er is veranderd en waarom):</translation>
    </message>
</context>
<context>
    <name>fourfold::CodebookPanel</name>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="22"/>
        <source>nominal</source>
        <translation>nominaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="24"/>
        <source>ordinal</source>
        <translation>ordinaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="26"/>
        <source>interval</source>
        <translation>interval</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="28"/>
        <source>ratio</source>
        <translation>ratio</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="56"/>
        <source>Codebook</source>
        <translation>Codeboek</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="58"/>
        <source>Framing function</source>
        <translation>Framingfunctie</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="64"/>
        <source>Codebook entry</source>
        <translation>Codeboekdefinitie</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="106"/>
        <source>No codebook loaded.</source>
        <translation>Geen codeboek geladen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="119"/>
        <source>%1, version %2</source>
        <translation>%1, versie %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="127"/>
        <source>Decision rules</source>
        <translation>Beslisregels</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="134"/>
        <source>Examples</source>
        <translation>Voorbeelden</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="139"/>
        <source>Attributes</source>
        <translation>Kenmerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="142"/>
        <source>None: marking the span is all this function asks for.</source>
        <translation>Geen: voor deze functie volstaat het om het fragment te markeren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="147"/>
        <source>free text</source>
        <translation>vrije tekst</translation>
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
        <translation>Wie codeert er?</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="23"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="221"/>
        <source>lead</source>
        <translation>coördinator</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="23"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="220"/>
        <source>coder</source>
        <translation>codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="64"/>
        <source>&lt;b&gt;%1&lt;/b&gt;&lt;br&gt;Choose who you are. A coder sees only their own spans and the articles assigned to them; a lead sees every article and gives their passphrase.</source>
        <translation>&lt;b&gt;%1&lt;/b&gt;&lt;br&gt;Kies wie u bent. Een codeur ziet alleen de eigen fragmenten en de aan hem of haar toegewezen artikelen; een coördinator ziet elk artikel en geeft de wachtwoordzin op.</translation>
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
        <translation>Herhaal hem:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="89"/>
        <source>Start coding</source>
        <translation>Beginnen met coderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="90"/>
        <source>Add a person…</source>
        <translation>Persoon toevoegen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="171"/>
        <source>%1 has no passphrase yet. Set one (at least %2 characters):</source>
        <translation>%1 heeft nog geen wachtwoordzin. Stel er een in (ten minste %2 tekens):</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="174"/>
        <source>Passphrase of %1:</source>
        <translation>Wachtwoordzin van %1:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="190"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="276"/>
        <source>The two passphrases differ; type the same one twice.</source>
        <translation>De twee wachtwoordzinnen verschillen; typ twee keer dezelfde.</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="208"/>
        <source>Add a person</source>
        <translation>Persoon toevoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="217"/>
        <source>e.g. C04 — the only name written to exports</source>
        <translation>bijv. C04 — de enige naam die in exports terechtkomt</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="224"/>
        <source>Name:</source>
        <translation>Naam:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="225"/>
        <source>Pseudonym:</source>
        <translation>Pseudoniem:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="226"/>
        <source>Role:</source>
        <translation>Rol:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="227"/>
        <source>New lead&apos;s passphrase:</source>
        <translation>Wachtwoordzin van de nieuwe coördinator:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="240"/>
        <source>Only a lead adds people. Choose your lead entry and give its passphrase.</source>
        <translation>Alleen een coördinator voegt personen toe. Kies uw coördinatorvermelding en geef de wachtwoordzin op.</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="243"/>
        <source>Added by:</source>
        <translation>Toegevoegd door:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="244"/>
        <source>Your passphrase:</source>
        <translation>Uw wachtwoordzin:</translation>
    </message>
</context>
<context>
    <name>fourfold::CoderLegend</name>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="15"/>
        <source>Coders of the spans shown</source>
        <translation>Codeurs van de getoonde fragmenten</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="21"/>
        <source>Each span&apos;s badge carries its coder&apos;s pseudonym after the letter.</source>
        <translation>Het label van elk fragment draagt na de letter het pseudoniem van de codeur.</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="23"/>
        <source>Show the spans of</source>
        <translation>Fragmenten tonen van</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="24"/>
        <source>&amp;Show spans of:</source>
        <translation>Fragmenten &amp;tonen van:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="46"/>
        <source>All coders</source>
        <translation>Alle codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="70"/>
        <source>unknown</source>
        <translation>onbekend</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/coder_legend.cpp" line="76"/>
        <source>&lt;b&gt;%1&lt;/b&gt; %n span(s)</source>
        <translation>
            <numerusform>&lt;b&gt;%1&lt;/b&gt; %n fragment</numerusform>
            <numerusform>&lt;b&gt;%1&lt;/b&gt; %n fragmenten</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="82"/>
        <source>No coder has spans on this article.</source>
        <translation>Geen codeur heeft fragmenten in dit artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_legend.cpp" line="83"/>
        <source>Spans by: %1</source>
        <translation>Fragmenten van: %1</translation>
    </message>
</context>
<context>
    <name>fourfold::CodingSession</name>
    <message>
        <location filename="../app/desktop/coding_session.cpp" line="156"/>
        <source>“%1” (%2), similarity %3</source>
        <translation>‘%1’ (%2), gelijkenis %3</translation>
    </message>
    <message>
        <location filename="../app/desktop/coding_session.cpp" line="250"/>
        <source>%1 is read-only: you can read, compare and compute, but nothing is saved. To code, copy the file to a folder you may write to and open the copy.</source>
        <translation>%1 is alleen-lezen: u kunt lezen, vergelijken en berekenen, maar er wordt niets opgeslagen. Kopieer het bestand om te coderen naar een map waarin u mag schrijven en open de kopie.</translation>
    </message>
</context>
<context>
    <name>fourfold::ComparisonView</name>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="35"/>
        <source>Coders side by side</source>
        <translation>Codeurs naast elkaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="187"/>
        <source>only one coder has a span here</source>
        <translation>slechts één codeur heeft hier een fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="188"/>
        <source>not every coder has a span here</source>
        <translation>niet elke codeur heeft hier een fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="190"/>
        <source>different functions</source>
        <translation>verschillende functies</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="192"/>
        <source>different boundaries</source>
        <translation>verschillende grenzen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="194"/>
        <source>different attributes</source>
        <translation>verschillende kenmerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="195"/>
        <source>The coders agree here.</source>
        <translation>De codeurs zijn het hier eens.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="196"/>
        <source>Disagreement: %1.</source>
        <translation>Verschil: %1.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="196"/>
        <source>; </source>
        <translation>; </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="198"/>
        <source>Decided.</source>
        <translation>Beslist.</translation>
    </message>
</context>
<context>
    <name>fourfold::ComparisonWindow</name>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="95"/>
        <source>Compare coders and decide gold — %1</source>
        <translation>Codeurs vergelijken en gouden standaard beslissen — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="97"/>
        <source>Only a lead compares coders and decides the gold standard. Open the project as a lead to use this window.</source>
        <translation>Alleen een coördinator vergelijkt codeurs en beslist over de gouden standaard. Open het project als coördinator om dit venster te gebruiken.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="121"/>
        <source>Nothing to compare yet. An article comes here once at least two coders have coded it and marked it done (or tick “Articles in progress” above). Plan double coding in Lead → Study design; the progress board shows who is done.</source>
        <translation>Nog niets te vergelijken. Een artikel verschijnt hier zodra ten minste twee codeurs het hebben gecodeerd en als klaar hebben gemarkeerd (of vink hierboven ‘Artikelen in bewerking’ aan). Plan dubbele codering in Coördinator → Onderzoeksopzet; het voortgangsoverzicht toont wie klaar is.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="183"/>
        <source>Articles to adjudicate</source>
        <translation>Te beslissen artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="202"/>
        <source>Margin: ∅ a coder has no span here · ≠ different functions · ↔ different boundaries · ≈ different attributes · ✓ decided. Lanes under each line: problem (solid), cause (dashed), evaluation (dotted), remedy (dash-dot). Hatched: this coder has no span in the passage.</source>
        <translation>Marge: ∅ een codeur heeft hier geen fragment · ≠ verschillende functies · ↔ verschillende grenzen · ≈ verschillende kenmerken · ✓ beslist. Banen onder elke regel: probleem (doorgetrokken), oorzaak (gestreept), evaluatie (gestippeld), oplossing (streep-punt). Gearceerd: deze codeur heeft geen fragment in de passage.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="239"/>
        <source>Who</source>
        <translation>Wie</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="239"/>
        <source>Span</source>
        <translation>Fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="239"/>
        <source>Decision</source>
        <translation>Beslissing</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="244"/>
        <source>Spans of the passage</source>
        <translation>Fragmenten van de passage</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="255"/>
        <source>&amp;Rationale (optional, kept with the decision):</source>
        <translation>&amp;Motivering (optioneel, wordt bij de beslissing bewaard):</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="257"/>
        <source>Why this decision, for the method section</source>
        <translation>Waarom deze beslissing, voor de methodesectie</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="184"/>
        <source>Articles coded by several coders, most undecided disagreements first when sorted; the order is kept while you decide until you re-sort. Open: undecided disagreements; Agreed: passages all coders agree on that are not yet in gold.</source>
        <translation>Artikelen die door meerdere codeurs zijn gecodeerd, gesorteerd met de meeste onbesliste verschillen eerst; terwijl je beslist blijft de volgorde staan tot je opnieuw sorteert. Open: onbesliste verschillen; Eens: passages waarover alle codeurs het eens zijn en die nog niet in de gouden standaard staan.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="275"/>
        <source>Keys: N / P next and previous disagreement, %1 / %2 next and previous article, %3 re-sort the queue; A accept the chosen span, M merge the chosen spans, E edit, R reject, W withdraw a gold span; %4 accept all agreed; %5 rationale; %6 undo; %7 every key.</source>
        <translation>Toetsen: N / P volgend en vorig verschil, %1 / %2 volgend en vorig artikel, %3 de wachtrij opnieuw sorteren; A het gekozen fragment accepteren, M de gekozen fragmenten samenvoegen, E bewerken, R verwerpen, W een fragment uit de gouden standaard terugtrekken; %4 alle overeenstemmende accepteren; %5 motivering; %6 ongedaan maken; %7 alle toetsen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="312"/>
        <source>Comparison</source>
        <translation>Vergelijking</translation>
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
        <translation>Functie: </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="334"/>
        <source>All functions</source>
        <translation>Alle functies</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="337"/>
        <source>Function filter</source>
        <translation>Functiefilter</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="343"/>
        <source>  Coders: </source>
        <translation>  Codeurs: </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="345"/>
        <source>All coders</source>
        <translation>Alle codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="352"/>
        <source>%1 and %2</source>
        <translation>%1 en %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="354"/>
        <source>Coder pair filter</source>
        <translation>Filter op codeurspaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="360"/>
        <source>Show decided</source>
        <translation>Besliste tonen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="361"/>
        <source>Also step through disagreements already decided</source>
        <translation>Ook langs verschillen gaan die al beslist zijn</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="364"/>
        <source>Articles in progress</source>
        <translation>Artikelen in bewerking</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="365"/>
        <source>Also compare coders on articles they have started but not yet marked done</source>
        <translation>Vergelijk codeurs ook op artikelen die ze begonnen maar nog niet als klaar gemarkeerd hebben</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="367"/>
        <source>Show articles in progress</source>
        <translation>Artikelen in bewerking tonen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="375"/>
        <source>Previous</source>
        <translation>Vorige</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="376"/>
        <source>Previous undecided disagreement</source>
        <translation>Vorig onbeslist verschil</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="377"/>
        <source>Next</source>
        <translation>Volgende</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="378"/>
        <source>Next undecided disagreement</source>
        <translation>Volgend onbeslist verschil</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="379"/>
        <source>Previous article</source>
        <translation>Vorig artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="380"/>
        <source>Previous article in the queue</source>
        <translation>Vorig artikel in de wachtrij</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="386"/>
        <source>Next article</source>
        <translation>Volgend artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="386"/>
        <source>Next article in the queue</source>
        <translation>Volgend artikel in de wachtrij</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="391"/>
        <source>Re-sort queue</source>
        <translation>Wachtrij opnieuw sorteren</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="392"/>
        <source>Sort the queue again, most undecided disagreements first; until then it keeps its order while you decide</source>
        <translation>De wachtrij opnieuw sorteren, de meeste onbesliste verschillen eerst; tot dan houdt ze haar volgorde terwijl je beslist</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="401"/>
        <source>Accept</source>
        <translation>Accepteren</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="402"/>
        <source>Accept the chosen coder&apos;s span into gold</source>
        <translation>Het fragment van de gekozen codeur in de gouden standaard opnemen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="403"/>
        <source>Merge</source>
        <translation>Samenvoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="404"/>
        <source>Put one span covering the chosen spans into gold</source>
        <translation>Eén fragment dat de gekozen fragmenten omvat in de gouden standaard opnemen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="405"/>
        <source>Edit…</source>
        <translation>Bewerken…</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="406"/>
        <source>Decide a gold span with a function and boundaries of your own</source>
        <translation>Een fragment voor de gouden standaard vastleggen met een eigen functie en eigen grenzen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="408"/>
        <source>Reject</source>
        <translation>Verwerpen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="409"/>
        <source>Record that the chosen spans do not belong in gold</source>
        <translation>Vastleggen dat de gekozen fragmenten niet in de gouden standaard horen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="410"/>
        <source>Withdraw gold</source>
        <translation>Terugtrekken</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="411"/>
        <source>Withdraw the chosen gold span</source>
        <translation>Het gekozen fragment uit de gouden standaard terugtrekken</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="412"/>
        <source>Accept all agreed</source>
        <translation>Alle overeenstemmende accepteren</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="413"/>
        <source>Accept every span all coders of the article agree on</source>
        <translation>Elk fragment accepteren waarover alle codeurs van het artikel het eens zijn</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="419"/>
        <source>Undo</source>
        <translation>Ongedaan maken</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="421"/>
        <source>Redo</source>
        <translation>Opnieuw</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="435"/>
        <source>Keys of the comparison window</source>
        <translation>Toetsen van het vergelijkingsvenster</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/compare/comparison_window.cpp" line="489"/>
        <source>%n article(s) to adjudicate</source>
        <translation>
            <numerusform>%n artikel om te beslissen</numerusform>
            <numerusform>%n artikelen om te beslissen</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="497"/>
        <source>Queue sorted again: most undecided disagreements first.</source>
        <translation>Wachtrij opnieuw gesorteerd: de meeste onbesliste verschillen eerst.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="579"/>
        <source>Gold (%1)</source>
        <translation>Gouden standaard (%1)</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="579"/>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="736"/>
        <source>Gold</source>
        <translation>Gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="640"/>
        <source>No undecided disagreement left in this article. %1 opens the next article.</source>
        <translation>Geen onbeslist verschil meer in dit artikel. %1 opent het volgende artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="657"/>
        <source>No undecided disagreement left in this article.</source>
        <translation>Geen onbeslist verschil meer in dit artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="673"/>
        <source>No spans to compare in this article.</source>
        <translation>Geen fragmenten om te vergelijken in dit artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="674"/>
        <source>Click a passage or press N for the next disagreement.</source>
        <translation>Klik op een passage of druk op N voor het volgende verschil.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="684"/>
        <source>no span by %1</source>
        <translation>geen fragment van %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="687"/>
        <source>different functions</source>
        <translation>verschillende functies</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="689"/>
        <source>different boundaries</source>
        <translation>verschillende grenzen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="691"/>
        <source>different attributes</source>
        <translation>verschillende kenmerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="703"/>
        <source>Passage %1 of %2 (paragraph %3): %4%5</source>
        <translation>Passage %1 van %2 (alinea %3): %4%5</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="707"/>
        <source>the coders agree</source>
        <translation>de codeurs zijn het eens</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="707"/>
        <source>; </source>
        <translation>; </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="708"/>
        <source> — decided</source>
        <translation> — beslist</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="727"/>
        <source>Characters %1 to %2</source>
        <translation>Tekens %1 tot %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="728"/>
        <source>rejected</source>
        <translation>verworpen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="728"/>
        <source>in gold</source>
        <translation>in gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="744"/>
        <source>drawn by the lead</source>
        <translation>getekend door de coördinator</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="744"/>
        <source>from %1</source>
        <translation>van %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="746"/>
        <source>Decided by %1 at %2.%3</source>
        <translation>Beslist door %1 op %2.%3</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="748"/>
        <source> Rationale: %1</source>
        <translation> Motivering: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="756"/>
        <source>Gold %1 decided by %2 at %3%4</source>
        <translation>Gouden standaard %1 beslist door %2 op %3%4</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="864"/>
        <source>%1. Undo with %2.</source>
        <translation>%1. Ongedaan maken met %2.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="892"/>
        <source>Choose one coder&apos;s span to accept (or several to merge).</source>
        <translation>Kies het fragment van één codeur om te accepteren (of meerdere om samen te voegen).</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="920"/>
        <source>Choose a passage first.</source>
        <translation>Kies eerst een passage.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="959"/>
        <source>Choose the spans to reject (that are not rejected yet).</source>
        <translation>Kies de fragmenten om te verwerpen (die nog niet verworpen zijn).</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="971"/>
        <source>Choose one gold span to withdraw.</source>
        <translation>Kies één fragment uit de gouden standaard om terug te trekken.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="1017"/>
        <source>There is no agreed passage left to accept in this article.</source>
        <translation>Er is in dit artikel geen overeenstemmende passage meer om te accepteren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="261"/>
        <source>Answers to article-level items</source>
        <translation>Antwoorden op items op artikelniveau</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="997"/>
        <source>Choose an item with a gold answer to withdraw.</source>
        <translation>Kies een item met een antwoord van de gouden standaard om in te trekken.</translation>
    </message>
</context>
<context>
    <name>fourfold::ConflictsWindow</name>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="47"/>
        <source>Merge conflicts — %1</source>
        <translation>Samenvoegconflicten — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="50"/>
        <source>A conflict is a coder&apos;s span, answer or link that was changed both in the project and in a coder copy (or on the team server). The later change was kept; the other version waits here. Keep the project&apos;s version or take the other one: each decision can be undone with Edit → Undo.</source>
        <translation>Een conflict is een fragment, antwoord of koppeling van een codeur dat zowel in het project als in een codeurskopie (of op de teamserver) is gewijzigd. De latere wijziging is behouden; de andere versie wacht hier. Behoud de versie van het project of neem de andere: elke beslissing kan met Bewerken → Ongedaan maken worden teruggedraaid.</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="57"/>
        <source>Show decided conflicts</source>
        <translation>Besliste conflicten tonen</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="62"/>
        <source>Coder</source>
        <translation>Codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="62"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="62"/>
        <source>What</source>
        <translation>Wat</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="63"/>
        <source>Other version from</source>
        <translation>Andere versie van</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="63"/>
        <source>Found</source>
        <translation>Gevonden</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="63"/>
        <source>Decision</source>
        <translation>Beslissing</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="69"/>
        <source>Conflicts</source>
        <translation>Conflicten</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="85"/>
        <source>In the project now</source>
        <translation>Nu in het project</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="85"/>
        <source>&amp;Keep the project&apos;s version</source>
        <translation>Versie van het project &amp;behouden</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="86"/>
        <source>The other version</source>
        <translation>De andere versie</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="86"/>
        <source>&amp;Take the other version</source>
        <translation>Andere versie &amp;overnemen</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="134"/>
        <source>%1 span</source>
        <translation>%1-fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="136"/>
        <source>answer to %1</source>
        <translation>antwoord op %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="138"/>
        <source>withdrawn assignment, coded in a copy</source>
        <translation>ingetrokken toewijzing, gecodeerd in een kopie</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="140"/>
        <source>project&apos;s version kept</source>
        <translation>versie van het project behouden</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="141"/>
        <source>other version taken</source>
        <translation>andere versie overgenomen</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="142"/>
        <source>open</source>
        <translation>open</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="145"/>
        <source>the project</source>
        <translation>het project</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="146"/>
        <source>the team server</source>
        <translation>de teamserver</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="147"/>
        <source>copy %1</source>
        <translation>kopie %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="162"/>
        <source>?</source>
        <translation>?</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="184"/>
        <source>&lt;p&gt;&lt;i&gt;(none)&lt;/i&gt;&lt;/p&gt;</source>
        <translation>&lt;p&gt;&lt;i&gt;(geen)&lt;/i&gt;&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="187"/>
        <source>&lt;p&gt;&lt;b&gt;Deleted&lt;/b&gt;&lt;/p&gt;</source>
        <translation>&lt;p&gt;&lt;b&gt;Verwijderd&lt;/b&gt;&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="203"/>
        <source>&lt;p&gt;Note: %1&lt;/p&gt;</source>
        <translation>&lt;p&gt;Notitie: %1&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="205"/>
        <source>&lt;p&gt;Confidence: %1&lt;/p&gt;</source>
        <translation>&lt;p&gt;Betrouwbaarheidsscore: %1&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="207"/>
        <source>&lt;p&gt;Answer to %1: &lt;b&gt;%2&lt;/b&gt;&lt;/p&gt;</source>
        <translation>&lt;p&gt;Antwoord op %1: &lt;b&gt;%2&lt;/b&gt;&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="212"/>
        <source>&lt;p&gt;Status: &lt;b&gt;%1&lt;/b&gt;&lt;/p&gt;</source>
        <translation>&lt;p&gt;Status: &lt;b&gt;%1&lt;/b&gt;&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="214"/>
        <source>&lt;p&gt;Link: &lt;b&gt;%1&lt;/b&gt;&lt;/p&gt;</source>
        <translation>&lt;p&gt;Koppeling: &lt;b&gt;%1&lt;/b&gt;&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="218"/>
        <source>&lt;p&gt;&lt;small&gt;Changed %1&lt;/small&gt;&lt;/p&gt;</source>
        <translation>&lt;p&gt;&lt;small&gt;Gewijzigd %1&lt;/small&gt;&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="234"/>
        <source>No merge has found a conflict.</source>
        <translation>Geen enkele samenvoeging heeft een conflict gevonden.</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="235"/>
        <source>No conflicts wait for a decision.</source>
        <translation>Er wachten geen conflicten op een beslissing.</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="245"/>
        <source>&lt;p&gt;The project withdrew this assignment (a withdrawn draw) while %1 coded the article in a copy; the codings are in the project, but they do not count while the assignment stays withdrawn. Keep the project&apos;s version to leave it withdrawn, or take this version to assign the article to %1 again.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Het project heeft deze toewijzing ingetrokken (een ingetrokken trekking) terwijl %1 het artikel in een kopie codeerde; de coderingen staan in het project, maar tellen niet mee zolang de toewijzing ingetrokken blijft. Behoud de versie van het project om haar ingetrokken te laten, of neem deze versie over om het artikel opnieuw aan %1 toe te wijzen.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="269"/>
        <source>Choose an open conflict first.</source>
        <translation>Kies eerst een open conflict.</translation>
    </message>
    <message>
        <location filename="../app/desktop/conflicts/conflicts_window.cpp" line="285"/>
        <source>%1. Undo with Edit → Undo.</source>
        <translation>%1. Ongedaan maken met Bewerken → Ongedaan maken.</translation>
    </message>
</context>
<context>
    <name>fourfold::DendrogramView</name>
    <message>
        <location filename="../app/desktop/frames/dendrogram_view.cpp" line="84"/>
        <source>No tree yet.</source>
        <translation>Nog geen boom.</translation>
    </message>
</context>
<context>
    <name>fourfold::DisagreementQueueModel</name>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="74"/>
        <source>%1 passages: %2 with a disagreement (%3 undecided), %4 agreed and not yet in gold. Only one coder or not all: %5; function: %6; boundaries: %7; attributes: %8.</source>
        <translation>%1 passages: %2 met een verschil (%3 onbeslist), %4 overeenstemmend en nog niet in de gouden standaard. Slechts één codeur of niet alle: %5; functie: %6; grenzen: %7; kenmerken: %8.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="96"/>
        <source>Passages with a disagreement not yet decided</source>
        <translation>Passages met een verschil waarover nog niet is beslist</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="98"/>
        <source>Passages with a disagreement, decided or not</source>
        <translation>Passages met een verschil, beslist of niet</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="100"/>
        <source>Passages all coders agree on that are not yet in gold</source>
        <translation>Passages waarover alle codeurs het eens zijn en die nog niet in de gouden standaard staan</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="109"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="111"/>
        <source>Open</source>
        <translation>Open</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="113"/>
        <source>All</source>
        <translation>Alle</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="115"/>
        <source>Agreed</source>
        <translation>Eens</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="117"/>
        <source>Coders</source>
        <translation>Codeurs</translation>
    </message>
</context>
<context>
    <name>fourfold::ExtractorWindow</name>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="97"/>
        <source>Extractor runs</source>
        <translation>Extractorruns</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="107"/>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>Function</source>
        <translation>Functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="107"/>
        <source>Precision</source>
        <translation>Precisie</translation>
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
        <translation>F1 95%-BI</translation>
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
        <translation>α run–codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="109"/>
        <source>Coders&apos; band</source>
        <translation>Bandbreedte codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="109"/>
        <source>Run vs band</source>
        <translation>Run t.o.v. band</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="110"/>
        <source>Correct: the run&apos;s span matches</source>
        <translation>Correct: het fragment van de run komt overeen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="112"/>
        <source>Incorrect: matched, but the boundaries or the function differ (strict/exact/type)</source>
        <translation>Incorrect: gekoppeld, maar de grenzen of de functie verschillen (strikt/exact/type)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="114"/>
        <source>Partial: matched with other boundaries (partial mode; counts half)</source>
        <translation>Gedeeltelijk: gekoppeld met andere grenzen (gedeeltelijke modus; telt half)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="115"/>
        <source>Missing: a reference span the run missed</source>
        <translation>Ontbrekend: een referentiefragment dat de run heeft gemist</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="117"/>
        <source>Spurious: a run span with no reference span (false positive)</source>
        <translation>Onterecht: een fragment van de run zonder referentiefragment (fout-positief)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="119"/>
        <source>Mean Krippendorff&apos;s alpha (nominal) of the run with each coder, per unit</source>
        <translation>Gemiddelde Krippendorffs alfa (nominaal) van de run met elke codeur, per eenheid</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="121"/>
        <source>Lowest to highest alpha of the pairs of human coders</source>
        <translation>Laagste tot hoogste alfa van de paren menselijke codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="127"/>
        <source>Scores</source>
        <translation>Scores</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="129"/>
        <source>Errors</source>
        <translation>Fouten</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="150"/>
        <source>Function confusion</source>
        <translation>Functieverwarring</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="184"/>
        <source>&lt;b&gt;Runs&lt;/b&gt; — select one or more to compare</source>
        <translation>&lt;b&gt;Runs&lt;/b&gt; — selecteer er een of meer om te vergelijken</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Name</source>
        <translation>Naam</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Version</source>
        <translation>Versie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Made</source>
        <translation>Gemaakt</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Parameters</source>
        <translation>Parameters</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Spans</source>
        <translation>Fragmenten</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="203"/>
        <source>What the runs are scored against: gold or one coder</source>
        <translation>Waartegen de runs worden gescoord: de gouden standaard of één codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="204"/>
        <source>&amp;Reference</source>
        <translation>&amp;Referentie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="207"/>
        <source>Strict — same boundaries and function</source>
        <translation>Strikt — dezelfde grenzen en functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="208"/>
        <source>Exact — same boundaries, any function</source>
        <translation>Exact — dezelfde grenzen, elke functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="209"/>
        <source>Partial — overlap counts half</source>
        <translation>Gedeeltelijk — overlap telt half</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="210"/>
        <source>Type — same function, any overlap</source>
        <translation>Type — dezelfde functie, elke overlap</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="214"/>
        <source>&amp;Matching</source>
        <translation>&amp;Vergelijkingswijze</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="217"/>
        <source>Sentence</source>
        <translation>Zin</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="218"/>
        <source>Paragraph</source>
        <translation>Alinea</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="219"/>
        <source>Token (word)</source>
        <translation>Token (woord)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="223"/>
        <source>The unit on which the run&apos;s alpha with the coders is computed</source>
        <translation>De eenheid waarop de alfa van de run met de codeurs wordt berekend</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="224"/>
        <source>&amp;Unit for alpha</source>
        <translation>&amp;Eenheid voor alfa</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>Reference spans</source>
        <translation>Referentiefragmenten</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>Run spans</source>
        <translation>Fragmenten van de run</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>False positives</source>
        <translation>Fout-positieven</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="264"/>
        <source>Misses</source>
        <translation>Gemiste</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="264"/>
        <source>Wrong function</source>
        <translation>Verkeerde functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="264"/>
        <source>Boundary</source>
        <translation>Grens</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="265"/>
        <source>Click a count to list those errors</source>
        <translation>Klik op een aantal om die fouten te tonen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="274"/>
        <source>All functions</source>
        <translation>Alle functies</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="279"/>
        <source>Every kind of error</source>
        <translation>Elk soort fout</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="284"/>
        <source>Article or text…</source>
        <translation>Artikel of tekst…</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="286"/>
        <source>&amp;Show</source>
        <translation>&amp;Tonen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="309"/>
        <source>Double-click or press Enter to open the passage</source>
        <translation>Dubbelklik of druk op Enter om de passage te openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="332"/>
        <source>Gold</source>
        <translation>Gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="338"/>
        <source>Coder %1</source>
        <translation>Codeur %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="376"/>
        <source>?</source>
        <translation>?</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="387"/>
        <source>This project has no extractor runs yet. Make one with “fourfold-cli extract”, or import an extractor&apos;s spans with it.</source>
        <translation>Dit project heeft nog geen extractorruns. Maak er een met ‘fourfold-cli extract’, of importeer er de fragmenten van een extractor mee.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="419"/>
        <source>No run selected.</source>
        <translation>Geen run geselecteerd.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="423"/>
        <source>&lt;b&gt;%1&lt;/b&gt;, version %2, made %3, %4 spans&lt;br&gt;%5</source>
        <translation>&lt;b&gt;%1&lt;/b&gt;, versie %2, gemaakt %3, %4 fragmenten&lt;br&gt;%5</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="475"/>
        <source>Select a run to score.</source>
        <translation>Selecteer een run om te scoren.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="481"/>
        <source>Scoring %n run(s)…</source>
        <translation>
            <numerusform>%n run wordt gescoord…</numerusform>
            <numerusform>%n runs worden gescoord…</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="533"/>
        <source>gold</source>
        <translation>de gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="533"/>
        <source>coder %1</source>
        <translation>codeur %1</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="544"/>
        <source>%n article(s) with %1 scored.</source>
        <translation>
            <numerusform>%n artikel met %1 gescoord.</numerusform>
            <numerusform>%n artikelen met %1 gescoord.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="592"/>
        <source>Precision %1, recall %2 (95% bootstrap intervals)</source>
        <translation>Precisie %1, recall %2 (95%-bootstrapintervallen)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="611"/>
        <source>▼ below</source>
        <translation>▼ eronder</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="613"/>
        <source>● inside</source>
        <translation>● binnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="615"/>
        <source>▲ above</source>
        <translation>▲ erboven</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="617"/>
        <source>undefined</source>
        <translation>niet gedefinieerd</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="636"/>
        <source>Micro</source>
        <translation>Micro</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="638"/>
        <source>Macro</source>
        <translation>Macro</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="641"/>
        <source>%1: alpha on %n unit(s) (%2) with coders %3.</source>
        <translation>
            <numerusform>%1: alfa op %n eenheid (%2) met codeurs %3.</numerusform>
            <numerusform>%1: alfa op %n eenheden (%2) met codeurs %3.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="646"/>
        <source>%1: no band with the coders — %2</source>
        <translation>%1: geen band met de codeurs — %2</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="649"/>
        <source>Scored against %1, %2 matching; intervals from %n bootstrap replicate(s) over articles.</source>
        <translation>
            <numerusform>Gescoord tegen %1, vergelijkingswijze %2; intervallen uit %n bootstrapreplicatie over artikelen.</numerusform>
            <numerusform>Gescoord tegen %1, vergelijkingswijze %2; intervallen uit %n bootstrapreplicaties over artikelen.</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="666"/>
        <source>Errors of run &lt;b&gt;%1&lt;/b&gt; against %2 (%3 matching) on %n article(s). Double-click an error to see its passage.</source>
        <translation>
            <numerusform>Fouten van run &lt;b&gt;%1&lt;/b&gt; tegen %2 (vergelijkingswijze %3) in %n artikel. Dubbelklik op een fout om de passage te zien.</numerusform>
            <numerusform>Fouten van run &lt;b&gt;%1&lt;/b&gt; tegen %2 (vergelijkingswijze %3) in %n artikelen. Dubbelklik op een fout om de passage te zien.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="672"/>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="728"/>
        <source>No run scored.</source>
        <translation>Geen run gescoord.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="686"/>
        <source>All</source>
        <translation>Alle</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="716"/>
        <source>reference</source>
        <translation>referentie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="721"/>
        <source>None (false positive)</source>
        <translation>Geen (fout-positief)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="722"/>
        <source>None (miss)</source>
        <translation>Geen (gemist)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="733"/>
        <source>Rows: the function %1 gives a span; columns: the function run &lt;b&gt;%2&lt;/b&gt; gives it (%3 matching). The diagonal is agreement on the function.</source>
        <translation>Rijen: de functie die %1 aan een fragment geeft; kolommen: de functie die run &lt;b&gt;%2&lt;/b&gt; eraan geeft (vergelijkingswijze %3). De diagonaal is overeenstemming over de functie.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="781"/>
        <source>%1 %2 → run %3: %4</source>
        <translation>%1 %2 → run %3: %4</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="787"/>
        <source>The run gives no matched span another function.</source>
        <translation>De run geeft geen enkel gekoppeld fragment een andere functie.</translation>
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
        <translation>Framekaart</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="241"/>
        <source>— nothing coded yet</source>
        <translation>— nog niets gecodeerd</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="313"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="314"/>
        <source>%1, coded by %2: %3</source>
        <translation>%1, gecodeerd door %2: %3</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frame_card.cpp" line="330"/>
        <source>%n span(s)</source>
        <translation>
            <numerusform>%n fragment</numerusform>
            <numerusform>%n fragmenten</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frame_card.cpp" line="332"/>
        <source>%1: %n span(s)</source>
        <translation>
            <numerusform>%1: %n fragment</numerusform>
            <numerusform>%1: %n fragmenten</numerusform>
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
        <translation>Gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="79"/>
        <source>Consensus of the coders</source>
        <translation>Consensus van de codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="84"/>
        <source>Coder %1</source>
        <translation>Codeur %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="87"/>
        <source>Extractor run %1</source>
        <translation>Extractorrun %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="88"/>
        <source>Layer</source>
        <translation>Laag</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="91"/>
        <source>where the indices point</source>
        <translation>waar de indices naar wijzen</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="92"/>
        <source>Number of frames</source>
        <translation>Aantal frames</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="96"/>
        <source>Largest k for the indices</source>
        <translation>Grootste k voor de indices</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="100"/>
        <source>none</source>
        <translation>geen</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="101"/>
        <source>Bootstrap replicates</source>
        <translation>Bootstrapreplicaties</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="105"/>
        <source>Start value of the bootstrap</source>
        <translation>Seed van de bootstrap</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="106"/>
        <source>&amp;Compute</source>
        <translation>&amp;Berekenen</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="107"/>
        <source>Cancel</source>
        <translation>Annuleren</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="112"/>
        <source>&amp;Layer:</source>
        <translation>&amp;Laag:</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="115"/>
        <source>&amp;Frames (k):</source>
        <translation>&amp;Frames (k):</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="119"/>
        <source>Indices up to k =</source>
        <translation>Indices tot k =</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="123"/>
        <source>&amp;Stability replicates:</source>
        <translation>&amp;Stabiliteitsreplicaties:</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="127"/>
        <source>start value:</source>
        <translation>seed:</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="157"/>
        <source>Ward&apos;s tree: the last %1 merges (each leaf: its number of articles; dashed: the cut into the chosen k)</source>
        <translation>Boom van Ward: de laatste %1 samenvoegingen (elk blad: het aantal artikelen; gestreept: de snede in de gekozen k)</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="174"/>
        <source>Choosing &amp;k</source>
        <translation>Keuze van &amp;k</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="184"/>
        <source>Frames</source>
        <translation>Frames</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="185"/>
        <source>Element profile of each frame</source>
        <translation>Elementprofiel van elk frame</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="187"/>
        <source>Share of each frame&apos;s articles holding the element, beside the share in all articles; bold: the element characterises the frame (adjusted residual above 1.96).</source>
        <translation>Aandeel van de artikelen van elk frame dat het element bevat, naast het aandeel in alle artikelen; vet: het element kenmerkt het frame (gecorrigeerd residu boven 1.96).</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="194"/>
        <source>F&amp;rames</source>
        <translation>F&amp;rames</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="199"/>
        <source>By outlet</source>
        <translation>Naar medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="200"/>
        <source>By month</source>
        <translation>Naar maand</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="212"/>
        <source>By &amp;outlet and month</source>
        <translation>Naar &amp;medium en maand</translation>
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
        <translation>Dubbelklik op een artikel om het te openen om te coderen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="227"/>
        <source>Articles of the frame</source>
        <translation>Artikelen van het frame</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="229"/>
        <source>&amp;Articles</source>
        <translation>&amp;Artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="234"/>
        <location filename="../app/desktop/frames/frames_window.cpp" line="235"/>
        <source>Name of the analysis</source>
        <translation>Naam van de analyse</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="236"/>
        <source>Sa&amp;ve frames</source>
        <translation>Frames &amp;opslaan</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="238"/>
        <source>Saved analyses</source>
        <translation>Opgeslagen analyses</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="240"/>
        <source>O&amp;pen</source>
        <translation>O&amp;penen</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="241"/>
        <source>&amp;Delete</source>
        <translation>&amp;Verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="242"/>
        <source>Save as:</source>
        <translation>Opslaan als:</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="248"/>
        <source>Saved:</source>
        <translation>Opgeslagen:</translation>
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
        <translation>Kies een laag en het aantal frames en klik dan op Berekenen. De gouden standaard is de gebruikelijke laag; de consensus van de codeurs of één codeur dienen zolang over de gouden standaard nog niet is beslist.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="344"/>
        <source>Computing the frames…</source>
        <translation>De frames worden berekend…</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="372"/>
        <source>Cancelled; the frames shown are from before.</source>
        <translation>Geannuleerd; de getoonde frames zijn de vorige.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="372"/>
        <source>Cancelled.</source>
        <translation>Geannuleerd.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="376"/>
        <source>%1

Adjudicate more articles into gold (Lead → Compare and adjudicate…), or choose the consensus of the coders or one coder as the layer above.</source>
        <translation>%1

Beslis meer artikelen in de gouden standaard (Coördinator → Vergelijken en beslissen…) of kies hierboven de consensus van de codeurs of één codeur als laag.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="420"/>
        <source>k-choice indices, each relative to its largest value</source>
        <translation>k-keuze-indices, elk ten opzichte van de eigen grootste waarde</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="422"/>
        <source>k (frames)</source>
        <translation>k (frames)</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="425"/>
        <source>share of the largest value</source>
        <translation>aandeel van de grootste waarde</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="446"/>
        <source>mean silhouette</source>
        <translation>gemiddeld silhouet</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="448"/>
        <source>Calinski–Harabasz</source>
        <translation>Calinski–Harabasz</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="450"/>
        <source>fusion jump (elbow)</source>
        <translation>fusiesprong (elleboog)</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="453"/>
        <source>chosen k = %1</source>
        <translation>gekozen k = %1</translation>
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
        <translation>Grootste gemiddelde silhouet bij k = %1, Calinski–Harabasz bij k = %2, fusiesprong bij k = %3. %4 %5 artikelen × %6 elementvariabelen van %7.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="475"/>
        <source>Frames: k = %1, as chosen.</source>
        <translation>Frames: k = %1, zoals gekozen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="477"/>
        <source>Frames: k = %1, where most indices point.</source>
        <translation>Frames: k = %1, waar de meeste indices naar wijzen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="478"/>
        <source>Frames: k = %1, the largest mean silhouette; the three indices point at different k.</source>
        <translation>Frames: k = %1, het grootste gemiddelde silhouet; de drie indices wijzen verschillende k aan.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="499"/>
        <source>Name (double-click to edit)</source>
        <translation>Naam (dubbelklik om te bewerken)</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="499"/>
        <source>Articles</source>
        <translation>Artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="500"/>
        <source>Share</source>
        <translation>Aandeel</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="500"/>
        <source>Stability</source>
        <translation>Stabiliteit</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="500"/>
        <source>Characteristic elements (share in frame, in all)</source>
        <translation>Kenmerkende elementen (aandeel in frame, in alle)</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="517"/>
        <source>%1 — dissolves on resampling</source>
        <translation>%1 — valt uiteen bij opnieuw trekken</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="521"/>
        <source>Mean Jaccard similarity to the best-matching cluster over %1 bootstrap replicates (Hennig 2007); %2 dissolved (≤ 0.5), %3 recovered (≥ 0.75).</source>
        <translation>Gemiddelde Jaccard-gelijkenis met de best passende cluster over %1 bootstrapreplicaties (Hennig 2007); %2 uiteengevallen (≤ 0.5), %3 teruggevonden (≥ 0.75).</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="527"/>
        <source>not computed</source>
        <translation>niet berekend</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="542"/>
        <source>%1 (%2, %3)</source>
        <translation>%1 (%2, %3)</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="549"/>
        <source>none stands out</source>
        <translation>geen enkel valt op</translation>
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
        <translation>%1: %2 van alle artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="585"/>
        <source>%1 in F%2: %3 of its articles, %4 of all; adjusted residual %5</source>
        <translation>%1 in F%2: %3 van zijn artikelen, %4 van alle; gecorrigeerd residu %5</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="614"/>
        <source>Total</source>
        <translation>Totaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="625"/>
        <source>%1 (%2)</source>
        <translation>%1 (%2)</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="634"/>
        <source>Chi-square undefined: %1</source>
        <translation>Chikwadraat niet gedefinieerd: %1</translation>
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
            <numerusform>%n cel verwacht minder dan 5 artikelen: lees de toets met zorg.</numerusform>
            <numerusform>%n cellen verwachten minder dan 5 artikelen: lees de toets met zorg.</numerusform>
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
        <translation>Id</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="654"/>
        <source>Near the centre</source>
        <translation>Dicht bij het centrum</translation>
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
        <translation>Bereken de frames voordat u ze opslaat.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frames/frames_window.cpp" line="722"/>
        <source>Saved the %n frame(s) as &quot;%1&quot; (Edit → Undo takes it back).</source>
        <translation>
            <numerusform>Het %n frame is opgeslagen als ‘%1’ (Bewerken → Ongedaan maken draait het terug).</numerusform>
            <numerusform>De %n frames zijn opgeslagen als ‘%1’ (Bewerken → Ongedaan maken draait het terug).</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="747"/>
        <source>The layer %1 of &quot;%2&quot; is no longer in the project.</source>
        <translation>De laag %1 van ‘%2’ staat niet meer in het project.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="749"/>
        <source>The layer %1 is no longer in the project.</source>
        <translation>De laag %1 staat niet meer in het project.</translation>
    </message>
    <message>
        <location filename="../app/desktop/frames/frames_window.cpp" line="774"/>
        <source>Deleted the saved frames &quot;%1&quot; (Edit → Undo brings them back).</source>
        <translation>De opgeslagen frames ‘%1’ zijn verwijderd (Bewerken → Ongedaan maken haalt ze terug).</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frames/frames_window.cpp" line="789"/>
        <source>%1 — %2, k = %3, %n article(s)</source>
        <translation>
            <numerusform>%1 — %2, k = %3, %n artikel</numerusform>
            <numerusform>%1 — %2, k = %3, %n artikelen</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>fourfold::GoldSpanDialog</name>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="30"/>
        <source>Edit the gold span</source>
        <translation>Fragment van de gouden standaard bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="35"/>
        <source>Select the span on the text: it snaps to whole words, as on the desk. Tick “Exact selection” to take the selection as it is, or set start and end to the character.</source>
        <translation>Selecteer het fragment in de tekst: het lijnt uit op hele woorden, zoals bij het coderen. Vink ‘Exacte selectie’ aan om de selectie te nemen zoals ze is, of stel begin en einde per teken in.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="46"/>
        <source>Article text</source>
        <translation>Artikeltekst</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="55"/>
        <source>&amp;Function:</source>
        <translation>&amp;Functie:</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="56"/>
        <source>E&amp;xact selection (no snapping to words)</source>
        <translation>&amp;Exacte selectie (niet uitlijnen op woorden)</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="65"/>
        <source>&amp;Start (character):</source>
        <translation>&amp;Begin (teken):</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="66"/>
        <source>&amp;End (character, not included):</source>
        <translation>&amp;Einde (teken, niet inbegrepen):</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="71"/>
        <source>Text:</source>
        <translation>Tekst:</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="77"/>
        <source>Decide gold span</source>
        <translation>Fragment voor de gouden standaard vastleggen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="158"/>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="165"/>
        <source>not set</source>
        <translation>niet opgegeven</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="169"/>
        <source>%1:</source>
        <translation>%1:</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="193"/>
        <source>(The end must come after the start.)</source>
        <translation>(Het einde moet na het begin komen.)</translation>
    </message>
</context>
<context>
    <name>fourfold::ImportOptionsDialog</name>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="53"/>
        <source>Import articles</source>
        <translation>Artikelen importeren</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="56"/>
        <source>Import %1</source>
        <translation>%1 importeren</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/import_options_dialog.cpp" line="57"/>
        <source>Import %n files</source>
        <translation>
            <numerusform>%n bestand importeren</numerusform>
            <numerusform>%n bestanden importeren</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="64"/>
        <source>e.g. ^=+$ or ^Item \d+</source>
        <translation>bijv. ^=+$ of ^Item \d+</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="66"/>
        <source>A regular expression. Each text, DOCX, ODT or PDF document is cut into articles at the lines where it is found. Named groups (?&lt;title&gt;…), (?&lt;outlet&gt;…) and (?&lt;date&gt;…) fill those fields; otherwise the first line of each part is its title. Leave empty for one article per document.</source>
        <translation>Een reguliere expressie. Elk tekst-, DOCX-, ODT- of PDF-document wordt in artikelen geknipt bij de regels waar ze wordt gevonden. Benoemde groepen (?&lt;title&gt;…), (?&lt;outlet&gt;…) en (?&lt;date&gt;…) vullen die velden; anders is de eerste regel van elk deel de titel. Laat leeg voor één artikel per document.</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="70"/>
        <source>Split each document at lines matching:</source>
        <translation>Elk document knippen bij regels die overeenkomen met:</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="78"/>
        <source>Preview the cuts</source>
        <translation>Knippen vooraf bekijken</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="82"/>
        <source>Preview of the cuts</source>
        <translation>Voorbeeld van het knippen</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="86"/>
        <source>Import</source>
        <translation>Importeren</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="118"/>
        <source>No pattern: each document is one article.</source>
        <translation>Geen patroon: elk document is één artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="123"/>
        <source>None of the chosen files is a text, DOCX, ODT or PDF document.</source>
        <translation>Geen van de gekozen bestanden is een tekst-, DOCX-, ODT- of PDF-document.</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="130"/>
        <source>%1: not cut — %2</source>
        <translation>%1: niet geknipt — %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_options_dialog.cpp" line="134"/>
        <source>(no title)</source>
        <translation>(zonder titel)</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/import_options_dialog.cpp" line="139"/>
        <source>%1 (line %2): %3 (%n characters)</source>
        <translation>
            <numerusform>%1 (regel %2): %3 (%n teken)</numerusform>
            <numerusform>%1 (regel %2): %3 (%n tekens)</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>fourfold::ItemForm</name>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="29"/>
        <source>Article-level items</source>
        <translation>Items op artikelniveau</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="34"/>
        <source>The codebook asks no questions about the article as a whole.</source>
        <translation>Het codeboek stelt geen vragen over het artikel als geheel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="73"/>
        <source>not answered</source>
        <translation>niet beantwoord</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="94"/>
        <source>&amp;Withdraw answer</source>
        <translation>Antwoord &amp;intrekken</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="119"/>
        <source>Withdraw the answer: the item is unanswered again</source>
        <translation>Antwoord intrekken: de vraag is weer onbeantwoord</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="152"/>
        <source>Withdraw answer: %1 (%2)</source>
        <translation>Antwoord intrekken: %1 (%2)</translation>
    </message>
</context>
<context>
    <name>fourfold::JoinTeamDialog</name>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="24"/>
        <source>Join a team project</source>
        <translation>Deelnemen aan een teamproject</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="28"/>
        <source>Your lead gives you the server, your pseudonym and your password. Your working file is kept on this computer and syncs with the server while it is open.</source>
        <translation>Uw coördinator geeft u de server, uw pseudoniem en uw wachtwoord. Uw werkbestand blijft op deze computer en wordt met de server gesynchroniseerd zolang het open is.</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="36"/>
        <source>Host and database</source>
        <translation>Host en database</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="37"/>
        <source>Connection string</source>
        <translation>Verbindingsreeks</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="43"/>
        <source>Server:</source>
        <translation>Server:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="46"/>
        <source>e.g. db.example.org</source>
        <translation>bijv. db.example.org</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="51"/>
        <source>Port</source>
        <translation>Poort</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="54"/>
        <source>Port:</source>
        <translation>Poort:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="56"/>
        <source>Host:</source>
        <translation>Host:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="58"/>
        <source>Database:</source>
        <translation>Database:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="61"/>
        <source>Connection string:</source>
        <translation>Verbindingsreeks:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="64"/>
        <source>Your pseudonym:</source>
        <translation>Uw pseudoniem:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="67"/>
        <source>Kept in memory while Fourfold runs, never written to a file. Leave it empty when your password file (~/.pgpass) holds it.</source>
        <translation>Wordt in het geheugen bewaard zolang Fourfold draait en nooit naar een bestand geschreven. Laat het leeg als uw wachtwoordbestand (~/.pgpass) het bevat.</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="69"/>
        <source>Password:</source>
        <translation>Wachtwoord:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="72"/>
        <source>Where to keep your working file</source>
        <translation>Waar uw werkbestand komt</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="73"/>
        <source>Choose…</source>
        <translation>Kiezen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="78"/>
        <source>Working file:</source>
        <translation>Werkbestand:</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="82"/>
        <source>&amp;Join</source>
        <translation>&amp;Deelnemen</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="125"/>
        <source>Working file</source>
        <translation>Werkbestand</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="125"/>
        <source>Fourfold projects (*.fourfold)</source>
        <translation>Fourfold-projecten (*.fourfold)</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="136"/>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="144"/>
        <source>Name the server: its host and database, or a connection string.</source>
        <translation>Geef de server op: host en database, of een verbindingsreeks.</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="157"/>
        <source>Give your pseudonym, as your lead gave it to you.</source>
        <translation>Geef uw pseudoniem op, zoals uw coördinator het u gaf.</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="163"/>
        <source>Choose where to keep your working file.</source>
        <translation>Kies waar uw werkbestand komt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/team/join_team_dialog.cpp" line="177"/>
        <source>Joining the team project…</source>
        <translation>Deelnemen aan het teamproject…</translation>
    </message>
</context>
<context>
    <name>fourfold::LeadWindows</name>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="188"/>
        <source>Write the reliability report</source>
        <translation>Het betrouwbaarheidsrapport schrijven</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="189"/>
        <source>Web page (*.html);;PDF document (*.pdf)</source>
        <translation>Webpagina (*.html);;PDF-document (*.pdf)</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="196"/>
        <source>Reliability report</source>
        <translation>Betrouwbaarheidsrapport</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="200"/>
        <source>The reliability report was written to %1.</source>
        <translation>Het betrouwbaarheidsrapport is geschreven naar %1.</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="201"/>
        <source>&amp;Open</source>
        <translation>&amp;Openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="202"/>
        <location filename="../app/desktop/lead_windows.cpp" line="241"/>
        <source>Open the &amp;folder</source>
        <translation>De &amp;map openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="213"/>
        <location filename="../app/desktop/lead_windows.cpp" line="221"/>
        <location filename="../app/desktop/lead_windows.cpp" line="234"/>
        <source>Coder copy</source>
        <translation>Codeurskopie</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="222"/>
        <source>A coder copy holds only the articles assigned to this coder, the codebook and the coder&apos;s own codings. Whose copy?</source>
        <translation>Een codeurskopie bevat alleen de artikelen die aan deze codeur zijn toegewezen, het codeboek en de eigen coderingen van de codeur. Voor wie is de kopie?</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="228"/>
        <source>Write the coder copy</source>
        <translation>De codeurskopie schrijven</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="229"/>
        <location filename="../app/desktop/lead_windows.cpp" line="251"/>
        <source>Fourfold project (*.fourfold)</source>
        <translation>Fourfold-project (*.fourfold)</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/lead_windows.cpp" line="238"/>
        <source>Wrote %1 for %2: %n article(s), %3 span(s).</source>
        <translation>
            <numerusform>%1 geschreven voor %2: %n artikel, %3 fragment(en).</numerusform>
            <numerusform>%1 geschreven voor %2: %n artikelen, %3 fragment(en).</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="251"/>
        <source>Merge returned coder copies</source>
        <translation>Teruggekomen codeurskopieën samenvoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="256"/>
        <source>Merge coder copies</source>
        <translation>Codeurskopieën samenvoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="257"/>
        <source>Nothing was merged.

%1</source>
        <translation>Er is niets samengevoegd.

%1</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="264"/>
        <source>%1 (%2): already merged, nothing new.</source>
        <translation>%1 (%2): al samengevoegd, niets nieuws.</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="266"/>
        <source>%1 (%2): %3 new, %4 changed (%5 deleted), %6 conflict(s).</source>
        <translation>%1 (%2): %3 nieuw, %4 gewijzigd (%5 verwijderd), %6 conflict(en).</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/lead_windows.cpp" line="276"/>
        <source>Merged %n copy(ies); %1 conflict(s): the later change is kept, the other waits for you to decide (Lead → Merge conflicts…).</source>
        <translation>
            <numerusform>%n kopie samengevoegd; %1 conflict(en): de latere wijziging blijft, de andere wacht op uw beslissing (Coördinator → Samenvoegconflicten…).</numerusform>
            <numerusform>%n kopieën samengevoegd; %1 conflict(en): de latere wijziging blijft, de andere wacht op uw beslissing (Coördinator → Samenvoegconflicten…).</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="283"/>
        <source>&amp;Decide conflicts</source>
        <translation>Conflicten &amp;beslissen</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/lead_windows.cpp" line="280"/>
        <source>Merged %n copy(ies).</source>
        <translation>
            <numerusform>%n kopie samengevoegd.</numerusform>
            <numerusform>%n kopieën samengevoegd.</numerusform>
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
        <translation>Artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="116"/>
        <source>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Manual frame analysis of news and opinion articles: problem, cause, evaluation, remedy.&lt;/p&gt;</source>
        <translation>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Handmatige frame-analyse van nieuws- en opinieartikelen: probleem, oorzaak, evaluatie, oplossing.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="124"/>
        <source>New project…</source>
        <translation>Nieuw project…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="125"/>
        <source>Start a study: a new project file, then import its articles.</source>
        <translation>Een onderzoek beginnen: een nieuw projectbestand, daarna de artikelen importeren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="128"/>
        <source>Open a project…</source>
        <translation>Project openen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="131"/>
        <source>Open the sample project</source>
        <translation>Voorbeeldproject openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="133"/>
        <source>Invented demo data: three local controversies, three coders.</source>
        <translation>Verzonnen demogegevens: drie lokale kwesties, drie codeurs.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="139"/>
        <location filename="../app/desktop/main_window.cpp" line="152"/>
        <source>Recent projects</source>
        <translation>Recente projecten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="171"/>
        <source>Search the texts…</source>
        <translation>Zoeken in de teksten…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="173"/>
        <source>Search articles</source>
        <translation>Artikelen doorzoeken</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="180"/>
        <source>Status filter</source>
        <translation>Statusfilter</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="181"/>
        <source>All articles</source>
        <translation>Alle artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="182"/>
        <source>Not started</source>
        <translation>Niet begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="183"/>
        <source>In progress</source>
        <translation>Bezig</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="184"/>
        <source>Done</source>
        <translation>Klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="242"/>
        <source>Mark the selected text as %1 (key %2)</source>
        <translation>De geselecteerde tekst markeren als %1 (toets %2)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="253"/>
        <source>Mark as done</source>
        <translation>Markeren als klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="254"/>
        <source>Mark this article as done and open the next one (%1)</source>
        <translation>Dit artikel als klaar markeren en het volgende openen (%1)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="279"/>
        <source>Import articles…</source>
        <translation>Artikelen importeren…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="355"/>
        <source>&amp;Project</source>
        <translation>&amp;Project</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="356"/>
        <source>&amp;New project…</source>
        <translation>&amp;Nieuw project…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="357"/>
        <source>&amp;Open…</source>
        <translation>&amp;Openen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="358"/>
        <source>&amp;Import articles…</source>
        <translation>Artikelen &amp;importeren…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="360"/>
        <source>Import a &amp;folder…</source>
        <translation>Een &amp;map importeren…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="361"/>
        <source>Import a folder</source>
        <translation>Een map importeren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="367"/>
        <source>Open the &amp;sample project</source>
        <translation>&amp;Voorbeeldproject openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="368"/>
        <source>Join a &amp;team project…</source>
        <translation>Deelnemen aan een &amp;teamproject…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="370"/>
        <source>&amp;Quit</source>
        <translation>&amp;Afsluiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="372"/>
        <source>&amp;Edit</source>
        <translation>&amp;Bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="373"/>
        <location filename="../app/desktop/main_window.cpp" line="544"/>
        <source>&amp;Undo</source>
        <translation>&amp;Ongedaan maken</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="376"/>
        <location filename="../app/desktop/main_window.cpp" line="547"/>
        <source>&amp;Redo</source>
        <translation>Opn&amp;ieuw</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="380"/>
        <source>&amp;Code</source>
        <translation>&amp;Coderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="384"/>
        <source>Mark as %1	%2</source>
        <translation>Markeren als %1	%2</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="388"/>
        <source>Mark article as &amp;done</source>
        <translation>Artikel markeren als &amp;klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="389"/>
        <source>&amp;Next article</source>
        <translation>&amp;Volgend artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="391"/>
        <source>&amp;Find in texts</source>
        <translation>&amp;Zoeken in teksten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="392"/>
        <source>&amp;Training feedback…</source>
        <translation>&amp;Trainingsfeedback…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="399"/>
        <source>&amp;View</source>
        <translation>&amp;Weergave</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="400"/>
        <source>E&amp;xact selection (no snapping to words)</source>
        <translation>E&amp;xacte selectie (niet uitlijnen op woorden)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="408"/>
        <source>Exact selection: spans take the text as selected.</source>
        <translation>Exacte selectie: fragmenten nemen de tekst zoals geselecteerd.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="409"/>
        <source>Spans snap to whole words again.</source>
        <translation>Fragmenten worden weer uitgelijnd op hele woorden.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="413"/>
        <source>Show &amp;every coder&apos;s spans (leads only)</source>
        <translation>Fragmenten van &amp;alle codeurs tonen (alleen coördinatoren)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="423"/>
        <source>&amp;Lead</source>
        <translation>C&amp;oördinator</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="425"/>
        <source>&amp;Compare and adjudicate…</source>
        <translation>&amp;Vergelijken en beslissen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="427"/>
        <source>&amp;Reliability…</source>
        <translation>&amp;Betrouwbaarheid…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="428"/>
        <source>&amp;Frames…</source>
        <translation>&amp;Frames…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="429"/>
        <source>Write the reliability &amp;report…</source>
        <translation>Betrouwbaarheids&amp;rapport schrijven…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="431"/>
        <source>&amp;Study design…</source>
        <translation>&amp;Onderzoeksopzet…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="432"/>
        <source>C&amp;odebook…</source>
        <translation>C&amp;odeboek…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="433"/>
        <source>&amp;Progress…</source>
        <translation>Voort&amp;gang…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="434"/>
        <source>P&amp;eople…</source>
        <translation>P&amp;ersonen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="435"/>
        <source>&amp;Hand out a coder copy…</source>
        <translation>Codeurs&amp;kopie uitdelen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="436"/>
        <source>&amp;Merge returned coder copies…</source>
        <translation>Teruggekomen codeurskopieën &amp;samenvoegen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="437"/>
        <source>Merge co&amp;nflicts…</source>
        <translation>Samenvoeg&amp;conflicten…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="439"/>
        <source>&amp;Extractor runs…</source>
        <translation>&amp;Extractorruns…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="447"/>
        <source>&amp;Settings</source>
        <translation>&amp;Instellingen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="448"/>
        <source>&amp;Language</source>
        <translation>&amp;Taal</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="453"/>
        <source>System language</source>
        <translation>Systeemtaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="464"/>
        <source>&amp;Help</source>
        <translation>&amp;Help</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="466"/>
        <source>&amp;Keyboard shortcuts</source>
        <translation>&amp;Sneltoetsen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="483"/>
        <source>The project has no coder &quot;%1&quot;.</source>
        <translation>Het project heeft geen codeur ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="497"/>
        <source>Nobody was chosen to code.</source>
        <translation>Er is niemand gekozen om te coderen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="526"/>
        <source>Span</source>
        <translation>Fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="527"/>
        <source>Codebook</source>
        <translation>Codeboek</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="544"/>
        <source>&amp;Undo %1</source>
        <translation>&amp;Ongedaan maken: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="547"/>
        <source>&amp;Redo %1</source>
        <translation>Opn&amp;ieuw: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="613"/>
        <source>The team server asks for your password to sync. Your work stays in this file until it can be sent.</source>
        <translation>De teamserver vraagt uw wachtwoord om te synchroniseren. Uw werk blijft in dit bestand tot het verzonden kan worden.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="615"/>
        <source>Enter &amp;password…</source>
        <translation>&amp;Wachtwoord invoeren…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="627"/>
        <source>Team server password</source>
        <translation>Wachtwoord van de teamserver</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="628"/>
        <source>Password of %1 on the team server:</source>
        <translation>Wachtwoord van %1 op de teamserver:</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="764"/>
        <source>Every article in the list is done.</source>
        <translation>Alle artikelen in de lijst zijn klaar.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/main_window.cpp" line="786"/>
        <source>%n article(s) contain &quot;%1&quot;.</source>
        <translation>
            <numerusform>%n artikel bevat ‘%1’.</numerusform>
            <numerusform>%n artikelen bevatten ‘%1’.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="792"/>
        <source>New project</source>
        <translation>Nieuw project</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="802"/>
        <source>Cannot create project</source>
        <translation>Project kan niet worden aangemaakt</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="814"/>
        <source>Import articles</source>
        <translation>Artikelen importeren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="815"/>
        <source>Articles (*.txt *.text *.html *.htm *.jsonl *.ndjson *.csv *.rss *.atom *.nitf *.newsml *.xml *.docx *.odt *.pdf *.epub)</source>
        <translation>Artikelen (*.txt *.text *.html *.htm *.jsonl *.ndjson *.csv *.rss *.atom *.nitf *.newsml *.xml *.docx *.odt *.pdf *.epub)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="861"/>
        <source>&lt;h3&gt;Choose an article&lt;/h3&gt;&lt;p&gt;Pick an article in the list on the left to start coding it.&lt;/p&gt;</source>
        <translation>&lt;h3&gt;Kies een artikel&lt;/h3&gt;&lt;p&gt;Kies links in de lijst een artikel om het te gaan coderen.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="864"/>
        <source>&lt;h3&gt;No articles yet&lt;/h3&gt;&lt;p&gt;Import the articles of the study: plain text, HTML, JSON Lines, CSV, DOCX, ODT, PDF, EPUB, RSS or Atom feeds, NITF or NewsML-G2. Then assign them to coders in Lead → Study design.&lt;/p&gt;</source>
        <translation>&lt;h3&gt;Nog geen artikelen&lt;/h3&gt;&lt;p&gt;Importeer de artikelen van het onderzoek: platte tekst, HTML, JSON Lines, CSV, DOCX, ODT, PDF, EPUB, RSS- of Atom-feeds, NITF of NewsML-G2. Wijs ze daarna toe aan codeurs in Coördinator → Onderzoeksopzet.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="869"/>
        <source>&lt;h3&gt;Nothing to code yet&lt;/h3&gt;&lt;p&gt;No articles are assigned to you in this project. Your lead assigns them; when they have, open the project again, or open the coder copy they send you.&lt;/p&gt;</source>
        <translation>&lt;h3&gt;Nog niets te coderen&lt;/h3&gt;&lt;p&gt;In dit project zijn geen artikelen aan u toegewezen. Uw coördinator wijst ze toe; open daarna het project opnieuw, of open de codeurskopie die u wordt gestuurd.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="901"/>
        <source>The language changes when Fourfold starts again.</source>
        <translation>De taal verandert wanneer Fourfold opnieuw wordt gestart.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="914"/>
        <source>Not saved: %1. %2</source>
        <translation>Niet opgeslagen: %1. %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="915"/>
        <source>&amp;Retry</source>
        <translation>&amp;Opnieuw proberen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="921"/>
        <source>&amp;Discard</source>
        <translation>&amp;Verwerpen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="931"/>
        <source>No project open</source>
        <translation>Geen project geopend</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="935"/>
        <source>lead</source>
        <translation>coördinator</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="935"/>
        <source>coder</source>
        <translation>codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="937"/>
        <source>%1 — read-only, as %2 (%3) — Fourfold</source>
        <translation>%1 — alleen-lezen, als %2 (%3) — Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="939"/>
        <source>%1 — coding as %2 (%3) — Fourfold</source>
        <translation>%1 — coderen als %2 (%3) — Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="943"/>
        <source>Reading as %1 · %2 · read-only file: nothing is saved</source>
        <translation>Lezen als %1 · %2 · alleen-lezenbestand: er wordt niets opgeslagen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="946"/>
        <source>Coding as %1 · %2 · lead: every article</source>
        <translation>Coderen als %1 · %2 · coördinator: alle artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="947"/>
        <source>Coding as %1 · %2 · blind: only your own spans</source>
        <translation>Coderen als %1 · %2 · blind: alleen je eigen fragmenten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="955"/>
        <source>The comparison window lists its own keys with %1.</source>
        <translation>Het vergelijkingsvenster toont zijn eigen toetsen met %1.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="959"/>
        <source>Keyboard shortcuts</source>
        <translation>Sneltoetsen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="881"/>
        <source>Open project</source>
        <translation>Project openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="792"/>
        <location filename="../app/desktop/main_window.cpp" line="881"/>
        <source>Fourfold projects (*.fourfold)</source>
        <translation>Fourfold-projecten (*.fourfold)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="146"/>
        <location filename="../app/desktop/main_window.cpp" line="646"/>
        <location filename="../app/desktop/main_window.cpp" line="807"/>
        <location filename="../app/desktop/main_window.cpp" line="885"/>
        <location filename="../app/desktop/main_window.cpp" line="894"/>
        <source>Cannot open project</source>
        <translation>Project kan niet worden geopend</translation>
    </message>
</context>
<context>
    <name>fourfold::MessageBar</name>
    <message>
        <location filename="../app/desktop/message_bar.cpp" line="68"/>
        <source>Message</source>
        <translation>Melding</translation>
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
        <translation>De melding sluiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/message_bar.cpp" line="95"/>
        <source>Details of the message</source>
        <translation>Details van de melding</translation>
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
        <translation>Namen blijven in dit project; alles wat het verlaat, draagt het pseudoniem. Een uitgeschakelde persoon behoudt de coderingen en krijgt geen nieuwe toewijzingen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="37"/>
        <source>Pseudonym</source>
        <translation>Pseudoniem</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="37"/>
        <source>Name</source>
        <translation>Naam</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="37"/>
        <source>Role</source>
        <translation>Rol</translation>
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
        <translation>Persoon &amp;toevoegen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="48"/>
        <source>&amp;Rename…</source>
        <translation>&amp;Hernoemen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="49"/>
        <location filename="../app/desktop/people/people_window.cpp" line="111"/>
        <source>&amp;Disable</source>
        <translation>&amp;Uitschakelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="65"/>
        <location filename="../app/desktop/people/people_window.cpp" line="130"/>
        <source>Only a lead who chose themselves in &quot;Who is coding?&quot; can change people.</source>
        <translation>Alleen een coördinator die zichzelf heeft gekozen bij ‘Wie codeert er?’ kan personen wijzigen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="81"/>
        <location filename="../app/desktop/people/people_window.cpp" line="171"/>
        <source>lead</source>
        <translation>coördinator</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="81"/>
        <location filename="../app/desktop/people/people_window.cpp" line="171"/>
        <source>coder</source>
        <translation>codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="82"/>
        <source>disabled</source>
        <translation>uitgeschakeld</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="82"/>
        <source>enabled</source>
        <translation>ingeschakeld</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="111"/>
        <source>&amp;Enable</source>
        <translation>&amp;Inschakelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="138"/>
        <source>Added %1. Undo takes it back.</source>
        <translation>%1 toegevoegd. Ongedaan maken draait het terug.</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="147"/>
        <source>Renamed %1.</source>
        <translation>%1 hernoemd.</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="157"/>
        <source>Disabled %1: their codings stay; they take no new assignments.</source>
        <translation>%1 uitgeschakeld: de coderingen blijven; de persoon krijgt geen nieuwe toewijzingen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="158"/>
        <source>Enabled %1.</source>
        <translation>%1 ingeschakeld.</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="164"/>
        <source>Add a person</source>
        <translation>Persoon toevoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="169"/>
        <source>e.g. C04 — the only name written to exports</source>
        <translation>bijv. C04 — de enige naam die in exports terechtkomt</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="176"/>
        <source>Name:</source>
        <translation>Naam:</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="177"/>
        <source>Pseudonym:</source>
        <translation>Pseudoniem:</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="178"/>
        <source>Role:</source>
        <translation>Rol:</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="179"/>
        <source>New lead&apos;s passphrase:</source>
        <translation>Wachtwoordzin van de nieuwe coördinator:</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="180"/>
        <source>Repeat it:</source>
        <translation>Herhaal hem:</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="199"/>
        <source>The two passphrases differ; type the same one twice.</source>
        <translation>De twee wachtwoordzinnen verschillen; typ twee keer dezelfde.</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="217"/>
        <source>Rename %1</source>
        <translation>%1 hernoemen</translation>
    </message>
    <message>
        <location filename="../app/desktop/people/people_window.cpp" line="218"/>
        <source>New name of %1 (kept in this project only):</source>
        <translation>Nieuwe naam van %1 (blijft alleen in dit project):</translation>
    </message>
</context>
<context>
    <name>fourfold::ProgressBoardWindow</name>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="63"/>
        <source>Progress — %1</source>
        <translation>Voortgang — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="73"/>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="96"/>
        <source>Phase</source>
        <translation>Fase</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="74"/>
        <source>All phases</source>
        <translation>Alle fasen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="77"/>
        <source>Show:</source>
        <translation>Tonen:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="79"/>
        <source>Reload</source>
        <translation>Opnieuw laden</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <source>Coder</source>
        <translation>Codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <source>Assigned</source>
        <translation>Toegewezen</translation>
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
        <translation>Klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="84"/>
        <source>Agreement so far (α)</source>
        <translation>Overeenstemming (α)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="84"/>
        <source>Compared articles</source>
        <translation>Vergeleken artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="84"/>
        <source>Active time</source>
        <translation>Actieve tijd</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="87"/>
        <source>Krippendorff&apos;s alpha on the articles the coder finished: in training with the lead&apos;s master coding, in the other phases the mean over every coder who finished the same articles. ✓ at 0.800 or more, ~ from 0.667 (tentative), ✗ below.</source>
        <translation>Krippendorffs alfa over de artikelen die de codeur heeft afgerond: in de training met de mastercodering van de coördinator, in de andere fasen het gemiddelde over alle codeurs die dezelfde artikelen hebben afgerond. ✓ bij 0.800 of hoger, ~ vanaf 0.667 (voorlopig), ✗ daaronder.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="94"/>
        <source>Effort</source>
        <translation>Tijdsbesteding</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="96"/>
        <source>Articles done</source>
        <translation>Afgeronde artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="96"/>
        <source>Active time, all coders</source>
        <translation>Actieve tijd, alle codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="97"/>
        <source>Mean per done article</source>
        <translation>Gemiddelde per afgerond artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="102"/>
        <source>Show active time per coder</source>
        <translation>Actieve tijd per codeur tonen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="106"/>
        <source>Off by default: time is shown only summed over all coders. Recording and showing how long each person works can count as monitoring employees, which may need the coders&apos; agreement or a works council&apos;s consent. Turn it on only if your study has that agreement; the change is written to the project&apos;s log. Only a lead can switch it.</source>
        <translation>Standaard uit: tijd wordt alleen opgeteld over alle codeurs getoond. Vastleggen en tonen hoe lang iedere persoon werkt, kan gelden als het monitoren van werknemers, waarvoor de instemming van de codeurs of van een ondernemingsraad nodig kan zijn. Zet dit alleen aan als je onderzoek die instemming heeft; de wijziging wordt in het logboek van het project geschreven. Alleen een coördinator kan dit omzetten.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="181"/>
        <source>%1 of %2</source>
        <translation>%1 van %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="231"/>
        <source>&lt;b&gt;No assignments yet.&lt;/b&gt; Plan them in the study design window.</source>
        <translation>&lt;b&gt;Nog geen toewijzingen.&lt;/b&gt; Plan ze in het venster Onderzoeksopzet.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="232"/>
        <source>&lt;b&gt;%1 of %2 assignments done&lt;/b&gt; · %3 of active coding time in all.</source>
        <translation>&lt;b&gt;%1 van %2 toewijzingen klaar&lt;/b&gt; · %3 actieve codeertijd in totaal.</translation>
    </message>
</context>
<context>
    <name>fourfold::ReadingView</name>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="38"/>
        <source>intro</source>
        <translation>inleiding</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="40"/>
        <source>body</source>
        <translation>kern</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="42"/>
        <source>conclusion</source>
        <translation>slot</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="63"/>
        <source>Article text</source>
        <translation>Artikeltekst</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="613"/>
        <source>Mark as %1</source>
        <translation>Markeren als %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="614"/>
        <source>Change to %1</source>
        <translation>Wijzigen in %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="619"/>
        <source>Delete span</source>
        <translation>Fragment verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="659"/>
        <source>%1: “%2”</source>
        <translation>%1: ‘%2’</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/reading_view.cpp" line="871"/>
        <source>%n span(s). Select text and press 1 to 4 to mark a framing function; Ctrl+Down and Ctrl+Up move between spans.</source>
        <translation>
            <numerusform>%n fragment. Selecteer tekst en druk op 1 tot 4 om een framingfunctie te markeren; Ctrl+Omlaag en Ctrl+Omhoog gaan van fragment naar fragment.</numerusform>
            <numerusform>%n fragmenten. Selecteer tekst en druk op 1 tot 4 om een framingfunctie te markeren; Ctrl+Omlaag en Ctrl+Omhoog gaan van fragment naar fragment.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="880"/>
        <source>Selected span: %1, “%2”. Press 1 to 4 to relabel, Delete to delete, Ctrl+Left/Right and Ctrl+Shift+Left/Right to resize.</source>
        <translation>Geselecteerd fragment: %1, ‘%2’. Druk op 1 tot 4 om de functie te wijzigen, Delete om te verwijderen, Ctrl+Links/Rechts en Ctrl+Shift+Links/Rechts om de grootte te wijzigen.</translation>
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
        <translation>0.800: op de variabele vertrouwen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="125"/>
        <source>0.667: tentative conclusions only</source>
        <translation>0.667: alleen voorlopige conclusies</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="174"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="593"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="696"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="740"/>
        <source>undefined</source>
        <translation>niet gedefinieerd</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="176"/>
        <source>reliable (≥ 0.800)</source>
        <translation>betrouwbaar (≥ 0.800)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="178"/>
        <source>tentative (≥ 0.667)</source>
        <translation>voorlopig (≥ 0.667)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="182"/>
        <source>unreliable (&lt; 0.667)</source>
        <translation>onbetrouwbaar (&lt; 0.667)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="192"/>
        <source>Reliability — %1</source>
        <translation>Betrouwbaarheid — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="230"/>
        <source>Table</source>
        <translation>Tabel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="244"/>
        <source>Alpha without each coder</source>
        <translation>Alfa zonder elke codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="247"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="725"/>
        <source>Alpha without each article (the costliest first)</source>
        <translation>Alfa zonder elk artikel (het duurste eerst)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="251"/>
        <source>Change = alpha without it − alpha with everything: positive means leaving it out raises alpha, so it costs reliability (leave-one-out, common practice). A diagnostic for training and codebook work, not a licence to report the higher figure.</source>
        <translation>Verandering = alfa zonder − alfa met alles: positief betekent dat weglaten de alfa verhoogt, het kost dus betrouwbaarheid (leave-one-out, gangbare praktijk). Een diagnose voor training en codeboekwerk, geen vrijbrief om het hogere cijfer te rapporteren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="256"/>
        <source>Boundary habits on matched spans</source>
        <translation>Grensgewoonten bij gekoppelde fragmenten</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="259"/>
        <source>Each span against the other coder&apos;s span of the same function that overlaps it most; differences are this coder&apos;s minus the other&apos;s, in characters (code points). Systematic: the mean differs from 0 by more than two standard errors over at least 5 matches (a rough screen, common practice).</source>
        <translation>Elk fragment tegenover het fragment van de andere codeur met dezelfde functie dat het het meest overlapt; verschillen zijn die van deze codeur min die van de ander, in tekens (codepunten). Systematisch: het gemiddelde wijkt meer dan twee standaardfouten van 0 af over ten minste 5 koppelingen (een ruwe screening, gangbare praktijk).</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="266"/>
        <source>Diagnostics</source>
        <translation>Diagnose</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="271"/>
        <source>Alpha per function</source>
        <translation>Alfa per functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="273"/>
        <source>Coder pairs</source>
        <translation>Codeursparen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="275"/>
        <source>Function confusion</source>
        <translation>Functieverwarring</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="278"/>
        <source>Alpha over time</source>
        <translation>Alfa door de tijd</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="303"/>
        <source>Article item</source>
        <translation>Artikelitem</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="304"/>
        <source>Paragraph</source>
        <translation>Alinea</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="305"/>
        <source>Sentence</source>
        <translation>Zin</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="306"/>
        <source>Token (word)</source>
        <translation>Token (woord)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="307"/>
        <source>Continuum (spans, unitizing alpha)</source>
        <translation>Continuüm (fragmenten, unitizing-alfa)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="312"/>
        <source>&amp;Unit</source>
        <translation>&amp;Eenheid</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="318"/>
        <source>&amp;Item</source>
        <translation>&amp;Item</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="334"/>
        <source>Functions</source>
        <translation>Functies</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="353"/>
        <source>&amp;Coders</source>
        <translation>&amp;Codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="356"/>
        <source>All phases</source>
        <translation>Alle fasen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="360"/>
        <source>&amp;Phase</source>
        <translation>&amp;Fase</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="362"/>
        <source>Gold joins as a coder</source>
        <translation>Gouden standaard als codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="364"/>
        <source>Count articles in progress</source>
        <translation>Artikelen in bewerking meetellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="365"/>
        <source>By default a coder&apos;s article counts only once the coder has marked it done; tick to count articles still in progress too.</source>
        <translation>Standaard telt een artikel van een codeur pas mee als de codeur het als klaar gemarkeerd heeft; vink aan om ook artikelen in bewerking mee te tellen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="373"/>
        <source>none</source>
        <translation>geen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="374"/>
        <source>&amp;Bootstrap</source>
        <translation>&amp;Bootstrap</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="377"/>
        <source>Batches of articles</source>
        <translation>Groepen artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="378"/>
        <source>Weeks</source>
        <translation>Weken</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="379"/>
        <source>&amp;Drift by</source>
        <translation>&amp;Drift per</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="383"/>
        <source> articles</source>
        <translation> artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="384"/>
        <source>Batch &amp;size</source>
        <translation>Groeps&amp;grootte</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="386"/>
        <source>Co&amp;mpute</source>
        <translation>Be&amp;rekenen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="388"/>
        <source>Cancel</source>
        <translation>Annuleren</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="496"/>
        <source>Computing…</source>
        <translation>Bezig met berekenen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="506"/>
        <source>Cancelling after the current step…</source>
        <translation>Annuleren na de huidige stap…</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="523"/>
        <source>Cancelled; the results shown are from before.</source>
        <translation>Geannuleerd; de getoonde resultaten zijn van eerder.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="528"/>
        <source>%n coder(s) compared.</source>
        <translation>
            <numerusform>%n codeur vergeleken.</numerusform>
            <numerusform>%n codeurs vergeleken.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="543"/>
        <source>Chosen functions (sets)</source>
        <translation>Functieverzameling</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="562"/>
        <source>Alpha</source>
        <translation>Alfa</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="219"/>
        <source>Alpha: Krippendorff&apos;s alpha, coincidence form (Krippendorff 2011). Interval: 95% bootstrap, units resampled (percentile; the pair interval of Hayes &amp; Krippendorff 2007 is in the report, and it is too narrow with more than two coders); q(α &lt; 0.800): share of replicates below 0.800. Verdict: Krippendorff (2004, §12.2). Minimum values: Krippendorff (2004, §11.4) after Bloch &amp; Kraemer (1989), for the rarest value at p = 0.05. Cohen&apos;s kappa per pair over the units both coded (Cohen 1960); Fleiss&apos; kappa (Fleiss 1971) needs every coder on every unit.</source>
        <translation>Alfa: Krippendorffs alfa, coïncidentievorm (Krippendorff 2011). Interval: 95%-bootstrap, eenheden opnieuw getrokken (percentiel; het paarinterval van Hayes &amp; Krippendorff 2007 staat in het rapport en is te smal bij meer dan twee codeurs); q(α &lt; 0.800): aandeel replicaties onder 0.800. Oordeel: Krippendorff (2004, §12.2). Benodigde waarden: Krippendorff (2004, §11.4) naar Bloch &amp; Kraemer (1989), voor de zeldzaamste waarde bij p = 0.05. Cohens kappa per paar over de eenheden die beide codeerden (Cohen 1960); Fleiss&apos; kappa (Fleiss 1971) vereist elke codeur op elke eenheid.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="562"/>
        <source>q(α &lt; 0.800)</source>
        <translation>q(α &lt; 0.800)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="562"/>
        <source>95% interval (units resampled)</source>
        <translation>95%-interval (eenheden opnieuw getrokken)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="563"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="681"/>
        <source>Verdict</source>
        <translation>Oordeel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="563"/>
        <source>Percent agreement</source>
        <translation>Procentuele overeenstemming</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="563"/>
        <source>Fleiss&apos; kappa</source>
        <translation>Fleiss&apos; kappa</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="567"/>
        <source>Cohen&apos;s kappa %1 × %2</source>
        <translation>Cohens kappa %1 × %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="569"/>
        <source>Pairable values</source>
        <translation>Paarbare waarden</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="569"/>
        <source>Pairable units</source>
        <translation>Paarbare eenheden</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="569"/>
        <source>Rarest value</source>
        <translation>Zeldzaamste waarde</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="570"/>
        <source>Minimum values (α ≥ 0.800)</source>
        <translation>Benodigde waarden (α ≥ 0.800)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="570"/>
        <source>Sample</source>
        <translation>Steekproef</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="575"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="685"/>
        <source>Statistic</source>
        <translation>Statistiek</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="601"/>
        <source>%1, %2 replicates, seed %3</source>
        <translation>%1, %2 replicaties, seed %3</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="627"/>
        <source>Fleiss&apos; kappa needs every coder on every unit; some cells are missing.</source>
        <translation>Fleiss&apos; kappa vereist elke codeur op elke eenheid; er ontbreken cellen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="645"/>
        <source>below the minimum</source>
        <translation>onder het minimum</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="646"/>
        <source>large enough</source>
        <translation>groot genoeg</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="662"/>
        <source>The sample is smaller than Krippendorff&apos;s minimum for the rarest value (alpha ≥ 0.800 at p = 0.05) in: %1. Code more units before relying on these figures.</source>
        <translation>De steekproef is kleiner dan Krippendorffs minimum voor de zeldzaamste waarde (alfa ≥ 0.800 bij p = 0.05) in: %1. Codeer meer eenheden voordat je op deze cijfers vertrouwt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="681"/>
        <source>Unitizing alpha</source>
        <translation>Unitizing-alfa</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="681"/>
        <source>Observed disagreement D_o</source>
        <translation>Waargenomen onenigheid D_o</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="682"/>
        <source>Expected disagreement D_e</source>
        <translation>Verwachte onenigheid D_e</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="682"/>
        <source>Continuum</source>
        <translation>Continuüm</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="687"/>
        <source>All four, pooled</source>
        <translation>Alle vier, samengenomen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="704"/>
        <source>%1 articles, %2 characters</source>
        <translation>%1 artikelen, %2 tekens</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="722"/>
        <source>Alpha without each article: the %1 costliest of %2</source>
        <translation>Alfa zonder elk artikel: de %1 duurste van %2</translation>
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
        <translation>Codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="729"/>
        <source>Title</source>
        <translation>Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="730"/>
        <source>Alpha without</source>
        <translation>Alfa zonder</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="730"/>
        <source>Change</source>
        <translation>Verandering</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="730"/>
        <source>Units</source>
        <translation>Eenheden</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="757"/>
        <source>Matches</source>
        <translation>Koppelingen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="757"/>
        <source>Length ± SE</source>
        <translation>Lengte ± SE</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="757"/>
        <source>Start</source>
        <translation>Begin</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="758"/>
        <source>End</source>
        <translation>Einde</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="758"/>
        <source>Longer</source>
        <translation>Langer</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="758"/>
        <source>Shorter</source>
        <translation>Korter</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="758"/>
        <source>Habit</source>
        <translation>Gewoonte</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="780"/>
        <source>spans systematically longer</source>
        <translation>fragmenten systematisch langer</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="781"/>
        <source>spans systematically shorter</source>
        <translation>fragmenten systematisch korter</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="794"/>
        <source>Alpha per function, with 95% bootstrap intervals</source>
        <translation>Alfa per functie, met 95%-bootstrapintervallen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="798"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="961"/>
        <source>Krippendorff&apos;s alpha</source>
        <translation>Krippendorffs alfa</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="818"/>
        <source>pooled</source>
        <translation>samengenomen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="902"/>
        <source>Cohen&apos;s kappa of each pair of coders over the units both coded (%1). Darker: higher agreement; hatched: not defined.</source>
        <translation>Cohens kappa van elk paar codeurs over de eenheden die beide codeerden (%1). Donkerder: hogere overeenstemming; gearceerd: niet gedefinieerd.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="907"/>
        <source>Continuum units have no per-pair kappa; see the span agreement in the function confusion.</source>
        <translation>Continuümeenheden hebben geen kappa per paar; zie de overeenstemming van fragmenten in de functieverwarring.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="924"/>
        <source>nothing</source>
        <translation>niets</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="943"/>
        <source>A coder&apos;s span</source>
        <translation>Fragment van een codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="943"/>
        <source>What another coder gave it</source>
        <translation>Wat een andere codeur eraan gaf</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="944"/>
        <source>Each span of each coder against the best-overlapping span of every other coder (both directions of each pair). Darker: a larger share of the row. &quot;nothing&quot;: no overlapping span.</source>
        <translation>Elk fragment van elke codeur tegenover het best overlappende fragment van elke andere codeur (beide richtingen van elk paar). Donkerder: een groter deel van de rij. ‘niets’: geen overlappend fragment.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="956"/>
        <source>Alpha by week of first coding — %1</source>
        <translation>Alfa per week van eerste codering — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="957"/>
        <source>Alpha by batch of articles, in coding order — %1</source>
        <translation>Alfa per groep artikelen, in codeervolgorde — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="999"/>
        <source>ISO week</source>
        <translation>ISO-week</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="999"/>
        <source>articles (in coding order)</source>
        <translation>artikelen (in codeervolgorde)</translation>
    </message>
</context>
<context>
    <name>fourfold::ReportOptionsDialog</name>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="23"/>
        <source>Reliability report</source>
        <translation>Betrouwbaarheidsrapport</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="27"/>
        <source>Paragraph</source>
        <translation>Alinea</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="28"/>
        <source>Sentence</source>
        <translation>Zin</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="29"/>
        <source>Token (word)</source>
        <translation>Token (woord)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="31"/>
        <source>&amp;Unit of the functions</source>
        <translation>&amp;Eenheid van de functies</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="34"/>
        <source>All phases</source>
        <translation>Alle fasen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="37"/>
        <source>&amp;Phase</source>
        <translation>&amp;Fase</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="55"/>
        <source>&amp;Coders</source>
        <translation>&amp;Codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="61"/>
        <source>none</source>
        <translation>geen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="62"/>
        <source> replicates</source>
        <translation> replicaties</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="63"/>
        <source>&amp;Bootstrap</source>
        <translation>&amp;Bootstrap</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="67"/>
        <source>S&amp;eed</source>
        <translation>Z&amp;aad</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="69"/>
        <source>Count articles in progress</source>
        <translation>Artikelen in bewerking meetellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="70"/>
        <source>By default a coder&apos;s article counts only once the coder has marked it done; tick to count articles still in progress too.</source>
        <translation>Standaard telt een artikel van een codeur pas mee als de codeur het als klaar gemarkeerd heeft; vink aan om ook artikelen in bewerking mee te tellen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="75"/>
        <source>Reliability report: %1</source>
        <translation>Betrouwbaarheidsrapport: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="76"/>
        <source>&amp;Title</source>
        <translation>&amp;Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="79"/>
        <source>&amp;Write…</source>
        <translation>&amp;Schrijven…</translation>
    </message>
</context>
<context>
    <name>fourfold::RunErrorModel</name>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="75"/>
        <source>Correct</source>
        <translation>Correct</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="77"/>
        <source>False positive</source>
        <translation>Fout-positief</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="79"/>
        <source>Miss</source>
        <translation>Gemist</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="81"/>
        <source>Wrong function</source>
        <translation>Verkeerde functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="83"/>
        <source>Boundary</source>
        <translation>Grens</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="106"/>
        <source>%1 [%2, %3) “%4”</source>
        <translation>%1 [%2, %3) ‘%4’</translation>
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
        <translation>Functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="154"/>
        <source>Kind</source>
        <translation>Soort</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="156"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="159"/>
        <source>Span of %1</source>
        <translation>Fragment van %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="160"/>
        <source>Gold span</source>
        <translation>Fragment gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="162"/>
        <source>Run span</source>
        <translation>Fragment van de run</translation>
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
        <translation>◀ Vo&amp;rige fout</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="34"/>
        <source>&amp;Next error ▶</source>
        <translation>&amp;Volgende fout ▶</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="73"/>
        <source>%1 — %2 against %3</source>
        <translation>%1 — %2 tegen %3</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="75"/>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="160"/>
        <source>gold</source>
        <translation>de gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="96"/>
        <source>Gold</source>
        <translation>Gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="97"/>
        <source>Coder %1</source>
        <translation>Codeur %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="100"/>
        <source>Run %1</source>
        <translation>Run %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="147"/>
        <source>No error of the run on this article.</source>
        <translation>Geen fout van de run in dit artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="161"/>
        <source>coder %1</source>
        <translation>codeur %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="170"/>
        <source>&lt;b&gt;False positive.&lt;/b&gt; The run marks “%1” as %2; %3 has no span there.</source>
        <translation>&lt;b&gt;Fout-positief.&lt;/b&gt; De run markeert ‘%1’ als %2; %3 heeft daar geen fragment.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="173"/>
        <source>&lt;b&gt;Miss.&lt;/b&gt; %1 marks “%2” as %3; the run has no span there.</source>
        <translation>&lt;b&gt;Gemist.&lt;/b&gt; %1 markeert ‘%2’ als %3; de run heeft daar geen fragment.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="177"/>
        <source>&lt;b&gt;Wrong function.&lt;/b&gt; %1 marks “%2” as %3; the run marks “%4” as %5.</source>
        <translation>&lt;b&gt;Verkeerde functie.&lt;/b&gt; %1 markeert ‘%2’ als %3; de run markeert ‘%4’ als %5.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="186"/>
        <source>at the same place</source>
        <translation>op dezelfde plaats</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="187"/>
        <source>%n character(s) earlier</source>
        <translation>
            <numerusform>%n teken eerder</numerusform>
            <numerusform>%n tekens eerder</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="188"/>
        <source>%n character(s) later</source>
        <translation>
            <numerusform>%n teken later</numerusform>
            <numerusform>%n tekens later</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="193"/>
        <source>&lt;b&gt;Boundary.&lt;/b&gt; Both mark %1 here. Compared with the span of %2, the run&apos;s starts %3 and ends %4.&lt;br&gt;%5: “%6” %7&lt;br&gt;Run: “%8” %9</source>
        <translation>&lt;b&gt;Grens.&lt;/b&gt; Beide markeren hier %1. Vergeleken met het fragment van %2 begint dat van de run %3 en eindigt het %4.&lt;br&gt;%5: ‘%6’ %7&lt;br&gt;Run: ‘%8’ %9</translation>
    </message>
</context>
<context>
    <name>fourfold::SpanEditor</name>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="95"/>
        <source>judges</source>
        <translation>beoordeelt</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="95"/>
        <source>judged by</source>
        <translation>beoordeeld door</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="97"/>
        <source>addresses</source>
        <translation>behandelt</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="97"/>
        <source>addressed by</source>
        <translation>behandeld door</translation>
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
        <translation>Fragmenteditor</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="113"/>
        <source>No span selected.

Click a span in the text or on the frame card to edit it, or select text and press 1–4 to code it.</source>
        <translation>Geen fragment geselecteerd.

Klik op een fragment in de tekst of op de framekaart om het te bewerken, of selecteer tekst en druk op 1&#xa0;tot&#xa0;en&#xa0;met&#xa0;4 om die te coderen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="179"/>
        <source>Another coder&apos;s span: shown, not editable.</source>
        <translation>Fragment van een andere codeur: zichtbaar, niet bewerkbaar.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="196"/>
        <source>Function: %1</source>
        <translation>Functie: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="200"/>
        <source>&amp;Function:</source>
        <translation>&amp;Functie:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="207"/>
        <source>Note</source>
        <translation>Notitie</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="211"/>
        <source>&amp;Note:</source>
        <translation>&amp;Notitie:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="216"/>
        <source>Confidence</source>
        <translation>Zekerheid</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="220"/>
        <location filename="../app/desktop/span_editor.cpp" line="389"/>
        <location filename="../app/desktop/span_editor.cpp" line="397"/>
        <source>not set</source>
        <translation>niet opgegeven</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="223"/>
        <source>How sure you are of this span, from 0 (a guess) to 1 (certain).</source>
        <translation>Hoe zeker je bent van dit fragment, van 0 (een gok) tot 1 (zeker).</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="224"/>
        <source>&amp;Confidence:</source>
        <translation>&amp;Zekerheid:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="233"/>
        <source>Links</source>
        <translation>Koppelingen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="235"/>
        <source>Links start from an evaluation (to the cause it judges) or from a remedy (to the problem it addresses).</source>
        <translation>Koppelingen beginnen bij een evaluatie (naar de oorzaak die ze beoordeelt) of bij een oplossing (naar het probleem dat ze behandelt).</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="245"/>
        <source>Span to link to</source>
        <translation>Fragment om aan te koppelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="249"/>
        <source>&amp;Link</source>
        <translation>&amp;Koppelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="250"/>
        <source>Link to the chosen span</source>
        <translation>Koppelen aan het gekozen fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="262"/>
        <source>Links of this span</source>
        <translation>Koppelingen van dit fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="270"/>
        <source>No links yet.</source>
        <translation>Nog geen koppelingen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="273"/>
        <location filename="../app/desktop/span_editor.cpp" line="295"/>
        <source>&amp;Remove link</source>
        <translation>Koppeling &amp;verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="274"/>
        <source>Remove the chosen link</source>
        <translation>De gekozen koppeling verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="408"/>
        <source>%1:</source>
        <translation>%1:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="462"/>
        <source>No note.</source>
        <translation>Geen notitie.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="462"/>
        <source>Why this span, doubts, a question for the lead…</source>
        <translation>Waarom dit fragment, twijfels, een vraag voor de coördinator…</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="480"/>
        <source>&amp;Judges:</source>
        <translation>Be&amp;oordeelt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="480"/>
        <source>&amp;Addresses:</source>
        <translation>Behan&amp;delt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="482"/>
        <source>no cause span to link</source>
        <translation>geen oorzaakfragment om te koppelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="482"/>
        <source>no problem span to link</source>
        <translation>geen probleemfragment om te koppelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="512"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="528"/>
        <source>a span not shown here</source>
        <translation>een fragment dat hier niet wordt getoond</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="529"/>
        <source>%1 %2</source>
        <translation>%1 %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="310"/>
        <source>Remove link: %1</source>
        <translation>Koppeling verwijderen: %1</translation>
    </message>
</context>
<context>
    <name>fourfold::StudyDesignWindow</name>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="117"/>
        <source>Study design — %1</source>
        <translation>Onderzoeksopzet — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="119"/>
        <source>Plan who codes what: draw the reliability sample that every reliability coder codes, deal the rest of the articles, and keep the codebook&apos;s versions in view. Nothing is written until you commit a plan.</source>
        <translation>Plan wie wat codeert: trek de betrouwbaarheidssteekproef die elke betrouwbaarheidscodeur codeert, verdeel de overige artikelen en houd de versies van het codeboek in het oog. Er wordt niets weggeschreven totdat je een plan vastlegt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="128"/>
        <source>Reliability sample</source>
        <translation>Betrouwbaarheidssteekproef</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="129"/>
        <source>Assign the rest</source>
        <translation>De rest toewijzen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="130"/>
        <source>Assignments</source>
        <translation>Toewijzingen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="131"/>
        <source>Codebook versions</source>
        <translation>Codeboekversies</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="181"/>
        <source>lead</source>
        <translation>coördinator</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="181"/>
        <source>coder</source>
        <translation>codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="211"/>
        <source>The seed must be a whole number from 0 to 18446744073709551615; &quot;%1&quot; is not.</source>
        <translation>De seed moet een geheel getal van 0 tot 18446744073709551615 zijn; ‘%1’ is dat niet.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="231"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="341"/>
        <source>Draw</source>
        <translation>Trekken</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="237"/>
        <source>A pilot sample is coded before the codebook is final and is not part of the reliability sample.</source>
        <translation>Een pilotsteekproef wordt gecodeerd voordat het codeboek definitief is en hoort niet bij de betrouwbaarheidssteekproef.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="239"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="805"/>
        <source>Phase:</source>
        <translation>Fase:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="244"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="807"/>
        <source>Articles:</source>
        <translation>Artikelen:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="246"/>
        <source>Share of the frame:</source>
        <translation>Aandeel van het steekproefkader:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="269"/>
        <source>Size:</source>
        <translation>Omvang:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="273"/>
        <source>Simple random sample</source>
        <translation>Enkelvoudige aselecte steekproef</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="274"/>
        <source>Stratified by outlet</source>
        <translation>Gestratificeerd naar medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="275"/>
        <source>Stratified by language</source>
        <translation>Gestratificeerd naar taal</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="276"/>
        <source>Stratified by topic</source>
        <translation>Gestratificeerd naar onderwerp</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="277"/>
        <source>Stratified draws allocate the sample to each group in proportion to its size in the frame.</source>
        <translation>Bij gestratificeerde trekkingen krijgt elke groep een deel van de steekproef naar verhouding van haar omvang in het kader.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="279"/>
        <source>Method:</source>
        <translation>Methode:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="281"/>
        <source>Leave near copies out of the sampling frame</source>
        <translation>Bijna-kopieën uit het steekproefkader weglaten</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="284"/>
        <source>An article found at import to be a near copy of an older one (the same story with small edits) is not drawn; the older article stays in the frame.</source>
        <translation>Een artikel dat bij de import is herkend als bijna-kopie van een ouder artikel (hetzelfde verhaal met kleine wijzigingen), wordt niet getrokken; het oudere artikel blijft in het steekproefkader.</translation>
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
        <translation>Nieuwe seed</translation>
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
        <translation>De seed wordt bij de trekking vastgelegd: dezelfde seed op hetzelfde project trekt op elke computer dezelfde artikelen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="307"/>
        <source>Reliability coders</source>
        <translation>Betrouwbaarheidscodeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="309"/>
        <source>Coded by all of:</source>
        <translation>Gecodeerd door allen van:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="311"/>
        <source>Minimum sample (Krippendorff)</source>
        <translation>Minimale steekproef (Krippendorff)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="320"/>
        <source>The smallest alpha you would still accept: 0.800 for firm conclusions, 0.667 for tentative ones (Krippendorff).</source>
        <translation>De kleinste alfa die je nog zou accepteren: 0.800 voor stellige conclusies, 0.667 voor voorlopige (Krippendorff).</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="322"/>
        <source>α_min:</source>
        <translation>α_min:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="327"/>
        <source>Significance level:</source>
        <translation>Significantieniveau:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="335"/>
        <source>The expected share of the rarest value: 0.25 when four values are equally frequent.</source>
        <translation>Het verwachte aandeel van de zeldzaamste waarde: 0.25 als vier waarden even vaak voorkomen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="337"/>
        <source>Rarest value&apos;s share:</source>
        <translation>Aandeel zeldzaamste waarde:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="343"/>
        <source>Draw the sample and show it; nothing is written yet.</source>
        <translation>De steekproef trekken en tonen; er wordt nog niets weggeschreven.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="344"/>
        <source>Commit the draw</source>
        <translation>Trekking vastleggen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="346"/>
        <source>Assign the drawn articles to every chosen coder and record the draw with its seed.</source>
        <translation>De getrokken artikelen aan elke gekozen codeur toewijzen en de trekking met haar seed vastleggen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="382"/>
        <source>Stratum</source>
        <translation>Stratum</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="382"/>
        <source>In the frame</source>
        <translation>In het kader</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="382"/>
        <source>Drawn</source>
        <translation>Getrokken</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="384"/>
        <source>Drawn articles:</source>
        <translation>Getrokken artikelen:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="387"/>
        <source>Drawn articles</source>
        <translation>Getrokken artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="445"/>
        <source>&lt;b&gt;No sample is drawn yet for the phase %1.&lt;/b&gt; Choose the size, method, seed and coders, then press &lt;i&gt;Draw&lt;/i&gt; to see the sample and whether it is large enough.</source>
        <translation>&lt;b&gt;Er is nog geen steekproef voor de fase %1 getrokken.&lt;/b&gt; Kies de omvang, methode, seed en codeurs en druk dan op &lt;i&gt;Trekken&lt;/i&gt; om de steekproef te zien en of die groot genoeg is.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="526"/>
        <source>simple random sample</source>
        <translation>enkelvoudige aselecte steekproef</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="528"/>
        <source>stratified by outlet</source>
        <translation>gestratificeerd naar medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="530"/>
        <source>stratified by language</source>
        <translation>gestratificeerd naar taal</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="532"/>
        <source>stratified by topic</source>
        <translation>gestratificeerd naar onderwerp</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="533"/>
        <source>%n article(s) of a frame of %1, %2, seed %3, coded by %4.</source>
        <translation>
            <numerusform>%n artikel uit een kader van %1, %2, seed %3, gecodeerd door %4.</numerusform>
            <numerusform>%n artikelen uit een kader van %1, %2, seed %3, gecodeerd door %4.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="541"/>
        <source>&lt;b&gt;%1 sample drawn on %2.&lt;/b&gt; %3 The draw is recorded; it can be withdrawn until someone codes one of its articles, and then drawn again.</source>
        <translation>&lt;b&gt;Steekproef voor fase %1 getrokken op %2.&lt;/b&gt; %3 De trekking is vastgelegd; ze kan worden ingetrokken tot iemand een van haar artikelen codeert, en daarna opnieuw worden getrokken.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="547"/>
        <source>&lt;b&gt;Planned draw, not yet committed.&lt;/b&gt; %1 Press &lt;i&gt;Commit the draw&lt;/i&gt; to assign it.</source>
        <translation>&lt;b&gt;Geplande trekking, nog niet vastgelegd.&lt;/b&gt; %1 Druk op &lt;i&gt;Trekking vastleggen&lt;/i&gt; om haar toe te wijzen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="556"/>
        <source>No minimum sample can be computed for these settings.</source>
        <translation>Voor deze instellingen kan geen minimale steekproef worden berekend.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="558"/>
        <source>&lt;b&gt;Krippendorff&apos;s minimum: %1 values&lt;/b&gt; per variable for α_min = %2 at p = %3, with the rarest value at %4 %.</source>
        <translation>&lt;b&gt;Krippendorffs minimum: %1 waarden&lt;/b&gt; per variabele voor α_min = %2 bij p = %3, met de zeldzaamste waarde op %4 %.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="567"/>
        <source>Unit</source>
        <translation>Eenheid</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="567"/>
        <source>Values the draw delivers</source>
        <translation>Waarden die de trekking oplevert</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="571"/>
        <source>✓ enough</source>
        <translation>✓ genoeg</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="572"/>
        <source>✗ %n short</source>
        <translation>
            <numerusform>✗ %n te weinig</numerusform>
            <numerusform>✗ %n te weinig</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="580"/>
        <source>Article-level items</source>
        <translation>Items op artikelniveau</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="581"/>
        <source>Paragraphs</source>
        <translation>Alinea&apos;s</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="582"/>
        <source>Sentences</source>
        <translation>Zinnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="585"/>
        <source>Values are units × coders. For spans, count the codings of each function: a rare function (often the remedy) may need a larger or stratified sample.</source>
        <translation>Waarden zijn eenheden × codeurs. Tel voor fragmenten de coderingen van elke functie: een zeldzame functie (vaak de oplossing) kan een grotere of gestratificeerde steekproef nodig hebben.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="622"/>
        <source>Deal the rest</source>
        <translation>De rest verdelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="624"/>
        <source>Every article with no assignment yet goes to production coding, shuffled with the seed and dealt in turn.</source>
        <translation>Elk artikel zonder toewijzing gaat naar de hoofdcodering, geschud met de seed en om de beurt uitgedeeld.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="630"/>
        <source>Single-coded: one coder per article</source>
        <translation>Enkel gecodeerd: één codeur per artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="633"/>
        <source>Double-coded: two coders per article, pairs rotating</source>
        <translation>Dubbel gecodeerd: twee codeurs per artikel, wisselende paren</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="638"/>
        <source>Coding:</source>
        <translation>Codering:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="641"/>
        <source>Production coders</source>
        <translation>Codeurs hoofdcodering</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="643"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="813"/>
        <source>Coders:</source>
        <translation>Codeurs:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="650"/>
        <source>Plan</source>
        <translation>Plannen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="652"/>
        <source>Assign</source>
        <translation>Toewijzen</translation>
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
        <translation>Codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="691"/>
        <source>Press &lt;i&gt;Plan&lt;/i&gt; to see who would code which article.</source>
        <translation>Druk op &lt;i&gt;Plannen&lt;/i&gt; om te zien wie welk artikel zou coderen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="731"/>
        <source>Every article is assigned already: there is no rest to deal.</source>
        <translation>Elk artikel is al toegewezen: er is geen rest te verdelen.</translation>
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
            <numerusform>&lt;b&gt;Gepland, nog niet toegewezen:&lt;/b&gt; %n artikel; belasting per codeur %1. Druk op &lt;i&gt;Toewijzen&lt;/i&gt; om het plan weg te schrijven.</numerusform>
            <numerusform>&lt;b&gt;Gepland, nog niet toegewezen:&lt;/b&gt; %n artikelen; belasting per codeur %1. Druk op &lt;i&gt;Toewijzen&lt;/i&gt; om het plan weg te schrijven.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="760"/>
        <source>The rest is assigned.</source>
        <translation>De rest is toegewezen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="774"/>
        <source>&lt;b&gt;Articles per coder and phase&lt;/b&gt; (done / assigned)</source>
        <translation>&lt;b&gt;Artikelen per codeur en fase&lt;/b&gt; (klaar / toegewezen)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="778"/>
        <source>Total</source>
        <translation>Totaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="785"/>
        <source>&lt;b&gt;Every assignment&lt;/b&gt;</source>
        <translation>&lt;b&gt;Alle toewijzingen&lt;/b&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="786"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="970"/>
        <source>Phase</source>
        <translation>Fase</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="786"/>
        <source>Status</source>
        <translation>Status</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="795"/>
        <source>Give articles to coders</source>
        <translation>Artikelen aan codeurs geven</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="797"/>
        <source>Every chosen coder gets every chosen article, e.g. the training articles that the lead has master-coded.</source>
        <translation>Elke gekozen codeur krijgt elk gekozen artikel, bijv. de trainingsartikelen die de coördinator als master heeft gecodeerd.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="810"/>
        <source>Articles to give</source>
        <translation>Te geven artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="816"/>
        <source>Coders to give to</source>
        <translation>Codeurs die ze krijgen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="818"/>
        <source>Give</source>
        <translation>Geven</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="848"/>
        <source>done</source>
        <translation>klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="849"/>
        <source>started</source>
        <translation>begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="850"/>
        <source>not started</source>
        <translation>niet begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="907"/>
        <source>Every chosen coder has every chosen article in this phase already.</source>
        <translation>Elke gekozen codeur heeft elk gekozen artikel in deze fase al.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="929"/>
        <source>Version</source>
        <translation>Versie</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="929"/>
        <source>Made</source>
        <translation>Gemaakt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="929"/>
        <source>By</source>
        <translation>Door</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="929"/>
        <source>Note</source>
        <translation>Notitie</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="933"/>
        <source>Add a version from a file…</source>
        <translation>Versie uit een bestand toevoegen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="935"/>
        <source>Read a codebook JSON file and store it as the next version, with a note that says what changed and why.</source>
        <translation>Een JSON-codeboekbestand inlezen en als volgende versie opslaan, met een notitie die zegt wat er veranderd is en waarom.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="948"/>
        <source>Compare version</source>
        <translation>Versie vergelijken</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="950"/>
        <source>with</source>
        <translation>met</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="958"/>
        <source>Changes between the versions</source>
        <translation>Wijzigingen tussen de versies</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="966"/>
        <source>Only those to re-check</source>
        <translation>Alleen die opnieuw te controleren zijn</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="970"/>
        <source>Function</source>
        <translation>Functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="970"/>
        <source>Made under</source>
        <translation>Gemaakt onder</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="970"/>
        <source>Re-check</source>
        <translation>Opnieuw controleren</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1040"/>
        <source>yes — its function changed</source>
        <translation>ja — de functie is veranderd</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1040"/>
        <source>no</source>
        <translation>nee</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1050"/>
        <source>&lt;b&gt;Every annotation was made under the current version (%1).&lt;/b&gt;</source>
        <translation>&lt;b&gt;Elke annotatie is gemaakt onder de huidige versie (%1).&lt;/b&gt;</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="1051"/>
        <source>&lt;b&gt;%n annotation(s) were made under an older version&lt;/b&gt; than the current one (%1); %2 of them belong to a function whose definition, rules, examples or attributes changed since, and should be re-checked.</source>
        <translation>
            <numerusform>&lt;b&gt;%n annotatie is gemaakt onder een oudere versie&lt;/b&gt; dan de huidige (%1); %2 daarvan hoort bij een functie waarvan de definitie, regels, voorbeelden of kenmerken sindsdien veranderd zijn, en moet opnieuw worden gecontroleerd.</numerusform>
            <numerusform>&lt;b&gt;%n annotaties zijn gemaakt onder een oudere versie&lt;/b&gt; dan de huidige (%1); %2 daarvan horen bij een functie waarvan de definitie, regels, voorbeelden of kenmerken sindsdien veranderd zijn, en moeten opnieuw worden gecontroleerd.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1066"/>
        <source>&lt;p&gt;There is only version %1: nothing to compare yet. Add a version when the codebook changes.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Er is alleen versie %1: nog niets te vergelijken. Voeg een versie toe wanneer het codeboek verandert.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1070"/>
        <source>&lt;p&gt;Choose two different versions to compare.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Kies twee verschillende versies om te vergelijken.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1079"/>
        <source>Codebook version %1 → %2</source>
        <translation>Codeboekversie %1 → %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1081"/>
        <source>&lt;p&gt;No changes.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Geen wijzigingen.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1089"/>
        <source>added</source>
        <translation>toegevoegd</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1093"/>
        <source>removed</source>
        <translation>verwijderd</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1097"/>
        <source>changed</source>
        <translation>gewijzigd</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1122"/>
        <source>item removed:</source>
        <translation>item verwijderd:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1126"/>
        <source>item added:</source>
        <translation>item toegevoegd:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1130"/>
        <source>the order changed</source>
        <translation>de volgorde is veranderd</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1134"/>
        <source>was:</source>
        <translation>was:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1137"/>
        <source>now:</source>
        <translation>nu:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1149"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1153"/>
        <source>Add a codebook version</source>
        <translation>Een codeboekversie toevoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1149"/>
        <source>Codebooks (*.json)</source>
        <translation>Codeboeken (*.json)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1154"/>
        <source>What changed, and why?</source>
        <translation>Wat is er veranderd, en waarom?</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="349"/>
        <source>Withdraw the draw</source>
        <translation>Trekking intrekken</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="352"/>
        <source>Remove the committed draw and its assignments, so that the phase can be drawn again; only while nobody has coded any of its articles.</source>
        <translation>De vastgelegde trekking en haar toewijzingen verwijderen, zodat de fase opnieuw kan worden getrokken; alleen zolang niemand een van haar artikelen heeft gecodeerd.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="512"/>
        <source>&lt;b&gt;The %1 sample was withdrawn&lt;/b&gt;: %n assignment(s) removed, the withdrawal recorded in the project&apos;s log. The phase can be drawn again.</source>
        <translation>
            <numerusform>&lt;b&gt;De steekproef voor fase %1 is ingetrokken&lt;/b&gt;: %n toewijzing verwijderd, de intrekking vastgelegd in het logboek van het project. De fase kan opnieuw worden getrokken.</numerusform>
            <numerusform>&lt;b&gt;De steekproef voor fase %1 is ingetrokken&lt;/b&gt;: %n toewijzingen verwijderd, de intrekking vastgelegd in het logboek van het project. De fase kan opnieuw worden getrokken.</numerusform>
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
        <translation>Vergeleken per:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="50"/>
        <source>Unit</source>
        <translation>Eenheid</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="51"/>
        <source>sentence</source>
        <translation>zin</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="52"/>
        <source>paragraph</source>
        <translation>alinea</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="53"/>
        <source>word</source>
        <translation>woord</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="60"/>
        <source>Agreement per function</source>
        <translation>Overeenstemming per functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="61"/>
        <source>Function</source>
        <translation>Functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="61"/>
        <source>Same as the master</source>
        <translation>Gelijk aan de master</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="61"/>
        <source>α</source>
        <translation>α</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="62"/>
        <source>You marked / master marked</source>
        <translation>Jij markeerde / master markeerde</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="62"/>
        <source>What it suggests</source>
        <translation>Wat het suggereert</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="71"/>
        <source>Most units carry no function, so &quot;same as the master&quot; is high even when your spans differ; α corrects for that agreement by chance (Krippendorff). Aim for α of 0.800 or more.</source>
        <translation>De meeste eenheden dragen geen functie, dus ‘gelijk aan de master’ is hoog, ook als je fragmenten verschillen; α corrigeert voor die toevallige overeenstemming (Krippendorff). Streef naar een α van 0.800 of meer.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="85"/>
        <source>On to the real work</source>
        <translation>Door naar het echte werk</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="123"/>
        <source>&lt;b&gt;No feedback yet.&lt;/b&gt; %1</source>
        <translation>&lt;b&gt;Nog geen feedback.&lt;/b&gt; %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="131"/>
        <source>&lt;b&gt;No finished training article to compare yet.&lt;/b&gt; Feedback comes once you mark a training article as done.</source>
        <translation>&lt;b&gt;Nog geen afgerond trainingsartikel om te vergelijken.&lt;/b&gt; Feedback komt zodra je een trainingsartikel als klaar markeert.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="135"/>
        <source>&lt;b&gt;%1, your coding of %n training article(s) compared with the master coding of %2&lt;/b&gt;, %3 by %3: in how many did you and the master agree on whether the function is there?</source>
        <translation>
            <numerusform>&lt;b&gt;%1, jouw codering van %n trainingsartikel vergeleken met de mastercodering van %2&lt;/b&gt;, %3 voor %3: in hoeveel waren jij en de master het eens over de vraag of de functie aanwezig is?</numerusform>
            <numerusform>&lt;b&gt;%1, jouw codering van %n trainingsartikelen vergeleken met de mastercodering van %2&lt;/b&gt;, %3 voor %3: in hoeveel waren jij en de master het eens over de vraag of de functie aanwezig is?</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="158"/>
        <source>%1 % (%2 of %3)</source>
        <translation>%1 % (%2 van %3)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="174"/>
        <source>%1 / %2</source>
        <translation>%1 / %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="180"/>
        <source>nothing to compare</source>
        <translation>niets om te vergelijken</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="182"/>
        <source>close to the master</source>
        <translation>dicht bij de master</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="184"/>
        <source>you mark it more often than the master: re-read the exclusion rules</source>
        <translation>je markeert haar vaker dan de master: lees de uitsluitingsregels opnieuw</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="186"/>
        <source>you miss some: re-read the definition and examples</source>
        <translation>je mist er enkele: lees de definitie en de voorbeelden opnieuw</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="188"/>
        <source>as often, but in other places: compare your spans with the lead&apos;s</source>
        <translation>even vaak, maar op andere plaatsen: vergelijk je fragmenten met die van de coördinator</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="195"/>
        <source>You have %n training article(s) still open. Finish them before the real work starts.</source>
        <translation>
            <numerusform>Je hebt nog %n trainingsartikel open. Rond het af voordat het echte werk begint.</numerusform>
            <numerusform>Je hebt nog %n trainingsartikelen open. Rond ze af voordat het echte werk begint.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="201"/>
        <source>Training is complete. Talk over the functions with low agreement with your lead, then go on to your assigned articles.</source>
        <translation>De training is afgerond. Bespreek de functies met weinig overeenstemming met je coördinator en ga daarna verder met de artikelen die aan je zijn toegewezen.</translation>
    </message>
</context>
<context>
    <name>main</name>
    <message>
        <location filename="../app/desktop/main.cpp" line="29"/>
        <source>Fourfold: manual frame analysis of news and opinion articles.</source>
        <translation>Fourfold: handmatige frame-analyse van nieuws- en opinieartikelen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="33"/>
        <source>Code as the coder with this pseudonym.</source>
        <translation>Coderen als de codeur met dit pseudoniem.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="37"/>
        <source>A project file to open (*.fourfold).</source>
        <translation>Een projectbestand om te openen (*.fourfold).</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="46"/>
        <source>Cannot open project</source>
        <translation>Project kan niet worden geopend</translation>
    </message>
</context>
</TS>
