<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="nl">
<context>
    <name>FunctionStyle</name>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="28"/>
        <source>Problem</source>
        <translation>Probleem</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="30"/>
        <source>Cause</source>
        <translation>Oorzaak</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="32"/>
        <source>Evaluation</source>
        <translation>Evaluatie</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="34"/>
        <source>Remedy</source>
        <translation>Oplossing</translation>
    </message>
</context>
<context>
    <name>ImportDialog</name>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="17"/>
        <source>Importing articles…</source>
        <translation>Artikelen worden geïmporteerd…</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="18"/>
        <source>Cancel</source>
        <translation>Annuleren</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="23"/>
        <source>Importing %1 (%2 of %3)…</source>
        <translation>%1 wordt geïmporteerd (%2 van %3)…</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="29"/>
        <location filename="../app/desktop/import_dialog.cpp" line="47"/>
        <source>%1: not imported — %2</source>
        <translation>%1: niet geïmporteerd — %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="42"/>
        <source>%1: cancelled; nothing from this file was added.</source>
        <translation>%1: geannuleerd; er is niets uit dit bestand toegevoegd.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/import_dialog.cpp" line="52"/>
        <source>%1: %n article(s) added</source>
        <translation>
            <numerusform>%1: %n artikel toegevoegd</numerusform>
            <numerusform>%1: %n artikelen toegevoegd</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="56"/>
        <source>    line %1 (%2): skipped, %3</source>
        <translation>    regel %1 (%2): overgeslagen, %3</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="69"/>
        <location filename="../app/desktop/import_dialog.cpp" line="75"/>
        <source>Import report</source>
        <translation>Importrapport</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/import_dialog.cpp" line="71"/>
        <source>%n article(s) added.</source>
        <translation>
            <numerusform>%n artikel toegevoegd.</numerusform>
            <numerusform>%n artikelen toegevoegd.</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>fourfold::ArticleListModel</name>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="52"/>
        <source>done</source>
        <translation>klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="54"/>
        <source>in progress</source>
        <translation>bezig</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="55"/>
        <source>not started</source>
        <translation>niet begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="97"/>
        <source>Title</source>
        <translation>Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="99"/>
        <source>Outlet</source>
        <translation>Medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="101"/>
        <source>Lang.</source>
        <translation>Taal</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="105"/>
        <source>Status</source>
        <translation>Status</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="107"/>
        <source>Time</source>
        <translation>Tijd</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="103"/>
        <source>Characters</source>
        <translation>Tekens</translation>
    </message>
</context>
<context>
    <name>fourfold::CodebookPanel</name>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="34"/>
        <source>nominal</source>
        <translation>nominaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="36"/>
        <source>ordinal</source>
        <translation>ordinaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="38"/>
        <source>interval</source>
        <translation>interval</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="40"/>
        <source>ratio</source>
        <translation>ratio</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="68"/>
        <source>Codebook</source>
        <translation>Codeboek</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="70"/>
        <source>Framing function</source>
        <translation>Framingfunctie</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="76"/>
        <source>Codebook entry</source>
        <translation>Codeboekdefinitie</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="118"/>
        <source>No codebook loaded.</source>
        <translation>Geen codeboek geladen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="131"/>
        <source>%1, version %2</source>
        <translation>%1, versie %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="139"/>
        <source>Decision rules</source>
        <translation>Beslisregels</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="146"/>
        <source>Examples</source>
        <translation>Voorbeelden</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="151"/>
        <source>Attributes</source>
        <translation>Kenmerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="154"/>
        <source>None: marking the span is all this function asks for.</source>
        <translation>Geen: voor deze functie volstaat het om het fragment te markeren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="159"/>
        <source>free text</source>
        <translation>vrije tekst</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="160"/>
        <source>%1 (%2)</source>
        <translation>%1 (%2)</translation>
    </message>
</context>
<context>
    <name>fourfold::CoderDialog</name>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="22"/>
        <source>Who is coding?</source>
        <translation>Wie codeert er?</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="25"/>
        <source>&lt;b&gt;%1&lt;/b&gt;&lt;br&gt;Choose who you are. A coder sees only their own spans and the articles assigned to them; a lead sees every article.</source>
        <translation>&lt;b&gt;%1&lt;/b&gt;&lt;br&gt;Kies wie je bent. Codeurs zien alleen hun eigen fragmenten en de artikelen die aan hen zijn toegewezen; coördinatoren zien alle artikelen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="32"/>
        <source>Coders</source>
        <translation>Codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="36"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="65"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="90"/>
        <source>lead</source>
        <translation>coördinator</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="36"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="64"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="90"/>
        <source>coder</source>
        <translation>codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="41"/>
        <source>Start coding</source>
        <translation>Beginnen met coderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="44"/>
        <source>Add a person…</source>
        <translation>Persoon toevoegen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="58"/>
        <source>Add a person</source>
        <translation>Persoon toevoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="62"/>
        <source>e.g. C04 — the only name written to exports</source>
        <translation>bijv. C04 — de enige naam die in exports terechtkomt</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="66"/>
        <source>Name:</source>
        <translation>Naam:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="67"/>
        <source>Pseudonym:</source>
        <translation>Pseudoniem:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="68"/>
        <source>Role:</source>
        <translation>Rol:</translation>
    </message>
</context>
<context>
    <name>fourfold::FrameCard</name>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="174"/>
        <source>Frame card</source>
        <translation>Framekaart</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="221"/>
        <source>— nothing coded yet</source>
        <translation>— nog niets gecodeerd</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="275"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frame_card.cpp" line="291"/>
        <source>%n span(s)</source>
        <translation>
            <numerusform>%n fragment</numerusform>
            <numerusform>%n fragmenten</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frame_card.cpp" line="293"/>
        <source>%1: %n span(s)</source>
        <translation>
            <numerusform>%1: %n fragment</numerusform>
            <numerusform>%1: %n fragmenten</numerusform>
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
        <location filename="../app/desktop/item_form.cpp" line="68"/>
        <source>not answered</source>
        <translation>niet beantwoord</translation>
    </message>
</context>
<context>
    <name>fourfold::MainWindow</name>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="645"/>
        <source>Fourfold</source>
        <translation>Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="168"/>
        <source>Articles</source>
        <translation>Artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="89"/>
        <source>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Manual frame analysis of news and opinion articles: problem, cause, evaluation, remedy.&lt;/p&gt;</source>
        <translation>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Handmatige frame-analyse van nieuws- en opinieartikelen: probleem, oorzaak, evaluatie, oplossing.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="96"/>
        <source>Open a project…</source>
        <translation>Project openen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="99"/>
        <source>Open the sample project</source>
        <translation>Voorbeeldproject openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="101"/>
        <source>Invented demo data: three local controversies, three coders.</source>
        <translation>Verzonnen demogegevens: drie lokale kwesties, drie codeurs.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="107"/>
        <location filename="../app/desktop/main_window.cpp" line="120"/>
        <source>Recent projects</source>
        <translation>Recente projecten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="139"/>
        <source>Search the texts…</source>
        <translation>Zoeken in de teksten…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="141"/>
        <source>Search articles</source>
        <translation>Artikelen doorzoeken</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="148"/>
        <source>Status filter</source>
        <translation>Statusfilter</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="149"/>
        <source>All articles</source>
        <translation>Alle artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="150"/>
        <source>Not started</source>
        <translation>Niet begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="151"/>
        <source>In progress</source>
        <translation>Bezig</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="152"/>
        <source>Done</source>
        <translation>Klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="210"/>
        <source>Mark the selected text as %1 (key %2)</source>
        <translation>De geselecteerde tekst markeren als %1 (toets %2)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="221"/>
        <source>Mark as done</source>
        <translation>Markeren als klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="222"/>
        <source>Mark this article as done and open the next one (Ctrl+Return)</source>
        <translation>Dit artikel markeren als klaar en het volgende openen (Ctrl+Return)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="290"/>
        <source>&amp;Project</source>
        <translation>&amp;Project</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="291"/>
        <source>&amp;New project…</source>
        <translation>&amp;Nieuw project…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="292"/>
        <source>&amp;Open…</source>
        <translation>&amp;Openen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="293"/>
        <source>&amp;Import articles…</source>
        <translation>Artikelen &amp;importeren…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="295"/>
        <source>Open the &amp;sample project</source>
        <translation>&amp;Voorbeeldproject openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="297"/>
        <source>&amp;Quit</source>
        <translation>&amp;Afsluiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="299"/>
        <source>&amp;Edit</source>
        <translation>&amp;Bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="300"/>
        <location filename="../app/desktop/main_window.cpp" line="414"/>
        <source>&amp;Undo</source>
        <translation>&amp;Ongedaan maken</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="303"/>
        <location filename="../app/desktop/main_window.cpp" line="417"/>
        <source>&amp;Redo</source>
        <translation>Opn&amp;ieuw</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="307"/>
        <source>&amp;Code</source>
        <translation>&amp;Coderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="311"/>
        <source>Mark as %1	%2</source>
        <translation>Markeren als %1	%2</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="315"/>
        <source>Mark article as &amp;done</source>
        <translation>Artikel markeren als &amp;klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="317"/>
        <source>&amp;Next article</source>
        <translation>&amp;Volgend artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="320"/>
        <source>&amp;Find in texts</source>
        <translation>&amp;Zoeken in teksten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="322"/>
        <source>&amp;View</source>
        <translation>&amp;Weergave</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="323"/>
        <source>Show &amp;every coder&apos;s spans (leads only)</source>
        <translation>Fragmenten van &amp;alle codeurs tonen (alleen coördinatoren)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="332"/>
        <source>&amp;Settings</source>
        <translation>&amp;Instellingen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="333"/>
        <source>&amp;Language</source>
        <translation>&amp;Taal</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="338"/>
        <source>System language</source>
        <translation>Systeemtaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="349"/>
        <source>&amp;Help</source>
        <translation>&amp;Help</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="351"/>
        <source>&amp;Keyboard shortcuts</source>
        <translation>&amp;Sneltoetsen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="368"/>
        <source>The project has no coder &quot;%1&quot;.</source>
        <translation>Het project heeft geen codeur ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="372"/>
        <source>Nobody was chosen to code.</source>
        <translation>Er is niemand gekozen om te coderen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="396"/>
        <source>Span</source>
        <translation>Fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="397"/>
        <source>Codebook</source>
        <translation>Codeboek</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="414"/>
        <source>&amp;Undo %1</source>
        <translation>&amp;Ongedaan maken: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="417"/>
        <source>&amp;Redo %1</source>
        <translation>Opn&amp;ieuw: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="552"/>
        <source>Every article in the list is done.</source>
        <translation>Alle artikelen in de lijst zijn klaar.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/main_window.cpp" line="574"/>
        <source>%n article(s) contain &quot;%1&quot;.</source>
        <translation>
            <numerusform>%n artikel bevat ‘%1’.</numerusform>
            <numerusform>%n artikelen bevatten ‘%1’.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="580"/>
        <source>New project</source>
        <translation>Nieuw project</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="590"/>
        <source>Cannot create project</source>
        <translation>Project kan niet worden aangemaakt</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="602"/>
        <source>Import articles</source>
        <translation>Artikelen importeren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="603"/>
        <source>Articles (*.txt *.text *.html *.htm *.jsonl *.ndjson *.csv)</source>
        <translation>Artikelen (*.txt *.text *.html *.htm *.jsonl *.ndjson *.csv)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="633"/>
        <source>The language changes when Fourfold starts again.</source>
        <translation>De taal verandert wanneer Fourfold opnieuw wordt gestart.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="646"/>
        <source>No project open</source>
        <translation>Geen project geopend</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="650"/>
        <source>lead</source>
        <translation>coördinator</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="650"/>
        <source>coder</source>
        <translation>codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="651"/>
        <source>%1 — coding as %2 (%3) — Fourfold</source>
        <translation>%1 — coderen als %2 (%3) — Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="654"/>
        <source>Coding as %1 · %2 · lead: every article</source>
        <translation>Coderen als %1 · %2 · coördinator: alle artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="655"/>
        <source>Coding as %1 · %2 · blind: only your own spans</source>
        <translation>Coderen als %1 · %2 · blind: alleen je eigen fragmenten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="667"/>
        <source>Mark the selected text as %1 (snapped to whole words; hold Alt for the exact selection); with a span selected: relabel it</source>
        <translation>De geselecteerde tekst markeren als %1 (afgerond op hele woorden; houd Alt ingedrukt voor de exacte selectie); met een fragment geselecteerd: de functie ervan wijzigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="671"/>
        <source>Delete</source>
        <translation>Delete</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="671"/>
        <source>Delete the selected span</source>
        <translation>Het geselecteerde fragment verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="673"/>
        <source>Undo the last change</source>
        <translation>De laatste wijziging ongedaan maken</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="674"/>
        <source>Redo</source>
        <translation>Opnieuw</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="675"/>
        <source>Mark the article as done and open the next</source>
        <translation>Het artikel markeren als klaar en het volgende openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="676"/>
        <source>Next article that is not done</source>
        <translation>Volgend artikel dat nog niet klaar is</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="678"/>
        <source>Search the texts</source>
        <translation>Zoeken in de teksten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="680"/>
        <source>Keyboard shortcuts</source>
        <translation>Sneltoetsen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="683"/>
        <source>Span resizing keys are listed in the reading desk&apos;s tooltip.</source>
        <translation>De toetsen om een fragment groter of kleiner te maken staan in de tooltip van het leesvenster.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="614"/>
        <source>Open project</source>
        <translation>Project openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="580"/>
        <location filename="../app/desktop/main_window.cpp" line="614"/>
        <source>Fourfold projects (*.fourfold)</source>
        <translation>Fourfold-projecten (*.fourfold)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="114"/>
        <location filename="../app/desktop/main_window.cpp" line="595"/>
        <location filename="../app/desktop/main_window.cpp" line="618"/>
        <location filename="../app/desktop/main_window.cpp" line="627"/>
        <source>Cannot open project</source>
        <translation>Project kan niet worden geopend</translation>
    </message>
</context>
<context>
    <name>fourfold::ReadingView</name>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="84"/>
        <source>intro</source>
        <translation>inleiding</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="86"/>
        <source>body</source>
        <translation>kern</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="88"/>
        <source>conclusion</source>
        <translation>slot</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="113"/>
        <source>Article text</source>
        <translation>Artikeltekst</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="657"/>
        <source>Mark as %1</source>
        <translation>Markeren als %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="658"/>
        <source>Change to %1</source>
        <translation>Wijzigen in %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="663"/>
        <source>Delete span</source>
        <translation>Fragment verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="689"/>
        <source>%1: “%2”</source>
        <translation>%1: ‘%2’</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/reading_view.cpp" line="918"/>
        <source>%n span(s). Select text and press 1 to 4 to mark a framing function; Alt+Down and Alt+Up move between spans.</source>
        <translation>
            <numerusform>%n fragment. Selecteer tekst en druk op 1 tot en met 4 om een framingfunctie te markeren; met Alt+Pijl-omlaag en Alt+Pijl-omhoog ga je van fragment naar fragment.</numerusform>
            <numerusform>%n fragmenten. Selecteer tekst en druk op 1 tot en met 4 om een framingfunctie te markeren; met Alt+Pijl-omlaag en Alt+Pijl-omhoog ga je van fragment naar fragment.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="927"/>
        <source>Selected span: %1, “%2”. Press 1 to 4 to relabel, Delete to delete, Alt+Left/Right and Alt+Shift+Left/Right to resize.</source>
        <translation>Geselecteerd fragment: %1, ‘%2’. Druk op 1 tot en met 4 om de functie te wijzigen, op Delete om het te verwijderen, en op Alt+Links/Rechts en Alt+Shift+Links/Rechts om het groter of kleiner te maken.</translation>
    </message>
</context>
<context>
    <name>fourfold::SpanEditor</name>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="102"/>
        <source>judges</source>
        <translation>beoordeelt</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="102"/>
        <source>judged by</source>
        <translation>beoordeeld door</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="104"/>
        <source>addresses</source>
        <translation>behandelt</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="104"/>
        <source>addressed by</source>
        <translation>behandeld door</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="105"/>
        <source>%1 →</source>
        <translation>%1 →</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="105"/>
        <source>← %1</source>
        <translation>← %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="114"/>
        <source>Span editor</source>
        <translation>Fragmenteditor</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="120"/>
        <source>No span selected.

Click a span in the text or on the frame card to edit it, or select text and press 1–4 to code it.</source>
        <translation>Geen fragment geselecteerd.

Klik op een fragment in de tekst of op de framekaart om het te bewerken, of selecteer tekst en druk op 1&#xa0;tot&#xa0;en&#xa0;met&#xa0;4 om die te coderen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="182"/>
        <source>Another coder&apos;s span: shown, not editable.</source>
        <translation>Fragment van een andere codeur: zichtbaar, niet bewerkbaar.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="199"/>
        <source>Function: %1</source>
        <translation>Functie: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="203"/>
        <source>&amp;Function:</source>
        <translation>&amp;Functie:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="210"/>
        <source>Note</source>
        <translation>Notitie</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="214"/>
        <source>&amp;Note:</source>
        <translation>&amp;Notitie:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="219"/>
        <source>Confidence</source>
        <translation>Zekerheid</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="223"/>
        <location filename="../app/desktop/span_editor.cpp" line="355"/>
        <location filename="../app/desktop/span_editor.cpp" line="363"/>
        <source>not set</source>
        <translation>niet opgegeven</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="226"/>
        <source>How sure you are of this span, from 0 (a guess) to 1 (certain).</source>
        <translation>Hoe zeker je bent van dit fragment, van 0 (een gok) tot 1 (zeker).</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="227"/>
        <source>&amp;Confidence:</source>
        <translation>&amp;Zekerheid:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="236"/>
        <source>Links</source>
        <translation>Koppelingen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="238"/>
        <source>Links start from an evaluation (to the cause it judges) or from a remedy (to the problem it addresses).</source>
        <translation>Koppelingen beginnen bij een evaluatie (naar de oorzaak die ze beoordeelt) of bij een oplossing (naar het probleem dat ze behandelt).</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="247"/>
        <source>Span to link to</source>
        <translation>Fragment om aan te koppelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="250"/>
        <source>no other spans</source>
        <translation>geen andere fragmenten</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="252"/>
        <source>&amp;Link</source>
        <translation>&amp;Koppelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="253"/>
        <source>Link to the chosen span</source>
        <translation>Koppelen aan het gekozen fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="265"/>
        <source>Links of this span</source>
        <translation>Koppelingen van dit fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="273"/>
        <source>No links yet.</source>
        <translation>Nog geen koppelingen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="370"/>
        <source>%1:</source>
        <translation>%1:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="410"/>
        <source>No note.</source>
        <translation>Geen notitie.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="410"/>
        <source>Why this span, doubts, a question for the lead…</source>
        <translation>Waarom dit fragment, twijfels, een vraag voor de coördinator…</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="428"/>
        <source>&amp;Judges:</source>
        <translation>Be&amp;oordeelt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="428"/>
        <source>&amp;Addresses:</source>
        <translation>Behan&amp;delt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="457"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="473"/>
        <source>a span not shown here</source>
        <translation>een fragment dat hier niet wordt getoond</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="474"/>
        <source>%1 %2</source>
        <translation>%1 %2</translation>
    </message>
</context>
<context>
    <name>main</name>
    <message>
        <location filename="../app/desktop/main.cpp" line="27"/>
        <source>Fourfold: manual frame analysis of news and opinion articles.</source>
        <translation>Fourfold: handmatige frame-analyse van nieuws- en opinieartikelen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="29"/>
        <source>Code as the coder with this pseudonym.</source>
        <translation>Coderen als de codeur met dit pseudoniem.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="32"/>
        <source>A project file to open (*.fourfold).</source>
        <translation>Een projectbestand om te openen (*.fourfold).</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="40"/>
        <source>Cannot open project</source>
        <translation>Project kan niet worden geopend</translation>
    </message>
</context>
</TS>
